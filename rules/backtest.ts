import type { AlloySpec } from "./alloys";
import type { DefectLocation, DefectType, DiagnosisCase } from "./case";
import { compiledRuleSet, diagnose, firedRuleIds, type CompiledRuleSet } from "./engine";
import { deriveFacts } from "./facts";
import type { KbCause, KbRule, RuleSet } from "./kb-schema";
import { ruleSetVersion } from "./knowledge-base";

/**
 * Trying a rule on the shop's past cases before it is published: how often it fires, how often it
 * agrees with the cause a mentor confirmed, and which cases would get a different top cause.
 */
export type StoredCase = {
  castingId: number;
  meltId: number;
  partName: string;
  pouredOn: string;
  case: DiagnosisCase;
  alloy: AlloySpec;
  /** The confirmed cause: a cause id, or null and the mentor's words for a cause the rulebook lacks. */
  confirmed?: { causeId: string | null; causeText?: string | null } | null;
};

const locationFits = (rule: KbRule, type: DefectType, at: DefectLocation) =>
  rule.explains.some((e) => e.type === type && (!e.locations || at === "throughout" || e.locations.includes(at)));

/** The rules that fire on a case for at least one of its marks (type and location), as diagnose counts them. */
export async function firedRules(
  c: DiagnosisCase,
  alloy: AlloySpec,
  rs: RuleSet | CompiledRuleSet,
): Promise<Set<string>> {
  const compiled = "byType" in rs ? rs : compiledRuleSet(rs);
  const facts = deriveFacts(c, alloy);
  const out = new Set<string>();
  for (const type of new Set(c.defects.map((d) => d.type))) {
    const fired = await firedRuleIds(compiled, type, facts);
    for (const rule of compiled.byType.get(type)?.rules ?? [])
      if (
        fired.has(rule.id) &&
        c.defects.some((d) => d.type === type && locationFits(rule, type, d.location ?? "throughout"))
      )
        out.add(rule.id);
  }
  return out;
}

const plainWords = (s: string) =>
  s
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[^a-z0-9]+/g, " ")
    .trim();

/**
 * The rulebook cause a confirmation names: its id, or the cause whose title the mentor typed word for
 * word (case and punctuation aside). Null when the words name no cause of this rulebook: such a case
 * cannot say whether a rule was right, so it counts for no rule, neither as a hit nor as a miss.
 */
export function comparableCause(
  confirmed: StoredCase["confirmed"],
  causes: Pick<KbCause, "id" | "title">[],
): string | null {
  if (!confirmed) return null;
  if (confirmed.causeId) return causes.some((c) => c.id === confirmed.causeId) ? confirmed.causeId : null;
  const words = confirmed.causeText ? plainWords(confirmed.causeText) : "";
  return (words && causes.find((c) => plainWords(c.title) === words)?.id) || null;
}

/** A supporting rule agrees when the confirmed cause is its cause; a weakening one when it is not. */
export const agrees = (rule: KbRule, confirmedCauseId: string | null) =>
  rule.effect === "weakens" ? confirmedCauseId !== rule.cause : confirmedCauseId === rule.cause;

/** The rule set with `rule` added, or replacing its earlier version; a new cause is added with it. */
export function withRule(base: RuleSet, rule: KbRule, cause?: KbCause): RuleSet {
  const causes = cause && !base.causes.some((c) => c.id === cause.id) ? [...base.causes, cause] : base.causes;
  const rules = [...base.rules.filter((r) => r.id !== rule.id), rule];
  return { version: ruleSetVersion(causes, rules), causes, rules };
}

export type CauseRef = { id: string; title: string } | null;
export type Verdict = "now-right" | "now-wrong" | "still-wrong" | "unconfirmed";
export type ChangedCase = Pick<StoredCase, "castingId" | "meltId" | "partName" | "pouredOn"> & {
  before: CauseRef;
  after: CauseRef;
  /** null: not confirmed; { id: null }: confirmed as a cause the rulebook lacks. */
  confirmed: { id: string | null } | null;
  verdict: Verdict;
};
export type Backtest = {
  cases: number;
  fired: number;
  /** Of the cases it fired on, those with a confirmed cause, and those where it agreed. */
  firedConfirmed: number;
  agreed: number;
  /** Confirmed cases whose top cause was the confirmed one, without and with the rule. */
  confirmedCases: number;
  topRightBefore: number;
  topRightAfter: number;
  changed: ChangedCase[];
};

export type BacktestInput = {
  cases: StoredCase[];
  /** The shop's rule set as it is used now. */
  base: RuleSet;
  rule: KbRule;
  cause?: KbCause;
  weightFactor?: (ruleId: string) => number;
};

const top = (r: { causes: { id: string; title: string }[] }): CauseRef =>
  r.causes[0] ? { id: r.causes[0].id, title: r.causes[0].title } : null;

export async function backtest({ cases, base, rule, cause, weightFactor }: BacktestInput): Promise<Backtest> {
  const after = withRule(base, rule, cause);
  const only = compiledRuleSet({ ...after, rules: [rule], version: `${after.version}:only:${rule.id}` });
  const out: Backtest = {
    cases: cases.length,
    fired: 0,
    firedConfirmed: 0,
    agreed: 0,
    confirmedCases: 0,
    topRightBefore: 0,
    topRightAfter: 0,
    changed: [],
  };
  for (const s of cases) {
    const fired = (await firedRules(s.case, s.alloy, only)).has(rule.id);
    // A confirmed cause the rulebook lacks cannot tell a rule right from wrong: it is not counted.
    const comparable = s.confirmed ? comparableCause(s.confirmed, after.causes) : null;
    const confirmedId = s.confirmed ? comparable : undefined;
    if (fired) {
      out.fired++;
      if (comparable) {
        out.firedConfirmed++;
        if (agrees(rule, comparable)) out.agreed++;
      }
    }
    // A rule that did not fire cannot change the ranking; only confirmed cases need the diagnosis then.
    if (!fired && confirmedId === undefined) continue;
    const b = top(await diagnose(s.case, { alloy: s.alloy, ruleSet: base, weightFactor }));
    const a = fired ? top(await diagnose(s.case, { alloy: s.alloy, ruleSet: after, weightFactor })) : b;
    if (comparable) {
      out.confirmedCases++;
      if (b && b.id === confirmedId) out.topRightBefore++;
      if (a && a.id === confirmedId) out.topRightAfter++;
    }
    if (a?.id === b?.id) continue;
    const rightBefore = b?.id === confirmedId;
    const rightAfter = a?.id === confirmedId;
    const verdict: Verdict =
      confirmedId === undefined ? "unconfirmed" : rightAfter ? "now-right" : rightBefore ? "now-wrong" : "still-wrong";
    const { castingId, meltId, partName, pouredOn } = s;
    out.changed.push({
      castingId,
      meltId,
      partName,
      pouredOn,
      before: b,
      after: a,
      confirmed: confirmedId === undefined ? null : { id: confirmedId },
      verdict,
    });
  }
  return out;
}
