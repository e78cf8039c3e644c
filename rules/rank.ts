import type { DiagnosisCase } from "./case";
import { FACTS, factSpec, type Facts } from "./fact-catalog";
import { roundFact } from "./facts";
import { conditionLeaves, evaluateLeaf, type Condition, type KbCause, type KbRule } from "./kb-schema";

/**
 * A reason as data as well as words: the rule's sentence template and the (rounded, SI) values of the
 * facts it quotes, so the app can say it again in a person's own units. `because` is the SI text.
 */
export type Reason = { template: string; against: boolean; values: Record<string, string | number | boolean | null> };
export type RankedCause = {
  id: string;
  title: string;
  score: number;
  fixes: string[];
  because: string[];
  reasons: Reason[];
  sources: string[];
};
export type MissingInput = { fact: string; label: string; note: string };
export type DiagnosisResult = {
  causes: RankedCause[];
  facts: Record<string, number | boolean | string>;
  cautions: string[];
  missing: MissingInput[];
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
  return typeof v === "string" ? v.replace(/-/g, " ") : String(v);
};
export const fillBecause = (template: string, facts: Facts) =>
  template.replace(/\{([^}]+)\}/g, (_, name: string) => display(name, facts));

const reasonOf = (template: string, against: boolean, facts: Facts): Reason => {
  const values: Reason["values"] = {};
  for (const [, name] of template.matchAll(/\{([^}]+)\}/g)) values[name] = roundFact(name, facts[name]) ?? null;
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
      fixes: [...cause.fixes],
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

const SAFETY = {
  steam:
    "Molten metal and water do not mix: moisture in tools, scrap, moulds or on the floor turns to steam and can throw metal. Preheat tools and charge; pour over dry sand, not concrete.",
  ppe: "Wear a face shield, natural-fibre clothing, gloves and leather boots with trousers over them when melting and pouring.",
  foam: "Burning foam gives off styrene and other harmful fumes: pour lost-foam moulds with good ventilation.",
  flux: "Fluxes, fluoride fluxes especially, give off harmful fumes: use them under extraction.",
  argon:
    "Argon is odourless, heavier than air and collects in pits and low places where it can suffocate: ventilate, and read the gas's safety data sheet.",
  defer:
    "These notes do not replace local codes, the suppliers' safety data sheets and trained practice: follow those first.",
};

/** The top causes' own cautions, then the general ones for this case, ending with the deferral. */
export function cautionsFor(c: DiagnosisCase, topCauses: KbCause[]): string[] {
  const out = [...topCauses.flatMap((k) => k.cautions ?? []), SAFETY.steam, SAFETY.ppe];
  if (c.process === "lost-foam") out.push(SAFETY.foam);
  if (c.fluxed) out.push(SAFETY.flux);
  if (c.degassing === "argon-lance" || c.degassing === "rotary") out.push(SAFETY.argon);
  return [...new Set(out), SAFETY.defer];
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
