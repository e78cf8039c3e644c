/**
 * Figures inside the knowledge base's sentences (fixes, cautions, reasons) and the input schemas'
 * messages are written as quantities in braces, so each reader gets them in their own units:
 * `{730-790 °C}` a temperature, `{20-30 K}` a temperature difference (a rise or a step, no +32 offset
 * in °F), `{4 mm}` a size, `{2 kg}` a mass, `{19-24 kg/m³}` a density, `{0.5 m/s}` a velocity. A single figure or a range of two.
 * Fact placeholders (`{pourTempC}`) start with a letter and are left alone here.
 * This file only says the figures in SI, as written; lib/quantity-words.ts says them in a person's units.
 */
export const QUANTITY_UNITS = {
  "°C": "temperature",
  K: "temperature-difference",
  mm: "length",
  kg: "mass",
  "kg/m³": "density",
  "m/s": "velocity",
} as const;
export type QuantityUnit = keyof typeof QUANTITY_UNITS;
export type QuantityKind = (typeof QUANTITY_UNITS)[QuantityUnit];

/** "{730-790 °C}": the first figure, the optional second one, and the SI unit. */
export const QUANTITY_PATTERN = /\{(-?\d+(?:\.\d+)?)(?:-(-?\d+(?:\.\d+)?))?\s*(°C|K|mm|kg\/m³|kg|m\/s)\}/g;
/** A fact placeholder: a name that starts with a letter ({pourTempC}). */
export const FACT_PLACEHOLDER = /\{([A-Za-z][A-Za-z0-9]*)\}/g;

export type QuantityToken = { values: number[]; unit: QuantityUnit; kind: QuantityKind };

/** One formatter for every call: `toLocaleString` builds a new one each time, a cost a list of cards pays per number. */
const GROUPED = new Intl.NumberFormat("en-US", { maximumFractionDigits: 3 });

/** Thousands grouped as the sentences write them: "1,700", "907", "0.5". */
export const groupThousands = (n: number) => (Math.abs(n) >= 1000 ? GROUPED.format(n) : String(n));

/** Replaces each quantity in a sentence with what `say` makes of it. */
export function replaceQuantities(text: string, say: (q: QuantityToken) => string): string {
  return text.replace(QUANTITY_PATTERN, (_, a: string, b: string | undefined, unit: QuantityUnit) =>
    say({ values: b === undefined ? [Number(a)] : [Number(a), Number(b)], unit, kind: QUANTITY_UNITS[unit] }),
  );
}

/** Whether a sentence holds a quantity in braces. */
export const hasQuantities = (text: string) => text.search(QUANTITY_PATTERN) >= 0;

/** SI words for a quantity: a temperature difference reads in °C, as casters say it ("20-30 °C hotter"). */
export const siWords = (q: QuantityToken) =>
  `${q.values.map(groupThousands).join("-")} ${q.unit === "K" ? "°C" : q.unit}`;

/** The sentence with its quantities in SI, as the rule's author wrote them. */
export const siText = (text: string) => replaceQuantities(text, siWords);

/** Text in braces that is neither a quantity nor a fact name: a typo the loader and the forms refuse. */
export function strayBraces(text: string): string[] {
  const rest = text.replace(QUANTITY_PATTERN, "").replace(FACT_PLACEHOLDER, "");
  return [...rest.matchAll(/\{[^}]*\}?|\}/g)].map((m) => m[0]);
}
