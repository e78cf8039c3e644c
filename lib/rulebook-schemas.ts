import { FACT_PLACEHOLDER, strayBraces } from "../rules/quantity-text";
import { z } from "zod";
import { DEFECT_LOCATIONS, DEFECT_TYPES, type DefectLocation, type DefectType } from "../rules/case";
import { FACTS, factSpec, type FactSpec } from "../rules/fact-catalog";
import type { Condition, KbRule, Leaf } from "../rules/kb-schema";
import type { RuleStatus } from "../rules/rule-diff";
import type { Backtest } from "../rules/backtest";
import type { CauseRecord, RuleRecord } from "../rules/calibration";
import type { Contradiction } from "../rules/satisfiable";
import { ruleSwitches } from "../db/mentor-schema";
import { requiredText, text } from "./fields";
import { tableInput } from "./table-schemas";
import type { PersonRef } from "./notebook-schemas";

/**
 * The rule form's shape (no JSON in sight: defect types, places, conditions picked from the fact
 * list with a comparison in words, a cause, a weight, a reason, sources), shared by the form and
 * the API. Values are SI; the form converts from the person's units before checking.
 */
export const COMPARISONS = ["below", "above", "between", "one-of", "not-one-of", "is", "missing"] as const;
export type Comparison = (typeof COMPARISONS)[number];
export const COMPARISON_WORDS: Record<Comparison, string> = {
  below: "is below",
  above: "is above",
  between: "is between",
  "one-of": "is one of",
  "not-one-of": "is not one of",
  is: "is",
  missing: "is missing",
};
export const comparisonsFor = (spec: FactSpec): Comparison[] =>
  spec.kind === "number"
    ? ["below", "above", "between", "missing"]
    : spec.kind === "enum"
      ? ["one-of", "not-one-of", "missing"]
      : ["is", "missing"];

export type ConditionRow = { fact: string; comparison: Comparison | ""; value?: unknown };

const isNum = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);

/** Problems with one condition row, keyed by its part: fact, comparison or value. */
export function rowProblems(row: ConditionRow): Partial<Record<"fact" | "comparison" | "value", string>> {
  const spec = factSpec(row.fact);
  if (!row.fact) return { fact: "choose what to look at" };
  if (!spec) return { fact: `"${row.fact}" is not something the rulebook knows about` };
  if (!row.comparison) return { comparison: "choose a comparison" };
  if (!comparisonsFor(spec).includes(row.comparison))
    return { comparison: `"${COMPARISON_WORDS[row.comparison] ?? row.comparison}" does not fit ${spec.label}` };
  const v = row.value;
  switch (row.comparison) {
    case "below":
    case "above":
      return isNum(v) ? {} : { value: "type a number" };
    case "between": {
      const [lo, hi] = Array.isArray(v) ? v : [];
      if (!isNum(lo) || !isNum(hi)) return { value: "type both numbers" };
      return lo <= hi ? {} : { value: "the first number is above the second" };
    }
    case "one-of":
    case "not-one-of": {
      if (!Array.isArray(v) || v.length === 0) return { value: "choose at least one" };
      const values = spec.kind === "enum" ? spec.values : [];
      const odd = v.find((x) => !values.includes(x as string));
      return odd === undefined ? {} : { value: `"${String(odd)}" is not a value of ${spec.label}` };
    }
    case "is":
      return typeof v === "boolean" ? {} : { value: "choose yes or no" };
    case "missing":
      return {};
  }
}

const conditionRow = z
  .object({
    fact: text(100),
    comparison: z.union([z.enum(COMPARISONS), z.literal("")]),
    value: z.unknown().optional(),
  })
  .superRefine((row, ctx) => {
    for (const [part, message] of Object.entries(rowProblems(row)))
      ctx.addIssue({ code: "custom", path: [part], message });
  });

const line = (what: string, max: number) => requiredText(what, max);
export const causeChoice = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("existing"), id: requiredText("choose a cause", 100) }),
    z.object({
      kind: z.literal("new"),
      title: line("name the cause", 200),
      fixes: z
        .array(line("write the fix or remove the line", 300))
        .min(1, "give at least one fix to try")
        .max(10, "at most 10 fixes"),
    }),
  ],
  { error: "choose a cause or name a new one" },
);
export type CauseChoice = z.infer<typeof causeChoice>;

export const ruleDraftInput = z.object({
  defectTypes: z.array(z.enum(DEFECT_TYPES)).min(1, "choose at least one defect this rule explains"),
  /** Empty: anywhere on the part. */
  locations: z.array(z.enum(DEFECT_LOCATIONS)).default([]),
  conditions: z.array(conditionRow).min(1, "add at least one condition").max(12, "at most 12 conditions"),
  effect: z.enum(["supports", "weakens"]).default("supports"),
  cause: causeChoice,
  weight: z
    .number({ error: "choose how strong the evidence is" })
    .gt(0, "weight must be above 0")
    .lte(1, "weight is at most 1"),
  because: line("say in a sentence why", 500).refine(
    (s) => [...s.matchAll(FACT_PLACEHOLDER)].every(([, name]) => factSpec(name)) && strayBraces(s).length === 0,
    "text in braces must be a fact name, or a figure and its SI unit (3-4 mm, 730 °C)",
  ),
  sources: z
    .array(line("write the source or remove the line", 300))
    .min(1, "name a source, or choose shop experience")
    .max(10),
});
export type RuleDraft = z.input<typeof ruleDraftInput>;
export type RuleDraftParsed = z.output<typeof ruleDraftInput>;

export const SHOP_EXPERIENCE = "shop experience";

export function rowToLeaf(row: ConditionRow): Leaf {
  const op = {
    below: "lessThan",
    above: "greaterThan",
    between: "between",
    "one-of": "in",
    "not-one-of": "notIn",
    is: "equal",
    missing: "isMissing",
  } as const;
  if (!row.comparison) throw new Error("a condition without a comparison");
  return { fact: row.fact, operator: op[row.comparison], value: row.comparison === "missing" ? true : row.value };
}

/** A shop rule back into form rows (shop rules are written by this form, so they are flat). */
export function leafToRow(l: Leaf): ConditionRow {
  const spec = factSpec(l.fact);
  const v = l.value;
  switch (l.operator) {
    case "lessThan":
    case "lessThanInclusive":
      return { fact: l.fact, comparison: "below", value: v };
    case "greaterThan":
    case "greaterThanInclusive":
      return { fact: l.fact, comparison: "above", value: v };
    case "between":
      return { fact: l.fact, comparison: "between", value: v };
    case "in":
      return { fact: l.fact, comparison: "one-of", value: v };
    case "notIn":
      return { fact: l.fact, comparison: "not-one-of", value: v };
    case "equal":
      return spec?.kind === "boolean"
        ? { fact: l.fact, comparison: "is", value: v }
        : { fact: l.fact, comparison: "one-of", value: [v] };
    case "notEqual":
      return spec?.kind === "boolean"
        ? { fact: l.fact, comparison: "is", value: !v }
        : { fact: l.fact, comparison: "not-one-of", value: [v] };
    default:
      return { fact: l.fact, comparison: "missing" };
  }
}

export function draftToRule(d: RuleDraftParsed, id: string, causeId: string): KbRule {
  return {
    id,
    explains: d.defectTypes.map((type) => (d.locations.length ? { type, locations: d.locations } : { type })),
    cause: causeId,
    effect: d.effect,
    weight: d.weight,
    conditions: { all: d.conditions.map(rowToLeaf) },
    because: d.because,
    sources: d.sources,
  };
}

export function ruleToDraft(r: KbRule): RuleDraft {
  const leaves = "all" in r.conditions ? (r.conditions.all as Leaf[]) : [];
  return {
    defectTypes: r.explains.map((e) => e.type),
    locations: r.explains[0]?.locations ?? [],
    conditions: leaves.map(leafToRow),
    effect: r.effect,
    cause: { kind: "existing", id: r.cause },
    weight: r.weight,
    because: r.because,
    sources: r.sources,
  };
}

/** Switching a built-in rule off or on: the rule_switches row, its rule id from the URL. */
export const switchInput = tableInput(ruleSwitches, { off: z.boolean({ error: "say whether the rule is off" }) }, [
  "ruleId",
]);
// The rule draft and a trial are not rows of a table (the draft becomes a version's rule JSON), so
// their schemas stay written out.
export const trialInput = z.object({ draft: z.unknown(), ruleId: text(100).optional() });

/** The facts the form offers, inputs first (what a caster logs), then the computed ones. */
export const PICKABLE_FACTS = [...FACTS].sort((a, b) => Number(a.derived) - Number(b.derived));

// ---- Answers ----
export type RuleSource = "built-in" | "shop";
export type RuleRow = {
  id: string;
  source: RuleSource;
  /** Built-in: the family's title; shop: "Written here". */
  family: string;
  explains: DefectType[];
  locations: DefectLocation[];
  cause: { id: string; title: string };
  effect: "supports" | "weakens";
  weight: number;
  /** Shown in words in the person's units (rules/rule-words.ts). */
  conditions: Condition;
  status: "built-in" | RuleStatus;
  /** Used in this shop's diagnoses right now (built-in and not switched off; shop rule with a published version). */
  inUse: boolean;
  switchedOff: boolean;
  record: RuleRecord | null;
  factor: number;
};
/** `fixes` in SI words; `fixTemplates` with their quantities in braces, for lib/quantity-words.ts. */
export type CauseOption = { id: string; title: string; fixes: string[]; fixTemplates?: string[]; shop: boolean };
export type Rulebook = { rules: RuleRow[]; causes: CauseOption[]; confirmedCases: number };
export type RuleVersion = {
  version: number;
  status: RuleStatus;
  rule: KbRule;
  createdBy: PersonRef | null;
  createdAt: string;
};
export type RuleSwitch = { off: boolean; createdBy: PersonRef | null; createdAt: string };
export type RuleDetail = RuleRow & {
  rule: KbRule;
  /** The cause's fixes as templates (quantities in braces): say them with lib/quantity-words.ts. */
  causeFixes: string[];
  sources: string[];
  versions: RuleVersion[];
  switches: RuleSwitch[];
  contradictions: Contradiction[];
};
export type SavedRule = RuleDetail & { warnings: Contradiction[] };
export type Trial = Backtest & { contradictions: Contradiction[]; causeTitles: Record<string, string> };
export type { CauseRecord, RuleRecord };
