import type { FactQuantity, FactSpec } from "../rules/fact-catalog";
import { SI_UNIT, type NumberFact, type ValueFormat } from "../rules/rule-words";
import { fromField, toField, unitLabel, type Quantity, type Units } from "./units";

/**
 * The rule form's numbers in the person's units (lib/units.ts). Temperatures, lengths, densities,
 * velocities and areas follow the person's choice; times, percentages and the rest have one unit for
 * everyone and stay as the rules store them.
 */
const CONVERTED: Partial<Record<FactQuantity, Quantity>> = {
  temperature: "temperature",
  "temperature-difference": "temperature-difference",
  length: "length",
  density: "density",
  velocity: "velocity",
  area: "area",
};

export const factUnit = (spec: NumberFact, u: Units) => {
  const q = CONVERTED[spec.quantity];
  return q ? unitLabel(q, u) : SI_UNIT[spec.quantity];
};

/** Stored SI value → the text the form shows. */
export function siToText(spec: NumberFact, si: unknown, u: Units): string {
  if (typeof si !== "number") return "";
  const q = CONVERTED[spec.quantity];
  return q ? toField(q, si, u) : String(si);
}

/** Typed text → SI; undefined when empty, NaN when it is not a number (the schema says so). */
export function textToSi(spec: NumberFact, text: string, u: Units): number | undefined {
  const q = CONVERTED[spec.quantity];
  if (q) return fromField(q, text, u);
  const t = text.trim().replace(",", ".");
  return t === "" ? undefined : Number.isFinite(Number(t)) ? Number(t) : Number.NaN;
}

/** For rules/rule-words.ts: "1274 °F", "0.5 in", "4 %". */
export const unitsFormat =
  (u: Units): ValueFormat =>
  (spec, si) => {
    const unit = factUnit(spec, u);
    return `${siToText(spec, Number(si.toFixed(6)), u)}${unit ? ` ${unit}` : ""}`;
  };

/** A fact's label with the unit a person reads it in. */
export const factLabel = (spec: FactSpec, u: Units) => {
  const unit = spec.kind === "number" ? factUnit(spec, u) : "";
  return unit ? `${spec.label} (${unit})` : spec.label;
};
