import { factSpec } from "../rules/fact-catalog";

/**
 * Where a person logs each input of the diagnosis: the melt's form or the casting's, and the label of
 * the field there (server/diagnosis/stored-case.ts reads the same columns into the case). Inputs the
 * notebook does not keep yet (gating areas, compactability...) have no field, so they stay plain text.
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
};

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
