import { factSpec } from "../rules/fact-catalog";
import type { Reason } from "../rules/rank";
import { fromSi, unitLabel, type Quantity, type Units } from "./units";

/** Fact quantities a person may see in their own units, with the SI unit the rule texts write after them. */
const SI_TOKEN: Partial<Record<Quantity, string>> = {
  temperature: "°C",
  "temperature-difference": "°C",
  length: "mm",
  density: "kg/m³",
};

function quantityOf(name: string): Quantity | undefined {
  const spec = factSpec(name);
  const q = spec?.kind === "number" ? (spec.quantity as string) : undefined;
  return q && q in SI_TOKEN ? (q as Quantity) : undefined;
}

const decimals = (q: Quantity, u: Units) =>
  q === "length" && u.length === "in" ? 2 : q === "density" && u.mass === "lb" ? 2 : 0;

function plain(value: Reason["values"][string]): string {
  if (value === null || value === undefined) return "unknown";
  if (typeof value === "boolean") return value ? "yes" : "no";
  return typeof value === "string" ? value.replace(/-/g, " ") : String(value);
}

/**
 * A rule's reason in the person's units: each quoted temperature, size or density is converted, and the
 * SI unit written right after it in the rule's sentence is swapped for theirs ("{pourTempC} °C" -> "1373 °F").
 */
export function reasonInUnits(reason: Reason, units: Units): string {
  const text = reason.template.replace(
    /\{([^}]+)\}(\s*)(°C|mm|kg\/m³)?/g,
    (whole, name: string, gap: string, token?: string) => {
      const value = reason.values[name];
      const q = quantityOf(name);
      if (!q || typeof value !== "number") return plain(value) + gap + (token ?? "");
      const inSi = unitLabel(q, units) === SI_TOKEN[q] || (q === "density" && units.mass === "kg");
      const shown = inSi ? value : Number(fromSi(q, value, units).toFixed(decimals(q, units)));
      const unit = token && token === SI_TOKEN[q] ? unitLabel(q, units) : token;
      return String(shown) + gap + (unit ?? "");
    },
  );
  return reason.against ? `Against: ${text}` : text;
}
