import { z } from "zod";
import { DEFECT_LOCATIONS, DEFECT_TYPES } from "./case";
import { factSpec, METALS, type FactSpec } from "./fact-catalog";
import { FACT_PLACEHOLDER, strayBraces } from "./quantity-text";

/**
 * The rule file format (rules/kb/<family>.json) and its load-time checks. A rule that would
 * silently never fire (unknown fact, an operator that cannot apply to the fact, an enum value the
 * fact never takes) is refused with a message naming the rule and the field.
 */
export type Leaf = { fact: string; operator: string; value: unknown };
export type Condition = Leaf | { all: Condition[] } | { any: Condition[] } | { not: Condition };

const leafSchema = z.strictObject({ fact: z.string().min(1), operator: z.string().min(1), value: z.unknown() });
export const conditionSchema: z.ZodType<Condition> = z.lazy(() =>
  z.union([
    leafSchema,
    z.strictObject({ all: z.array(conditionSchema).min(1) }),
    z.strictObject({ any: z.array(conditionSchema).min(1) }),
    z.strictObject({ not: conditionSchema }),
  ]),
) as z.ZodType<Condition>;
const topConditionSchema = z.union([
  z.strictObject({ all: z.array(conditionSchema).min(1) }),
  z.strictObject({ any: z.array(conditionSchema).min(1) }),
  z.strictObject({ not: conditionSchema }),
]);

const text = z.string().trim().min(1);
/** A fix or caution: its figures are quantities in braces (rules/quantity-text.ts), and nothing else is. */
const sentence = text.refine((t) => strayBraces(t).length === 0 && t.search(FACT_PLACEHOLDER) < 0, {
  message: "braces hold only a quantity such as {730-790 °C}, {20-30 K} or {4 mm}",
});
export const causeSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "ids are lower-case words joined by hyphens"),
  title: text,
  /** Fixes for every metal: they name no metal. */
  fixes: z.array(sentence).min(1, "a cause needs at least one fix"),
  cautions: z.array(sentence).optional(),
  /** Practice that belongs to one metal (aluminium, copper, iron): shown only for cases of that metal. */
  fixesByMetal: z.partialRecord(z.enum(METALS), z.array(sentence).min(1)).optional(),
  cautionsByMetal: z.partialRecord(z.enum(METALS), z.array(sentence).min(1)).optional(),
});
export const ruleSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "ids are lower-case words joined by hyphens"),
  explains: z
    .array(
      z.strictObject({ type: z.enum(DEFECT_TYPES), locations: z.array(z.enum(DEFECT_LOCATIONS)).min(1).optional() }),
    )
    .min(1, "a rule explains at least one defect type"),
  cause: z.string().min(1),
  effect: z.enum(["supports", "weakens"]).default("supports"),
  weight: z.number().gt(0, "weight must be above 0").lte(1, "weight must be at most 1"),
  conditions: topConditionSchema,
  because: text,
  sources: z.array(text).min(1, 'name at least one source (or "common practice", "shop experience")'),
});
export const ruleFileSchema = z.strictObject({
  family: z.string().min(1),
  title: text,
  causes: z.array(causeSchema),
  rules: z.array(ruleSchema),
});
export type KbCause = z.infer<typeof causeSchema>;
export type KbRule = z.infer<typeof ruleSchema>;
export type RuleFile = z.infer<typeof ruleFileSchema>;
export type RuleSet = { version: string; causes: KbCause[]; rules: KbRule[] };

export class RuleFileError extends Error {
  constructor(readonly problems: string[]) {
    super(`The knowledge base has ${problems.length} problem(s):\n- ${problems.join("\n- ")}`);
    this.name = "RuleFileError";
  }
}

/**
 * The format's operators, as the engine runs them. A comparison with an unknown fact is false: a
 * missing input is never read as zero or as "something else"; isMissing asks about that directly.
 */
type Op = (fact: unknown, value: never) => boolean;
export const isKnown = (v: unknown) => v !== undefined && v !== null;
export const OPERATORS: Record<string, Op> = {
  equal: (a, b) => a === b,
  notEqual: (a, b) => a !== b,
  in: (a, b: unknown[]) => b.includes(a),
  notIn: (a, b: unknown[]) => !b.includes(a),
  lessThan: (a, b: number) => (a as number) < b,
  lessThanInclusive: (a, b: number) => (a as number) <= b,
  greaterThan: (a, b: number) => (a as number) > b,
  greaterThanInclusive: (a, b: number) => (a as number) >= b,
  between: (a, [lo, hi]: [number, number]) => (a as number) >= lo && (a as number) <= hi,
  isMissing: (a, b: boolean) => !isKnown(a) === b,
};
export const evaluateLeaf = (leaf: Leaf, factValue: unknown) =>
  leaf.operator === "isMissing" || isKnown(factValue)
    ? OPERATORS[leaf.operator](factValue, leaf.value as never)
    : false;

const COMPARE = ["lessThan", "lessThanInclusive", "greaterThan", "greaterThanInclusive"];
const isNum = (v: unknown) => typeof v === "number" && Number.isFinite(v);

/** Problems with one leaf condition, or [] when it fits its fact. */
function checkLeaf(leaf: Leaf, spec: FactSpec): string[] {
  const { operator: op, value: v } = leaf;
  const on = `operator "${op}" on ${spec.kind} fact "${spec.name}"`;
  if (op === "isMissing") return typeof v === "boolean" ? [] : [`${on} needs true or false`];
  if (spec.kind === "number") {
    if (COMPARE.includes(op) || op === "equal" || op === "notEqual") return isNum(v) ? [] : [`${on} needs a number`];
    if (op === "between")
      return Array.isArray(v) && v.length === 2 && v.every(isNum) && v[0] <= v[1] ? [] : [`${on} needs [low, high]`];
    if (op === "in" || op === "notIn")
      return Array.isArray(v) && v.length > 0 && v.every(isNum) ? [] : [`${on} needs a list of numbers`];
    return [`${on} is not allowed`];
  }
  if (spec.kind === "boolean") {
    if (op === "equal" || op === "notEqual") return typeof v === "boolean" ? [] : [`${on} needs true or false`];
    return [`${on} is not allowed (use equal, notEqual or isMissing)`];
  }
  const known = (x: unknown) => typeof x === "string" && spec.values.includes(x);
  const bad = (x: unknown) =>
    `value ${JSON.stringify(x)} is not one of ${spec.name}'s values (${spec.values.join(", ")})`;
  if (op === "equal" || op === "notEqual") return known(v) ? [] : [bad(v)];
  if (op === "in" || op === "notIn") {
    if (!Array.isArray(v) || v.length === 0) return [`${on} needs a list`];
    return v.filter((x) => !known(x)).map(bad);
  }
  return [`${on} is not allowed (use equal, notEqual, in, notIn or isMissing)`];
}

function checkCondition(c: Condition, path: string, out: string[]) {
  if ("all" in c) return c.all.forEach((x, i) => checkCondition(x, `${path}.all[${i}]`, out));
  if ("any" in c) return c.any.forEach((x, i) => checkCondition(x, `${path}.any[${i}]`, out));
  if ("not" in c) return checkCondition(c.not, `${path}.not`, out);
  const spec = factSpec(c.fact);
  if (!spec) return void out.push(`${path}.fact: "${c.fact}" is not a known fact`);
  for (const p of checkLeaf(c, spec)) out.push(`${path}: ${p}`);
}

/** Every fact name a condition reads, with the operator it is read with. */
export function conditionLeaves(c: Condition, out: Leaf[] = []): Leaf[] {
  if ("all" in c) c.all.forEach((x) => conditionLeaves(x, out));
  else if ("any" in c) c.any.forEach((x) => conditionLeaves(x, out));
  else if ("not" in c) conditionLeaves(c.not, out);
  else out.push(c);
  return out;
}

/** Problems with one parsed rule, given the cause ids known; each names the rule and the field. */
export function checkRule(rule: KbRule, causeIds: ReadonlySet<string>): string[] {
  const out: string[] = [];
  checkCondition(rule.conditions, "conditions", out);
  if (!causeIds.has(rule.cause)) out.push(`cause: "${rule.cause}" is not a defined cause id`);
  for (const [, name] of rule.because.matchAll(FACT_PLACEHOLDER))
    if (!factSpec(name)) out.push(`because: placeholder {${name}} is not a fact name`);
  for (const stray of strayBraces(rule.because))
    out.push(`because: ${stray} is neither a fact name nor a quantity such as {3-4 mm}`);
  return out.map((p) => `rule "${rule.id}" ${p}`);
}

const describeIssue = (file: string, raw: unknown, issue: z.core.$ZodIssue) => {
  const [k, i, ...rest] = issue.path;
  const list = (raw as Record<string, unknown> | null)?.[k as string];
  const id = Array.isArray(list) && typeof i === "number" ? (list[i] as { id?: unknown })?.id : undefined;
  const where =
    id !== undefined ? `${k === "rules" ? "rule" : "cause"} "${String(id)}" ${rest.join(".")}` : issue.path.join(".");
  return `${file}: ${where}: ${issue.message}`;
};

/** Parse and cross-check rule files; throws RuleFileError listing every problem found. */
export function validateRuleFiles(files: { name: string; json: unknown }[]): { causes: KbCause[]; rules: KbRule[] } {
  const problems: string[] = [];
  const parsed: { name: string; file: RuleFile }[] = [];
  for (const { name, json } of files) {
    const r = ruleFileSchema.safeParse(json);
    if (r.success) parsed.push({ name, file: r.data });
    else problems.push(...r.error.issues.map((iss) => describeIssue(name, json, iss)));
  }
  const causes = parsed.flatMap((p) => p.file.causes);
  const rules = parsed.flatMap((p) => p.file.rules);
  const seen = (ids: string[], what: string) =>
    ids.filter((id, i) => ids.indexOf(id) !== i).forEach((id) => problems.push(`${what} "${id}" is defined twice`));
  seen(
    causes.map((c) => c.id),
    "cause",
  );
  seen(
    rules.map((r) => r.id),
    "rule",
  );
  const causeIds = new Set(causes.map((c) => c.id));
  for (const p of parsed)
    for (const r of p.file.rules) problems.push(...checkRule(r, causeIds).map((m) => `${p.name}: ${m}`));
  if (problems.length) throw new RuleFileError(problems);
  return { causes, rules };
}
