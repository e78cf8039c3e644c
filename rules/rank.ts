import { FACTS, factSpec, type Facts, type METALS } from "./fact-catalog";
import { roundFact } from "./facts";
import { conditionLeaves, evaluateLeaf, type Condition, type KbCause, type KbRule } from "./kb-schema";
import { FACT_PLACEHOLDER, siText } from "./quantity-text";
import { valueWord } from "./value-words";

/**
 * A reason as data as well as words: the rule's sentence template and the (rounded, SI) values of the
 * facts it quotes, so the app can say it again in a person's own units. `because` is the SI text.
 */
export type Reason = { template: string; against: boolean; values: Record<string, string | number | boolean | null> };
export type RankedCause = {
  id: string;
  title: string;
  score: number;
  /** The fixes in SI words; `fixTemplates` the same sentences with their quantities in braces (rules/quantity-text.ts). */
  fixes: string[];
  fixTemplates: string[];
  because: string[];
  reasons: Reason[];
  sources: string[];
};
export type MissingInput = { fact: string; label: string; note: string };
export type DiagnosisResult = {
  causes: RankedCause[];
  facts: Record<string, number | boolean | string>;
  cautions: string[];
  /** The cautions with their quantities in braces, for saying them in a person's units. */
  cautionTemplates: string[];
  missing: MissingInput[];
  /** What a caster should know about the answer itself (an alloy diagnosed by its family, causes by prior). */
  notes: string[];
};
/** A rule that fired for a marked defect, with that mark's severity (1-3). */
export type Hit = { rule: KbRule; severity: number };

/** A worse mark counts a little more; the rule's weight says how strong the evidence is. */
const severityFactor = (severity: number) => 0.85 + 0.05 * Math.min(3, Math.max(1, severity));
const clamp01 = (x: number) => Math.min(1, Math.max(0, x));

const display = (name: string, facts: Facts) => {
  const v = roundFact(name, facts[name]);
  if (v === undefined) return "unknown";
  if (typeof v === "boolean") return v ? "yes" : "no";
  return valueWord(v);
};
export const fillBecause = (template: string, facts: Facts) =>
  siText(template).replace(FACT_PLACEHOLDER, (_, name: string) => display(name, facts));

const reasonOf = (template: string, against: boolean, facts: Facts): Reason => {
  const values: Reason["values"] = {};
  for (const [, name] of template.matchAll(FACT_PLACEHOLDER)) values[name] = roundFact(name, facts[name]) ?? null;
  return { template, against, values };
};

/**
 * Per cause: noisy-OR of the supporting rules (weight × shop factor × severity factor), times
 * Π(1 − weight × shop factor) over the rules that speak against it. A rule counts once, at the worst
 * severity of the marks it fired for. Causes with no support are left out.
 */
export function rankCauses(
  hits: Hit[],
  causes: Map<string, KbCause>,
  facts: Facts,
  weightFactor: (ruleId: string) => number,
): RankedCause[] {
  const worst = new Map<string, Hit>();
  for (const h of hits) if ((worst.get(h.rule.id)?.severity ?? 0) < h.severity) worst.set(h.rule.id, h);
  const byCause = new Map<string, Hit[]>();
  for (const h of worst.values()) byCause.set(h.rule.cause, [...(byCause.get(h.rule.cause) ?? []), h]);
  const ranked: RankedCause[] = [];
  for (const [id, list] of byCause) {
    const weight = (h: Hit) => clamp01(h.rule.weight * weightFactor(h.rule.id));
    const pro = list.filter((h) => h.rule.effect !== "weakens").sort((a, b) => weight(b) - weight(a));
    const con = list.filter((h) => h.rule.effect === "weakens").sort((a, b) => weight(b) - weight(a));
    const support = 1 - pro.reduce((p, h) => p * (1 - clamp01(weight(h) * severityFactor(h.severity))), 1);
    const score = Math.round(support * con.reduce((p, h) => p * (1 - weight(h)), 1) * 1000) / 1000;
    if (score <= 0) continue;
    const cause = causes.get(id)!;
    ranked.push({
      id,
      title: cause.title,
      score,
      ...fixesOf(cause, facts),
      because: [
        ...pro.map((h) => fillBecause(h.rule.because, facts)),
        ...con.map((h) => `Against: ${fillBecause(h.rule.because, facts)}`),
      ],
      reasons: [
        ...pro.map((h) => reasonOf(h.rule.because, false, facts)),
        ...con.map((h) => reasonOf(h.rule.because, true, facts)),
      ],
      sources: [...new Set([...pro, ...con].flatMap((h) => h.rule.sources))],
    });
  }
  return ranked.sort((a, b) => b.score - a.score || a.id.localeCompare(b.id));
}

type Metal = (typeof METALS)[number];
const metalOfFacts = (facts: Facts) => facts.metal as Metal | undefined;

/** The fixes in SI words and as templates. */
const fixesOf = (cause: KbCause, facts: Facts) => {
  const fixTemplates = fixesFor(cause, facts);
  return { fixes: fixTemplates.map(siText), fixTemplates };
};

/** A cause's fixes for this case: the general ones, then those of the case's metal only. */
export const fixesFor = (cause: KbCause, facts: Facts) => {
  const metal = metalOfFacts(facts);
  return [...cause.fixes, ...((metal && cause.fixesByMetal?.[metal]) || [])];
};
/** A cause's cautions for this case, likewise. */
export const causeCautionsFor = (cause: KbCause, facts: Facts) => {
  const metal = metalOfFacts(facts);
  return [...(cause.cautions ?? []), ...((metal && cause.cautionsByMetal?.[metal]) || [])];
};

/** Scores of causes ranked by prior only stay well below any cause a logged condition supports. */
export const PRIOR_SCALE = 0.2;

/**
 * When no rule decides: the defect type's general causes, ranked by prior. A cause's prior is the
 * noisy-OR of the weights of its supporting rules for the marked defects that the logged facts do not
 * rule out (a rule for lost foam does not count for green sand; one for copper alloys not for
 * aluminium), scaled down so it never reads as evidence.
 */
export function priorCauses(
  candidates: KbRule[],
  causes: Map<string, KbCause>,
  facts: Facts,
  weightFactor: (ruleId: string) => number,
  firedAgainst: KbRule[] = [],
): RankedCause[] {
  const byCause = new Map<string, number>();
  for (const rule of new Map(candidates.map((r) => [r.id, r])).values()) {
    if (rule.effect === "weakens" || decide(rule.conditions, facts) === false) continue;
    const w = clamp01(rule.weight * weightFactor(rule.id));
    byCause.set(rule.cause, 1 - (1 - (byCause.get(rule.cause) ?? 0)) * (1 - w));
  }
  // What was logged against a cause still counts: a cause ruled out stays low.
  for (const rule of new Map(firedAgainst.map((r) => [r.id, r])).values())
    if (rule.effect === "weakens" && byCause.has(rule.cause))
      byCause.set(rule.cause, byCause.get(rule.cause)! * (1 - clamp01(rule.weight * weightFactor(rule.id))));
  return [...byCause]
    .map(([id, p]) => {
      const cause = causes.get(id)!;
      return {
        id,
        title: cause.title,
        score: Math.round(p * PRIOR_SCALE * 1000) / 1000,
        ...fixesOf(cause, facts),
        because: [
          "Ranked by how often this cause lies behind the defect in this process and metal; nothing logged decides it",
        ],
        reasons: [],
        sources: ["common practice"],
      };
    })
    .filter((c) => c.score > 0)
    .sort((a, b) => b.score - a.score || a.id.localeCompare(b.id))
    .slice(0, 6);
}

/** Derived facts are missing because an input is: point at the input a person can log. */
const NEEDS: Record<string, string[]> = {
  superheatC: ["pourTempC"],
  pourWindowPosition: ["pourTempC"],
  pourBelowWindowC: ["pourTempC"],
  pourAboveWindowC: ["pourTempC"],
  meltSuperheatC: ["meltTempC"],
  hydrogenSolubilityCm3Per100g: ["meltTempC"],
  vapourPressureKPa: ["humidityPct", "ambientTempC"],
  moistureRisk: ["humidityPct", "sandMoisturePct"],
  frontVelocityMS: ["sprueHeightMm"],
  frontVelocityRatio: ["sprueHeightMm"],
  sprueBaseVelocityMS: ["sprueHeightMm"],
  ingateVelocityMS: ["sprueHeightMm", "chokeAreaMm2", "ingateAreaMm2"],
  ingateVelocityRatio: ["sprueHeightMm", "chokeAreaMm2", "ingateAreaMm2"],
  pressurisedGating: ["chokeAreaMm2", "ingateAreaMm2"],
  sandTemper: ["sandCompactabilityPct", "sandType", "sandMoisturePct"],
  carbonEquivalentPct: ["meltCarbonPct", "meltSiliconPct"],
  thickSectionModulusMm: ["maxSectionMm"],
  sectionRatio: ["minSectionMm", "maxSectionMm"],
  freezeTimeRatio: ["minSectionMm", "maxSectionMm"],
};
const NOTES: Record<string, string> = {
  pourTempC: "no pour temperature logged",
  meltTempC: "no highest melt temperature logged",
  degassing: 'no degassing method logged ("none" counts too)',
  humidityPct: "no humidity logged for the day",
  ambientTempC: "no air temperature logged",
  sandMoisturePct: "no sand moisture measured",
  coatingApplied: "not recorded whether a coating was applied",
  coatingDried: "not recorded whether the coating was dried",
  hasVents: "not recorded whether the mould had vents",
  hasOverflow: "not recorded whether there was an overflow",
  hasRiser: "not recorded whether there was a riser",
  chokeAreaMm2:
    "no gating logged: the sprue-base (choke) and ingate areas, or a gating ratio, give the speed at which metal enters the cavity, so turbulence is only weighed as a weak prior",
  ingateAreaMm2:
    "no ingate area (or gating ratio) logged: without it the speed at which metal enters the cavity is unknown, so turbulence is only weighed as a weak prior",
  sprueHeightMm: "no sprue height logged",
  sandCompactabilityPct: "no compactability measured: it is how green sand's temper is best judged",
  sandType:
    "no sand type logged: the water a sand needs depends on its clay (synthetic bentonite, natural-bonded, oil-bonded)",
  mouldTempC:
    "no mould, die or shell temperature logged: the first check for misruns and gas in permanent mould, investment and plaster",
  gating: "not recorded where the metal enters (bottom, side, top)",
  hasFilter: "not recorded whether a filter was used",
  densityIndexPct: "no reduced-pressure test (density index) logged",
};
const noteFor = (name: string) => {
  const spec = factSpec(name)!;
  return NOTES[name] ?? (spec.kind === "boolean" ? `not recorded: ${spec.label}` : `no ${spec.label} logged`);
};

/** true / false where the known facts decide a condition, undefined where an unknown fact could still swing it. */
function decide(c: Condition, facts: Facts): boolean | undefined {
  if ("all" in c) {
    const r = c.all.map((x) => decide(x, facts));
    return r.includes(false) ? false : r.includes(undefined) ? undefined : true;
  }
  if ("any" in c) {
    const r = c.any.map((x) => decide(x, facts));
    return r.includes(true) ? true : r.includes(undefined) ? undefined : false;
  }
  if ("not" in c) {
    const r = decide(c.not, facts);
    return r === undefined ? undefined : !r;
  }
  return c.operator !== "isMissing" && facts[c.fact] === undefined ? undefined : evaluateLeaf(c, facts[c.fact]);
}

/**
 * The inputs that would most change the ranking: for the rules (of the marked defects) that did not
 * fire but could have, had an unknown input been logged, the weight each unknown input held back.
 * Derived facts point back at the inputs they need.
 */
export function missingInputs(
  unfired: KbRule[],
  facts: Facts,
  weightFactor: (ruleId: string) => number,
  rankedCauseIds: ReadonlySet<string>,
  limit = 5,
): MissingInput[] {
  const blocked = new Map<string, number>();
  for (const rule of new Map(unfired.map((r) => [r.id, r])).values()) {
    // Evidence against a cause that is not in the list anyway changes nothing.
    if (rule.effect === "weakens" && !rankedCauseIds.has(rule.cause)) continue;
    if (decide(rule.conditions, facts) !== undefined) continue;
    const inputs = new Set<string>();
    for (const leaf of conditionLeaves(rule.conditions)) {
      if (leaf.operator === "isMissing" || facts[leaf.fact] !== undefined) continue;
      for (const name of NEEDS[leaf.fact] ?? [leaf.fact])
        if (facts[name] === undefined && !factSpec(name)!.derived) inputs.add(name);
    }
    for (const name of inputs)
      blocked.set(name, (blocked.get(name) ?? 0) + clamp01(rule.weight * weightFactor(rule.id)));
  }
  return [...blocked]
    .sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))
    .slice(0, limit)
    .map(([fact]) => ({ fact, label: factSpec(fact)!.label, note: noteFor(fact) }));
}

/** Derived facts, rounded for display (inputs are in the case already). */
export function displayFacts(facts: Facts): Record<string, number | boolean | string> {
  const out: Record<string, number | boolean | string> = {};
  for (const f of FACTS) {
    const v = roundFact(f.name, facts[f.name]);
    if (f.derived && v !== undefined) out[f.name] = v;
  }
  return out;
}
