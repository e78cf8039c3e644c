/**
 * Inches as casters write them on a pattern or a pour log: a decimal (0.125, .5), a fraction (1/8, 3/4),
 * a whole number and a fraction (1 1/2 or 1-1/2), each with or without the inch mark (", ″, in).
 * Anything else is not a number (NaN), so the form can say how to write it.
 */
const INCH_MARK = /\s*(?:["”″]|in\.?|inch(?:es)?)$/i;
const DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)$/;
const FRACTION = /^(?:(\d+)(?:\s+|\s*-\s*))?(\d+)\s*\/\s*(\d+)$/;

export const INCH_HINT = 'type inches as 1.5, 1 1/2, 1-1/2 or 3/4"';

export function parseInches(text: string): number {
  const t = text.trim().replace(INCH_MARK, "").trim();
  if (DECIMAL.test(t)) return Number(t);
  const m = FRACTION.exec(t);
  if (!m) return Number.NaN;
  const whole = m[1] === undefined ? 0 : Number(m[1]);
  const top = Number(m[2]);
  const bottom = Number(m[3]);
  // "1 3/2" or "1/0" is a slip, not a size: refuse it rather than guess.
  if (bottom === 0 || (m[1] !== undefined && top >= bottom)) return Number.NaN;
  return whole + top / bottom;
}
