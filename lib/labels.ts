import type { Charge, DegassingMethod, Process } from "../rules/case";

/** Plain words for stored codes, shown wherever a person reads them. */
export const PROCESS_LABELS: Record<Process, string> = {
  "green-sand": "green sand",
  "no-bake-sand": "no-bake sand",
  "lost-foam": "lost foam",
  investment: "investment",
  plaster: "plaster",
  "permanent-mould": "permanent mould",
};

export const CHARGE_LABELS: Record<Charge, string> = {
  ingot: "ingot",
  "clean-scrap": "clean scrap",
  "mixed-scrap": "mixed scrap",
};

export const DEGASSING_LABELS: Record<DegassingMethod, string> = {
  none: "none",
  "argon-lance": "argon lance",
  "nitrogen-lance": "nitrogen lance",
  rotary: "rotary",
  tablet: "tablet",
};

/** How a casting came out of the sand. */
export const OUTCOME_LABELS = { good: "good", rework: "needs rework", scrap: "scrap" } as const;
