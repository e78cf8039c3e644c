import { DEFAULT_UNITS, type Units } from "./notebook-schemas";

/**
 * A person's units and the conversions between them and the SI values the API keeps.
 * Every factor is an exact definition: °F = °C × 9/5 + 32 (the Fahrenheit scale as defined on the
 * Celsius one), 1 in = 25.4 mm and 1 lb = 0.45359237 kg (the 1959 international yard and pound).
 * tests/rules/units.test.ts checks them against convert-units, a general reference library.
 */
export type { Units };
export const SI_UNITS: Units = DEFAULT_UNITS;

export const MM_PER_IN = 25.4;
export const KG_PER_LB = 0.45359237;
const M_PER_FT = 0.3048;
/** Foam density: kg/m³ for a kg person, lb/ft³ (the unit foam is sold in) for a lb person. */
export const KG_M3_PER_LB_FT3 = KG_PER_LB / M_PER_FT ** 3;

/** Quantities the notebook's forms show. A temperature difference (superheat) has no +32 offset. */
export type Quantity = "temperature" | "temperature-difference" | "length" | "mass" | "density";

export function fromSi(q: Quantity, si: number, u: Units): number {
  switch (q) {
    case "temperature":
      return u.temperature === "F" ? (si * 9) / 5 + 32 : si;
    case "temperature-difference":
      return u.temperature === "F" ? (si * 9) / 5 : si;
    case "length":
      return u.length === "in" ? si / MM_PER_IN : si;
    case "mass":
      return u.mass === "lb" ? si / KG_PER_LB : si;
    case "density":
      return u.mass === "lb" ? si / KG_M3_PER_LB_FT3 : si;
  }
}

export function toSi(q: Quantity, value: number, u: Units): number {
  switch (q) {
    case "temperature":
      return u.temperature === "F" ? ((value - 32) * 5) / 9 : value;
    case "temperature-difference":
      return u.temperature === "F" ? (value * 5) / 9 : value;
    case "length":
      return u.length === "in" ? value * MM_PER_IN : value;
    case "mass":
      return u.mass === "lb" ? value * KG_PER_LB : value;
    case "density":
      return u.mass === "lb" ? value * KG_M3_PER_LB_FT3 : value;
  }
}

export function unitLabel(q: Quantity, u: Units): string {
  switch (q) {
    case "temperature":
    case "temperature-difference":
      return u.temperature === "F" ? "°F" : "°C";
    case "length":
      return u.length;
    case "mass":
      return u.mass;
    case "density":
      return u.mass === "lb" ? "lb/ft³" : "kg/m³";
  }
}

/** Decimals worth showing: a degree, a tenth of a mm, a thousandth of an inch (0.025 mm). */
function decimals(q: Quantity, u: Units): number {
  if (q === "temperature" || q === "temperature-difference") return 0;
  if (q === "length") return u.length === "in" ? 3 : 1;
  return u.mass === "lb" ? 2 : 1;
}

/** The value in the person's units as typed text ("1337", "0.25"), trailing zeros dropped. */
export function toField(q: Quantity, si: number | null | undefined, u: Units): string {
  if (si === null || si === undefined) return "";
  return String(Number(fromSi(q, si, u).toFixed(decimals(q, u))));
}

/** Typed text back to SI; "" is "not logged" (undefined), text that is not a number is NaN for the schema to refuse. */
export function fromField(q: Quantity, text: string, u: Units): number | undefined {
  const t = text.trim().replace(",", ".");
  if (t === "") return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? toSi(q, n, u) : Number.NaN;
}

/** "725 °C", "1337 °F", "0.197 in"; a dash where nothing was logged. */
export function formatValue(q: Quantity, si: number | null | undefined, u: Units): string {
  if (si === null || si === undefined) return "–";
  return `${toField(q, si, u)} ${unitLabel(q, u)}`;
}

/** The choices a person (or a shop's defaults for new members) picks units from, in words. */
export const UNIT_CHOICES = {
  temperature: [
    { value: "C", label: "°C" },
    { value: "F", label: "°F" },
  ],
  length: [
    { value: "mm", label: "mm" },
    { value: "in", label: "inches" },
  ],
  mass: [
    { value: "kg", label: "kg" },
    { value: "lb", label: "lb" },
  ],
} as const;
