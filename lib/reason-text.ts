import { factSpec } from "../rules/fact-catalog";
import { FACT_PLACEHOLDER } from "../rules/quantity-text";
import type { Reason } from "../rules/rank";
import { valueWord } from "../rules/value-words";
import { textInUnits } from "./quantity-words";
import { readingNumber, unitLabel, type Quantity, type Units } from "./units";

/** Fact quantities a person may see in their own units, with the SI unit the rule texts write after them. */
const SI_TOKEN: Partial<Record<Quantity, string>> = {
  temperature: "°C",
  "temperature-difference": "°C",
  length: "mm",
  density: "kg/m³",
  velocity: "m/s",
  area: "mm²",
};

function quantityOf(name: string): Quantity | undefined {
  const spec = factSpec(name);
  const q = spec?.kind === "number" ? (spec.quantity as string) : undefined;
  return q && q in SI_TOKEN ? (q as Quantity) : undefined;
}

function plain(value: Reason["values"][string]): string {
  if (value === null || value === undefined) return "unknown";
  if (typeof value === "boolean") return value ? "yes" : "no";
  return valueWord(value);
}

const PLACEHOLDER_AND_UNIT = new RegExp(`${FACT_PLACEHOLDER.source}(\\s*)(°C|mm²|mm|kg/m³|m/s)?`, "g");

/**
 * A rule's reason in the person's units: the figures the rule's author wrote ({3-4 mm}) and each quoted
 * temperature, size, density or velocity are converted, and the SI unit written right after a quoted
 * value is swapped for theirs ("{pourTempC} °C" -> "1373 °F"). SI values stay as the engine rounded them.
 */
export function reasonInUnits(reason: Reason, units: Units): string {
  const text = textInUnits(reason.template, units).replace(
    PLACEHOLDER_AND_UNIT,
    (whole, name: string, gap: string, token?: string) => {
      const value = reason.values[name];
      const q = quantityOf(name);
      if (!q || typeof value !== "number") return plain(value) + gap + (token ?? "");
      const inSi = unitLabel(q, units) === SI_TOKEN[q];
      const shown = inSi ? value : readingNumber(q, value, units);
      const unit = token && token === SI_TOKEN[q] ? unitLabel(q, units) : token;
      return String(shown) + gap + (unit ?? "");
    },
  );
  return reason.against ? `Against: ${text}` : text;
}

/**
 * A rule's reason as its template, for the rulebook: figures in the reader's units and the unit after
 * each placeholder swapped to theirs ("{minSectionMm} in, under the 0.12-0.16 in"), placeholders kept.
 */
export function reasonTemplateInUnits(template: string, units: Units): string {
  return textInUnits(template, units).replace(
    PLACEHOLDER_AND_UNIT,
    (whole, name: string, gap: string, token?: string) => {
      const q = quantityOf(name);
      return q && token && token === SI_TOKEN[q] ? `{${name}}${gap}${unitLabel(q, units)}` : whole;
    },
  );
}
