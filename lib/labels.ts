import type { Charge, DegassingMethod, Process } from "../rules/case";
import { PROCESS_WORDS, valueWord } from "../rules/value-words";

/** Plain words for stored codes, shown wherever a person reads them (one spelling: rules/value-words.ts). */
export const PROCESS_LABELS: Record<Process, string> = PROCESS_WORDS;
export { valueWord };

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

/**
 * One name for the water in the mould, the same on the melt form, the melt's conditions and the case sheet:
 * "sand moisture" for sand moulds, "mould moisture" for investment and plaster shells (lib/fact-fields.ts
 * lists both, so a link to the field finds it either way).
 */
export const moistureLabel = (process: Process | null | undefined) =>
  process === "investment" || process === "plaster" ? "Mould moisture" : "Sand moisture";
