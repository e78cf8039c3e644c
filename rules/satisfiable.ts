import { factSpec, type FactQuantity } from "./fact-catalog";
import type { Condition, Leaf } from "./kb-schema";
import { describeLeaf, siFormat, type ValueFormat } from "./rule-words";

/**
 * "Could this rule ever fire?" Conditions are spread into alternatives (each a list of leaves that
 * must all hold); an alternative is impossible when the leaves on one fact contradict each other.
 * Only contradictions within one fact are found (pour temperature below 600 and above 700); links
 * between facts (superheat from pour temperature) are not. Comparisons on a missing fact are false
 * (rules/kb-schema.ts), so "not below 650" also holds when the value is missing.
 */
export type Contradiction = { fact: string; message: string };

const MAX_ALTERNATIVES = 256;
const leaf = (fact: string, operator: string, value: unknown): Leaf => ({ fact, operator, value });

function complement(l: Leaf): Condition {
  const missing = leaf(l.fact, "isMissing", true);
  const or = (...c: Condition[]): Condition => ({ any: [missing, ...c] });
  const flip: Record<string, string> = {
    lessThan: "greaterThanInclusive",
    lessThanInclusive: "greaterThan",
    greaterThan: "lessThanInclusive",
    greaterThanInclusive: "lessThan",
    equal: "notEqual",
    notEqual: "equal",
    in: "notIn",
    notIn: "in",
  };
  if (l.operator === "isMissing") return leaf(l.fact, "isMissing", !l.value);
  if (l.operator === "between") {
    const [lo, hi] = l.value as [number, number];
    return or(leaf(l.fact, "lessThan", lo), leaf(l.fact, "greaterThan", hi));
  }
  return or(leaf(l.fact, flip[l.operator] ?? l.operator, l.value));
}

/** Alternatives (disjunctive form), or null when there would be too many to look at. */
function alternatives(c: Condition, negate = false): Leaf[][] | null {
  if ("not" in c) return alternatives(c.not, !negate);
  if (!("all" in c) && !("any" in c)) return negate ? alternatives(complement(c)) : [[c]];
  const parts = ("all" in c ? c.all : c.any).map((p) => alternatives(p, negate));
  if (parts.some((p) => p === null)) return null;
  const conjunction = "all" in c !== negate;
  if (!conjunction) {
    const all = (parts as Leaf[][][]).flat();
    return all.length > MAX_ALTERNATIVES ? null : all;
  }
  let out: Leaf[][] = [[]];
  for (const p of parts as Leaf[][][]) {
    out = out.flatMap((a) => p.map((b) => [...a, ...b]));
    if (out.length > MAX_ALTERNATIVES) return null;
  }
  return out;
}

// Values a quantity can never leave: humidity and moisture are 0-100 %, sizes and times are not negative.
const DOMAIN: Partial<Record<FactQuantity, [number, number]>> = { percent: [0, 100] };
const NON_NEGATIVE: FactQuantity[] = [
  "length",
  "velocity",
  "time",
  "minutes",
  "density",
  "hydrogen",
  "pressure",
  "ratio",
  "count",
];

function numbersPossible(leaves: Leaf[], quantity: FactQuantity): boolean {
  let [lo, hi] = DOMAIN[quantity] ?? (NON_NEGATIVE.includes(quantity) ? [0, Infinity] : [-Infinity, Infinity]);
  let loIn = true;
  let hiIn = true;
  let allowed: number[] | null = null;
  const excluded: unknown[] = [];
  const above = (v: number, inclusive: boolean) => {
    if (v > lo || (v === lo && !inclusive)) [lo, loIn] = [v, inclusive];
  };
  const below = (v: number, inclusive: boolean) => {
    if (v < hi || (v === hi && !inclusive)) [hi, hiIn] = [v, inclusive];
  };
  const only = (vs: number[]) => (allowed = allowed ? allowed.filter((x) => vs.includes(x)) : vs);
  for (const { operator: op, value: v } of leaves) {
    if (op === "lessThan" || op === "lessThanInclusive") below(v as number, op === "lessThanInclusive");
    if (op === "greaterThan" || op === "greaterThanInclusive") above(v as number, op === "greaterThanInclusive");
    if (op === "between") {
      above((v as number[])[0], true);
      below((v as number[])[1], true);
    }
    if (op === "equal") only([v as number]);
    if (op === "in") only(v as number[]);
    if (op === "notEqual") excluded.push(v);
    if (op === "notIn") excluded.push(...(v as unknown[]));
  }
  const inside = (x: number) => (x > lo || (x === lo && loIn)) && (x < hi || (x === hi && hiIn));
  if (allowed) return (allowed as number[]).some((x) => inside(x) && !excluded.includes(x));
  if (lo > hi || (lo === hi && (!loIn || !hiIn))) return false;
  return lo !== hi || !excluded.includes(lo);
}

function valuesPossible(leaves: Leaf[], values: readonly unknown[]): boolean {
  let left = [...values];
  for (const { operator: op, value: v } of leaves) {
    if (op === "equal") left = left.filter((x) => x === v);
    if (op === "notEqual") left = left.filter((x) => x !== v);
    if (op === "in") left = left.filter((x) => (v as unknown[]).includes(x));
    if (op === "notIn") left = left.filter((x) => !(v as unknown[]).includes(x));
  }
  return left.length > 0;
}

/** Can all these leaves on one fact hold at once? */
function factPossible(fact: string, leaves: Leaf[]): boolean {
  const spec = factSpec(fact);
  if (!spec) return true; // checkRule reports unknown facts; nothing to say here
  const wantMissing = leaves.filter((l) => l.operator === "isMissing").map((l) => l.value);
  const compared = leaves.filter((l) => l.operator !== "isMissing");
  if (wantMissing.includes(true)) return !wantMissing.includes(false) && compared.length === 0;
  if (spec.kind === "number") return numbersPossible(compared, spec.quantity);
  return valuesPossible(compared, spec.kind === "boolean" ? [true, false] : spec.values);
}

/** The contradictions that make a condition impossible; [] when some case could satisfy it. */
export function contradictions(c: Condition, fmt: ValueFormat = siFormat): Contradiction[] {
  const alts = alternatives(c);
  if (!alts) return []; // too many alternatives to tell: say nothing rather than guess
  const found = new Map<string, Contradiction>();
  for (const alt of alts) {
    const byFact = new Map<string, Leaf[]>();
    for (const l of alt) byFact.set(l.fact, [...(byFact.get(l.fact) ?? []), l]);
    const bad = [...byFact].filter(([fact, leaves]) => !factPossible(fact, leaves));
    if (bad.length === 0) return [];
    for (const [fact, leaves] of bad) {
      const words = [...new Set(leaves.map((l) => describeLeaf(l, fmt)))];
      const message = `${words.join(" and ")}: these cannot all be true at once`;
      found.set(message, { fact, message });
    }
  }
  return [...found.values()];
}
