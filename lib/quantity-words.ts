import { groupThousands, replaceQuantities, siWords, type QuantityToken } from "../rules/quantity-text";
import { fromSi, readingNumber, unitLabel, type Quantity, type Units } from "./units";

/**
 * Sentences of the knowledge base and the schemas' messages in a person's units: each quantity in
 * braces (rules/quantity-text.ts) is converted and rounded as a caster writes it; for an SI person
 * the figures stay as their author wrote them.
 */
const KIND_QUANTITY: Record<QuantityToken["kind"], Quantity> = {
  temperature: "temperature",
  "temperature-difference": "temperature-difference",
  length: "length",
  mass: "mass",
  density: "density",
  velocity: "velocity",
};

const inSi = (q: Quantity, u: Units) => fromSi(q, 1, u) === 1 && fromSi(q, 100, u) === 100;

export function quantityWords(token: QuantityToken, units: Units): string {
  const q = KIND_QUANTITY[token.kind];
  if (inSi(q, units)) return siWords(token);
  // A range keeps one rounding for both ends, so "3-4 mm" does not read "0.12-0.2 in".
  const shown = token.values.map((v) => readingNumber(q, v, units));
  const finest = Math.max(...shown.map((v) => (String(v).split(".")[1] ?? "").length));
  const words = token.values.map((v) => groupThousands(Number(fromSi(q, v, units).toFixed(finest))));
  return `${words.join("-")} ${unitLabel(q, units)}`;
}

/** "raise the pour temperature by {20-30 K}" -> "... by 36-54 °F" for a °F person. */
export const textInUnits = (text: string, units: Units) => replaceQuantities(text, (t) => quantityWords(t, units));

/** A ranked cause's fixes in the person's units; results saved before templates carry only the SI sentences. */
export const fixesInUnits = (cause: { fixes: string[]; fixTemplates?: string[] }, units: Units) =>
  cause.fixTemplates?.map((t) => textInUnits(t, units)) ?? cause.fixes;
