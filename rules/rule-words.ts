import { factSpec, type FactQuantity, type FactSpec } from "./fact-catalog";
import type { Condition, Leaf } from "./kb-schema";
import { valueWord } from "./value-words";

/**
 * Rules in plain words, for the rulebook and its version differences. Values are stored SI; the
 * app passes a formatter in the person's units, the server and tests use SI.
 */
export type NumberFact = Extract<FactSpec, { kind: "number" }>;
export type ValueFormat = (spec: NumberFact, si: number) => string;

export const SI_UNIT: Record<FactQuantity, string> = {
  temperature: "°C",
  "temperature-difference": "°C",
  length: "mm",
  velocity: "m/s",
  time: "s",
  minutes: "min",
  percent: "%",
  density: "kg/m³",
  hydrogen: "cm³/100 g",
  pressure: "kPa",
  area: "mm²",
  ratio: "",
  count: "",
};

const trim = (n: number) => String(Number(n.toFixed(Math.abs(n) >= 100 ? 0 : 2)));
export const siFormat: ValueFormat = (spec, si) =>
  `${trim(si)}${SI_UNIT[spec.quantity] ? ` ${SI_UNIT[spec.quantity]}` : ""}`;

export { valueWord };
const list = (vs: unknown[]) =>
  vs.length === 1 ? valueWord(vs[0]) : `${vs.slice(0, -1).map(valueWord).join(", ")} or ${valueWord(vs.at(-1))}`;

/** "pour temperature is below 650 °C", "flux used: no", "process is lost foam or plaster". */
export function describeLeaf(leaf: Leaf, fmt: ValueFormat = siFormat): string {
  const spec = factSpec(leaf.fact);
  const label = spec?.label ?? leaf.fact;
  const v = leaf.value;
  const num = (x: unknown) => (spec?.kind === "number" && typeof x === "number" ? fmt(spec, x) : valueWord(x));
  switch (leaf.operator) {
    case "isMissing":
      return `${label} ${v ? "is not logged" : "is logged"}`;
    case "lessThan":
      return `${label} is below ${num(v)}`;
    case "lessThanInclusive":
      return `${label} is at most ${num(v)}`;
    case "greaterThan":
      return `${label} is above ${num(v)}`;
    case "greaterThanInclusive":
      return `${label} is at least ${num(v)}`;
    case "between": {
      const [lo, hi] = v as [number, number];
      return `${label} is between ${num(lo)} and ${num(hi)}`;
    }
    case "equal":
      return typeof v === "boolean" ? `${label}: ${v ? "yes" : "no"}` : `${label} is ${num(v)}`;
    case "notEqual":
      return typeof v === "boolean" ? `${label}: ${v ? "no" : "yes"}` : `${label} is not ${num(v)}`;
    case "in":
      return `${label} is ${list(v as unknown[])}`;
    case "notIn":
      return `${label} is neither ${list(v as unknown[]).replace(/ or /, " nor ")}`;
    default:
      return `${label} ${leaf.operator} ${JSON.stringify(v)}`;
  }
}

/** A condition as nested groups of sentences, for a list on screen. */
export type ConditionWords = string | { join: "all" | "any" | "not"; parts: ConditionWords[] };
export function describeCondition(c: Condition, fmt: ValueFormat = siFormat): ConditionWords {
  if ("all" in c) return { join: "all", parts: c.all.map((x) => describeCondition(x, fmt)) };
  if ("any" in c) return { join: "any", parts: c.any.map((x) => describeCondition(x, fmt)) };
  if ("not" in c) return { join: "not", parts: [describeCondition(c.not, fmt)] };
  return describeLeaf(c, fmt);
}

export const JOIN_WORDS = { all: "all of these", any: "at least one of these", not: "not this" } as const;

/** The top-level conditions of a rule as single lines (groups folded into one line each). */
export function conditionLines(c: Condition, fmt: ValueFormat = siFormat): string[] {
  const flat = (w: ConditionWords): string =>
    typeof w === "string" ? w : `${JOIN_WORDS[w.join]}: (${w.parts.map(flat).join("; ")})`;
  const top = describeCondition(c, fmt);
  return typeof top !== "string" && top.join === "all" ? top.parts.map(flat) : [flat(top)];
}
