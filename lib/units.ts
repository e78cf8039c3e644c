import { parseInches } from "./inch-text";
import type { Units } from "./notebook-schemas";

/**
 * A person's units and the conversions between them and the SI values the API keeps.
 * Every factor is an exact definition: °F = °C × 9/5 + 32 (the Fahrenheit scale as defined on the
 * Celsius one), 1 in = 25.4 mm and 1 lb = 0.45359237 kg (the 1959 international yard and pound).
 * tests/rules/units.test.ts checks them against convert-units, a general reference library.
 */
export type { Units };
// Written out rather than taken from lib/notebook-schemas.ts (whose DEFAULT_UNITS is this value): that
// module builds schemas from the tables, and the sign-in page, which reaches this one, should not carry them.
export const SI_UNITS: Units = { temperature: "C", length: "mm", mass: "kg" };

export const MM_PER_IN = 25.4;
export const KG_PER_LB = 0.45359237;
const M_PER_FT = 0.3048;
/** Foam density: kg/m³ for a kg person, lb/ft³ (the unit foam is sold in) for a lb person. */
export const KG_M3_PER_LB_FT3 = KG_PER_LB / M_PER_FT ** 3;

/**
 * Quantities that follow a person's choice. A temperature difference (superheat) has no +32 offset;
 * velocity (in/s) and area (in²) follow the length choice.
 */
export type Quantity = "temperature" | "temperature-difference" | "length" | "mass" | "density" | "velocity" | "area";
const MM_PER_M = 1000;

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
    case "velocity":
      return u.length === "in" ? (si * MM_PER_M) / MM_PER_IN : si;
    case "area":
      return u.length === "in" ? si / MM_PER_IN ** 2 : si;
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
    case "velocity":
      return u.length === "in" ? (value * MM_PER_IN) / MM_PER_M : value;
    case "area":
      return u.length === "in" ? value * MM_PER_IN ** 2 : value;
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
    case "velocity":
      return u.length === "in" ? "in/s" : "m/s";
    case "area":
      return u.length === "in" ? "in²" : "mm²";
  }
}

/**
 * Decimals a form keeps, fine enough that a value shown and saved again does not drift: a degree,
 * a tenth of a mm, a thousandth of an inch (0.025 mm), a hundredth of a pound.
 */
function decimals(q: Quantity, u: Units): number {
  if (q === "temperature" || q === "temperature-difference") return 0;
  if (q === "length") return u.length === "in" ? 3 : 1;
  if (q === "velocity") return 2;
  if (q === "area") return u.length === "in" ? 3 : 0;
  return u.mass === "lb" ? 2 : 1;
}

/**
 * Decimals for reading, as a caster would write the figure: whole degrees; 0.12 in under an inch and
 * 5.9 in above (not 0.118 or 5.906); a tenth of a mm, a tenth of a pound or kilogram; whole kg/m³ and
 * a tenth of a lb/ft³ (foam is sold as 1.2-1.5 lb/ft³). Common practice, not a standard.
 */
function readingDecimals(q: Quantity, v: number, u: Units): number {
  const a = Math.abs(v);
  switch (q) {
    case "temperature":
    case "temperature-difference":
      return 0;
    case "length":
      if (u.length === "mm") return a >= 100 ? 0 : 1;
      return a >= 100 ? 0 : a >= 1 ? 1 : a >= 0.01 ? 2 : 3;
    case "mass":
      return a >= 100 ? 0 : a >= 1 ? 1 : 2;
    case "density":
      return u.mass === "lb" ? (a >= 10 ? 0 : 1) : 0;
    case "velocity":
      return u.length === "in" ? 0 : 2;
    case "area":
      return u.length === "in" ? (a >= 10 ? 1 : 2) : 0;
  }
}

/** A value in the person's units, rounded for reading (trailing zeros dropped): "0.12", "5.9", "1337". */
export function readingNumber(q: Quantity, si: number, u: Units): number {
  const v = fromSi(q, si, u);
  return Number(v.toFixed(readingDecimals(q, v, u)));
}

/** The value in the person's units as typed text ("1337", "0.25"), trailing zeros dropped. */
export function toField(q: Quantity, si: number | null | undefined, u: Units): string {
  if (si === null || si === undefined) return "";
  return String(Number(fromSi(q, si, u).toFixed(decimals(q, u))));
}

/**
 * Typed text back to SI; "" is "not logged" (undefined), text that is not a number is NaN for the
 * schema to refuse. Inches may be typed as casters write them (lib/inch-text.ts): 1/8, 3/4", 1 1/2.
 */
export function fromField(q: Quantity, text: string, u: Units): number | undefined {
  const t = decimalText(text);
  if (t === "") return undefined;
  const n = q === "length" && u.length === "in" ? parseInches(t) : Number(t);
  return Number.isFinite(n) ? toSi(q, n, u) : Number.NaN;
}

/** "1,350" is grouped thousands (a °F pour temperature); a lone comma is a decimal comma ("0,25"). */
export const decimalText = (text: string) => {
  const t = text.trim();
  return /^-?\d{1,3}(,\d{3})+(\.\d+)?$/.test(t) ? t.replace(/,/g, "") : t.replace(",", ".");
};

/** Whether a field of this quantity takes fractions of an inch (and so needs a keyboard with / and "). */
export const takesInchFractions = (q: Quantity | null, u: Units) => q === "length" && u.length === "in";

/** "725 °C", "1337 °F", "0.2 in": rounded for reading; a dash where nothing was logged. */
export function formatValue(q: Quantity, si: number | null | undefined, u: Units): string {
  if (si === null || si === undefined) return "–";
  return `${readingNumber(q, si, u)} ${unitLabel(q, u)}`;
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
