import { FACTS, type FactQuantity, type FactSpec } from "../rules/fact-catalog";
import type { Reason } from "../rules/rank";

/**
 * Made-up values for the rule form's preview of a reason, so its author sees the sentence a caster will
 * read. They are plausible figures of the kind each quantity takes (SI, as the engine passes them), not
 * advice and not from any case.
 */
const EXAMPLE_SI: Record<FactQuantity, number> = {
  temperature: 720,
  "temperature-difference": 60,
  length: 6,
  velocity: 0.5,
  time: 8,
  minutes: 10,
  percent: 4,
  density: 24,
  hydrogen: 0.7,
  pressure: 2.3,
  area: 200,
  ratio: 1.4,
  count: 2,
};

export function exampleValue(spec: FactSpec): string | number | boolean {
  if (spec.kind === "number") return EXAMPLE_SI[spec.quantity];
  if (spec.kind === "boolean") return true;
  return spec.values[0] ?? "";
}

/** The reason as a diagnosis would show it, each `{factName}` filled with its example value. */
export function exampleReason(template: string, against: boolean): Reason {
  const values: Reason["values"] = {};
  for (const spec of FACTS) values[spec.name] = exampleValue(spec);
  return { template, against, values };
}
