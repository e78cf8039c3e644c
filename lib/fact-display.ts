import { factSpec, type FactQuantity } from "../rules/fact-catalog";
import { valueWord } from "../rules/value-words";
import { formatValue, type Quantity, type Units } from "./units";

/** Units of the quantities that no person's choice changes. */
const FIXED: Partial<Record<FactQuantity, string>> = {
  time: "s",
  minutes: "min",
  percent: "%",
  hydrogen: "cm³ per 100 g",
  pressure: "kPa",
};
const CONVERTED: Partial<Record<FactQuantity, Quantity>> = {
  temperature: "temperature",
  "temperature-difference": "temperature-difference",
  length: "length",
  density: "density",
  velocity: "velocity",
  area: "area",
};

/** A derived fact as a person reads it: its label and its value in their units ("superheat at pouring: 171 °F"). */
export function formatFact(
  name: string,
  value: number | boolean | string,
  units: Units,
): { label: string; value: string } {
  const spec = factSpec(name);
  const label = spec?.label ?? name;
  if (typeof value === "boolean") return { label, value: value ? "yes" : "no" };
  if (typeof value === "string") return { label, value: valueWord(value) };
  if (spec?.kind !== "number") return { label, value: String(value) };
  const q = CONVERTED[spec.quantity];
  if (q) return { label, value: formatValue(q, value, units) };
  const unit = FIXED[spec.quantity];
  return { label, value: unit ? `${value} ${unit}` : String(value) };
}
