import { INCH_HINT } from "./inch-text";
import { decimalText, fromField, takesInchFractions, toField, type Quantity, type Units } from "./units";

/** How each number field of a form converts: a quantity in the person's units, or a plain number (%, s, minutes). */
export type NumberSpec<K extends string> = Record<K, Quantity | null>;

/** Stored SI values to the text a form shows, in the person's units. */
export function numbersToText<S extends NumberSpec<string>>(
  spec: S,
  values: { [K in keyof S]?: number | null },
  units: Units,
) {
  const out = {} as Record<keyof S & string, string>;
  for (const key of Object.keys(spec) as (keyof S & string)[]) {
    const q = spec[key];
    const v = values[key];
    out[key] = v === null || v === undefined ? "" : q ? toField(q, v, units) : String(v);
  }
  return out;
}

/**
 * Typed text back to SI numbers for the API: empty text is null (not logged, and clears a stored
 * value on a change), text that is not a number gets a message of its own rather than zod's (for
 * inches, how to write them: 1 1/2 or 3/4" are numbers too).
 */
export function textToNumbers<S extends NumberSpec<string>>(
  spec: S,
  text: Record<keyof S & string, string>,
  units: Units,
) {
  const values = {} as Record<keyof S & string, number | null>;
  const errors: Record<string, string> = {};
  for (const key of Object.keys(spec) as (keyof S & string)[]) {
    const q = spec[key];
    const t = text[key] ?? "";
    const n = q ? fromField(q, t, units) : t.trim() === "" ? undefined : Number(decimalText(t));
    if (n !== undefined && Number.isNaN(n))
      errors[key] = takesInchFractions(q, units)
        ? `${INCH_HINT}, or leave it empty`
        : "type a number, or leave it empty";
    values[key] = n === undefined || Number.isNaN(n) ? null : n;
  }
  return { values, errors };
}
