import { factSpec } from "../rules/fact-catalog";
import { CASTING_CONDITIONS, MELT_CONDITIONS } from "./condition-fields";

/**
 * Where a person logs each input of the diagnosis: the melt's form or the casting's, and the label of
 * the field there (server/diagnosis/stored-case.ts reads the same columns into the case). The pour
 * conditions beyond the everyday ones (lib/condition-fields.ts) come with their own labels.
 */
export type FactField = { form: "melt" | "casting"; labels: string[] };
const melt = (...labels: string[]): FactField => ({ form: "melt", labels });
const casting = (...labels: string[]): FactField => ({ form: "casting", labels });

const FIELDS: Record<string, FactField> = {
  pourTempC: melt("Pour temperature"),
  meltTempC: melt("Hottest the melt got"),
  charge: melt("Charge"),
  degassing: melt("Degassing"),
  degasMinutes: melt("Degassing time"),
  fluxed: melt("Flux used"),
  skimmed: melt("Skimmed before pouring"),
  ambientTempC: melt("Air temperature"),
  humidityPct: melt("Humidity"),
  sandMoisturePct: melt("Sand moisture", "Mould moisture"),
  coatingApplied: melt("Coating applied"),
  coatingDried: melt("Coating dried before pouring"),
  coatingCoats: melt("Coats"),
  foamDensityKgM3: melt("Foam density"),
  minSectionMm: casting("Thinnest section"),
  maxSectionMm: casting("Thickest section"),
  sprueHeightMm: casting("Sprue height"),
  pourTimeS: casting("Pour time"),
  hasRiser: casting("Riser"),
  hasOverflow: casting("Overflow"),
  hasVents: casting("Vents"),
  ...Object.fromEntries(MELT_CONDITIONS.flatMap((g) => g.fields).map((f) => [f.key, melt(f.label)])),
  ...Object.fromEntries(CASTING_CONDITIONS.flatMap((g) => g.fields).map((f) => [f.key, casting(f.label)])),
};

/** Whether a diagnosis input is one of the melt's folded-away conditions, which the form then opens. */
export const isMeltCondition = (fact: string) => MELT_CONDITIONS.some((g) => g.fields.some((f) => f.key === fact));

export const fieldOfFact = (fact: string): FactField | undefined => FIELDS[fact];

/** The diagnosis contract's fields as a person reads them, for "changed since: pour temperature, the marks". */
export function caseFieldWords(fields: string[]): string {
  const words = fields.map((f) =>
    f === "defects"
      ? "the marks"
      : f === "coating"
        ? "the coating"
        : (factSpec(f)?.label ?? f.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`)),
  );
  return [...new Set(words)].join(", ");
}
