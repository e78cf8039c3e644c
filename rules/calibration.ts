import { agrees, comparableCause, firedRules, type StoredCase } from "./backtest";
import { compiledRuleSet } from "./engine";
import type { KbRule, RuleSet } from "./kb-schema";

/**
 * Learning from the shop's confirmed cases. Each rule's record (confirmed cases it fired on, and
 * how many of those it agreed with) moves its weight through a bounded factor. The agreement rate is
 * smoothed with a Beta(2, 2) prior, (agreed + 2) / (fired + 4): a rule with no record sits at 1/2,
 * which maps to a factor of 1 (the author's weight), and one or two cases move it only a little.
 * The factor stays within 0.5..1.5, so the shop's record tunes a rule but never silences or
 * doubles it; switching a rule off is a mentor's decision, not the arithmetic's.
 */
export type RuleRecord = { fired: number; agreed: number };
/** "Right in `right` of `confirmed` confirmed cases here": cases where the cause was suggested. */
export type CauseRecord = { confirmed: number; right: number };

export const PRIOR = { agree: 2, disagree: 2 } as const;
export const FACTOR_MIN = 0.5;
export const FACTOR_MAX = 1.5;

export const smoothedAgreement = ({ fired, agreed }: RuleRecord, prior = PRIOR) =>
  (agreed + prior.agree) / (fired + prior.agree + prior.disagree);

/** Neutral (1) with no record; FACTOR_MIN + (FACTOR_MAX − FACTOR_MIN) × smoothed agreement otherwise. */
export const weightFactorOf = (r: RuleRecord | undefined) =>
  r ? FACTOR_MIN + (FACTOR_MAX - FACTOR_MIN) * smoothedAgreement(r) : 1;

/** For one confirmed case: the confirmed cause (a rulebook cause id) and the rules that fired on it. */
export type Firing = { causeId: string; fired: Set<string> };

/** Runs the rules (their conditions only: weights do not decide firing) on every comparable confirmed case. */
export async function confirmedFirings(cases: StoredCase[], rs: RuleSet): Promise<Firing[]> {
  const compiled = compiledRuleSet(rs);
  const out: Firing[] = [];
  for (const s of cases) {
    const causeId = comparableCause(s.confirmed, rs.causes);
    if (causeId) out.push({ causeId, fired: await firedRules(s.case, s.alloy, compiled) });
  }
  return out;
}

/**
 * Confirmed cases grouped by (confirmed cause, rules that fired): the records below need no more than
 * these counts, so a shop's calibration can be kept as tallies, one per group, and updated case by
 * case (server/rulebook/calibration.ts) instead of running every confirmed case again.
 */
export type Tally = { causeId: string; fired: readonly string[]; cases: number };

export function tallyFirings(firings: Firing[]): Tally[] {
  const out = new Map<string, Tally>();
  for (const f of firings) {
    const fired = [...f.fired].sort();
    const key = JSON.stringify([f.causeId, fired]);
    const t = out.get(key);
    if (t) t.cases++;
    else out.set(key, { causeId: f.causeId, fired, cases: 1 });
  }
  return [...out.values()];
}

export function ruleRecordsOf(tallies: Tally[], rules: KbRule[]): Map<string, RuleRecord> {
  const out = new Map<string, RuleRecord>();
  for (const rule of rules) {
    const on = tallies.filter((t) => t.fired.includes(rule.id));
    const fired = on.reduce((n, t) => n + t.cases, 0);
    if (fired) out.set(rule.id, { fired, agreed: on.reduce((n, t) => n + (agrees(rule, t.causeId) ? t.cases : 0), 0) });
  }
  return out;
}

/** Per cause, from the rules in use that speak for it. */
export function causeRecordsOf(tallies: Tally[], rules: KbRule[]): Map<string, CauseRecord> {
  const out = new Map<string, CauseRecord>();
  for (const t of tallies) {
    const fired = new Set(t.fired);
    const suggested = new Set(rules.filter((r) => r.effect !== "weakens" && fired.has(r.id)).map((r) => r.cause));
    for (const cause of suggested) {
      const r = out.get(cause) ?? { confirmed: 0, right: 0 };
      out.set(cause, { confirmed: r.confirmed + t.cases, right: r.right + (t.causeId === cause ? t.cases : 0) });
    }
  }
  return out;
}

export const ruleRecords = (firings: Firing[], rules: KbRule[]) => ruleRecordsOf(tallyFirings(firings), rules);
export const causeRecords = (firings: Firing[], rules: KbRule[]) => causeRecordsOf(tallyFirings(firings), rules);

export const weightFactors = (records: Map<string, RuleRecord>) => (ruleId: string) =>
  weightFactorOf(records.get(ruleId));
