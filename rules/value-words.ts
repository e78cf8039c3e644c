import type { Process } from "./case";

/**
 * Plain words for stored codes, one spelling for each wherever a person reads it (lib/labels.ts hands
 * these to the app; rule sentences, reasons and fact lists use `valueWord`). A code not listed reads
 * with its hyphens turned into spaces.
 */
export const PROCESS_WORDS: Record<Process, string> = {
  "green-sand": "green sand",
  "no-bake-sand": "no-bake sand",
  "lost-foam": "lost foam",
  investment: "investment",
  plaster: "plaster",
  "permanent-mould": "permanent mould",
};

// Alloy families in words: a caster reads "aluminium-silicon", not the code "al-si".
const FAMILY_WORDS: Record<string, string> = {
  "al-si": "aluminium-silicon",
  "al-si-cu": "aluminium-silicon-copper",
  "al-cu": "aluminium-copper",
  "al-mg": "aluminium-magnesium",
  "al-zn": "aluminium-zinc",
  "al-wrought": "wrought aluminium",
  "copper-base": "copper-base",
  "aluminium-bronze": "aluminium bronze",
};

const VALUE_WORDS: Record<string, string> = { ...PROCESS_WORDS, ...FAMILY_WORDS };

export const valueWord = (v: unknown) => (typeof v === "string" ? (VALUE_WORDS[v] ?? v.replace(/-/g, " ")) : String(v));
