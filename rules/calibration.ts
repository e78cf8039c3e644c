import { agrees, comparableCause, firedRules, type StoredCase } from "./backtest";
import { compiledRuleSet } from "./engine";
import type { KbRule, RuleSet } from "./kb-schema";
import { contentHash } from "./knowledge-base";

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

/**
 * Whether a rule fires on a case depends on what it explains (defect types and locations) and its
 * conditions, nothing else of the rule (firedRules in rules/backtest.ts): its firing key names one
 * version of those, so a case's firings of an unchanged rule are kept when other rules change.
 * Raise FIRINGS_REVISION when the engine or the derived facts change what fires.
 */
const FIRINGS_REVISION = 1;
export const firingKey = (r: KbRule) =>
  `${r.id}@${contentHash(JSON.stringify([FIRINGS_REVISION, r.explains, r.conditions]))}`;

/** A rule set's firing keys, and their set's own version (what a case's kept firings were read against). */
export type FiringSet = { version: string; keys: string[]; ruleOf: Map<string, KbRule>; keyOf: Map<string, string> };

export function firingSet(rs: RuleSet): FiringSet {
  const ruleOf = new Map(rs.rules.map((r) => [firingKey(r), r]));
  const keys = [...ruleOf.keys()].sort();
  return {
    version: contentHash(keys.join("\n")),
    keys,
    ruleOf,
    keyOf: new Map([...ruleOf].map(([k, r]) => [r.id, k])),
  };
}

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
 * The records below need only counts of confirmed cases: how many there are (`kind` "case", item
 * ""), how many each rule fired on ("fired") and agreed with ("agreed"), how many each cause was
 * suggested in by the rules in use ("suggested") and was then the confirmed one ("right"). So a
 * shop's calibration can be kept as at most 2 x rules + 2 x causes + 1 tallies, updated case by case
 * (server/rulebook/calibration.ts), instead of running every confirmed case again.
 */
export type TallyKind = "case" | "fired" | "agreed" | "suggested" | "right";
export type Tally = { kind: TallyKind; item: string; cases: number };

/** What one confirmed case adds to the tallies. */
export type CaseCounts = { fired: string[]; agreed: string[]; suggested: string[]; right: boolean };

export function caseCounts(f: Firing, every: KbRule[], inUse: KbRule[]): CaseCounts {
  const fired = every.filter((r) => f.fired.has(r.id));
  const suggested = [
    ...new Set(inUse.filter((r) => r.effect !== "weakens" && f.fired.has(r.id)).map((r) => r.cause)),
  ].sort();
  return {
    fired: fired.map((r) => r.id).sort(),
    agreed: fired
      .filter((r) => agrees(r, f.causeId))
      .map((r) => r.id)
      .sort(),
    suggested,
    right: suggested.includes(f.causeId),
  };
}

export function tallyFirings(firings: Firing[], every: KbRule[], inUse: KbRule[]): Tally[] {
  const out = new Map<string, Tally>();
  const add = (kind: TallyKind, item: string) => {
    const key = `${kind}\u0000${item}`;
    const t = out.get(key);
    if (t) t.cases++;
    else out.set(key, { kind, item, cases: 1 });
  };
  for (const f of firings) {
    const c = caseCounts(f, every, inUse);
    add("case", "");
    for (const id of c.fired) add("fired", id);
    for (const id of c.agreed) add("agreed", id);
    for (const id of c.suggested) add("suggested", id);
    if (c.right) add("right", f.causeId);
  }
  return [...out.values()];
}

const countsOf = (tallies: Tally[], kind: TallyKind) =>
  new Map(tallies.filter((t) => t.kind === kind).map((t) => [t.item, t.cases]));

export function ruleRecordsOf(tallies: Tally[], rules: KbRule[]): Map<string, RuleRecord> {
  const [fired, agreed] = [countsOf(tallies, "fired"), countsOf(tallies, "agreed")];
  const out = new Map<string, RuleRecord>();
  for (const rule of rules) {
    const n = fired.get(rule.id) ?? 0;
    if (n) out.set(rule.id, { fired: n, agreed: agreed.get(rule.id) ?? 0 });
  }
  return out;
}

/** Per cause, from the rules in use that speak for it (the "suggested" tallies were counted with them). */
export function causeRecordsOf(tallies: Tally[]): Map<string, CauseRecord> {
  const right = countsOf(tallies, "right");
  return new Map(
    [...countsOf(tallies, "suggested")].map(([cause, n]) => [cause, { confirmed: n, right: right.get(cause) ?? 0 }]),
  );
}

/** How many comparable confirmed cases the tallies hold. */
export const confirmedCasesOf = (tallies: Tally[]) => countsOf(tallies, "case").get("") ?? 0;

export const ruleRecords = (firings: Firing[], rules: KbRule[]) =>
  ruleRecordsOf(tallyFirings(firings, rules, []), rules);
export const causeRecords = (firings: Firing[], rules: KbRule[]) => causeRecordsOf(tallyFirings(firings, [], rules));

export const weightFactors = (records: Map<string, RuleRecord>) => (ruleId: string) =>
  weightFactorOf(records.get(ruleId));
