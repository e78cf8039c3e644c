import type { DiagnosisCase } from "./case";
import type { Facts } from "./fact-catalog";
import { siText } from "./quantity-text";

/**
 * Cautions around melting and pouring, by alloy and practice. Each names the source family it rests on
 * (docs/gating-and-copper-facts.md "Safety" lists the figures and their tags) and none replaces local
 * codes, the suppliers' safety data sheets (SDS) or trained practice: DEFER says so, always last.
 * Figures are quantities in braces (rules/quantity-text.ts), so each person reads them in their units.
 */
export type Caution = { id: string; text: string; source: string };

const c = (id: string, text: string, source: string): Caution => ({ id, text, source });

export const CAUTIONS = {
  steam: c(
    "steam",
    "Molten metal and water do not mix: moisture in tools, scrap, moulds or on the floor turns to steam about 1,700 times its volume and can throw metal. Preheat tools and charge; pour over dry sand, not concrete.",
    "Aluminum Association molten-metal safety guidance and incident reporting",
  ),
  ppe: c(
    "ppe",
    "Wear a face shield, natural-fibre clothing, gloves and leather boots with trousers over them when melting and pouring.",
    "Aluminum Association molten-metal safety guidance; common practice",
  ),
  hotAluminium: c(
    "hot-aluminium",
    "Hot aluminium does not glow: at pouring heat it looks like cold metal. Treat every crucible, skimmer, sprue and casting as hot until checked.",
    "low emissivity of aluminium; common practice",
  ),
  infrared: c(
    "infrared",
    "Copper alloys and iron radiate strong infrared at pouring heat: watch the melt through infrared filter lenses (a shade of about 3-5) to guard against cataract; welding shade tables do not cover pouring.",
    "OSHA 29 CFR 1910.133 (eye protection) and occupational-health guidance on infrared cataract",
  ),
  zincFume: c(
    "zinc-fume",
    "Brass and other zinc-bearing alloys give off zinc oxide fume, worst when overheated (zinc boils near {907 °C}, below brass pouring heat): it causes metal fume fever hours later. Melt with local exhaust or outdoors and keep the melt no hotter than needed.",
    "OSHA and NIOSH exposure limits for zinc oxide fume (5 mg/m³); metal fume fever literature",
  ),
  lead: c(
    "lead",
    "This alloy contains lead: melting and pouring give off lead fume and dust. Use exhaust, keep food and drink away, wash before eating, and follow the lead rules that apply to foundries where you are.",
    "OSHA lead standard 29 CFR 1910.1025; the alloy's safety data sheet",
  ),
  unknownCopperScrap: c(
    "unknown-copper-scrap",
    "Unknown copper scrap may hold beryllium copper (beryllium fume causes chronic beryllium disease) or cadmium (plating, silver solder; its fume gives no warning). Keep unidentified springs, contacts and plated parts out of the charge.",
    "OSHA beryllium (2017) and cadmium standards; beryllium-alloy makers' hazard sheets; scrap-industry guidance",
  ),
  inertGas: c(
    "inert-gas",
    "Argon and nitrogen are odourless asphyxiants; argon is heavier than air and collects in pits and low places. Degas only with good ventilation, never in a closed, low space, and read the gas supplier's safety data sheet.",
    "industrial-gas suppliers' safety data sheets",
  ),
  chlorinatedTablet: c(
    "chlorinated-tablet",
    "Degassing tablets of hexachloroethane give fumes with hexachlorobenzene and other chlorinated organics (hexachloroethane is reasonably anticipated to be a human carcinogen): use them only under extraction, or degas with dry argon or nitrogen instead.",
    "NTP Report on Carcinogens; the tablet's safety data sheet",
  ),
  flux: c(
    "flux",
    "Fluxes, fluoride and chloride fluxes especially, give off harmful fumes: use them under extraction and follow the supplier's safety data sheet.",
    "flux suppliers' safety data sheets",
  ),
  foam: c(
    "foam",
    "Burning foam gives off styrene and other harmful fumes: pour lost-foam moulds with good ventilation.",
    "the foam maker's safety data sheet; common practice",
  ),
  blowBack: c(
    "blow-back",
    "A lost-foam mould with a wet or tight coating, or a thin sand cover, can blow foam gas and metal back up the sprue: stand to the side of the cup, not over it, and keep the coating dry.",
    "casters' reports; common practice",
  ),
  silica: c(
    "silica",
    "Shakeout, sand mixing and investment removal raise respirable crystalline silica (silicosis): shake out damp or under extraction and wear a fitted respirator where dust is raised.",
    "OSHA respirable crystalline silica rule (2016) and NIOSH guidance",
  ),
  defer: c(
    "defer",
    "These notes do not replace local codes, the suppliers' safety data sheets and trained practice: follow those first.",
    "-",
  ),
} as const;

/** The same list as sentence templates, for the pouring screens (source in brackets). */
export const GENERAL_CAUTIONS = [CAUTIONS.steam, CAUTIONS.ppe, CAUTIONS.inertGas, CAUTIONS.foam, CAUTIONS.defer].map(
  (x) => (x.id === "defer" ? x.text : `${x.text} (${x.source})`),
);

/** Leaded copper alloys of the table; a shop alloy is judged by its name. */
const LEADED = new Set(["C83600", "C84400", "C85700", "C92200", "C93200"]);
const ZINC_BEARING = new Set(["red-brass", "yellow-brass", "manganese-bronze", "tin-bronze", "copper-base"]);

/**
 * The cautions for one case: the top causes' own, then those of its alloy and practice, ending with the
 * deferral; in SI words and as templates (the same order).
 */
export function safetyCautions(
  c: DiagnosisCase,
  facts: Facts,
  causeCautions: string[],
): { cautions: string[]; cautionTemplates: string[] } {
  const cautionTemplates = pickCautions(c, facts, causeCautions);
  return { cautions: cautionTemplates.map(siText), cautionTemplates };
}

function pickCautions(c: DiagnosisCase, facts: Facts, causeCautions: string[]): string[] {
  const family = String(facts.alloyFamily);
  const designation = c.alloy.trim().toUpperCase();
  const picked: Caution[] = [CAUTIONS.steam, CAUTIONS.ppe];
  if (facts.metal === "aluminium") picked.push(CAUTIONS.hotAluminium);
  if (facts.metal === "copper" || facts.metal === "iron") picked.push(CAUTIONS.infrared);
  if (ZINC_BEARING.has(family)) picked.push(CAUTIONS.zincFume);
  if (facts.metal === "copper" && (LEADED.has(designation) || /lead/i.test(c.alloy))) picked.push(CAUTIONS.lead);
  if (facts.metal === "copper" && (family === "copper-base" || /scrap/i.test(c.alloy) || c.charge === "mixed-scrap"))
    picked.push(CAUTIONS.unknownCopperScrap);
  if (["argon-lance", "nitrogen-lance", "rotary"].includes(c.degassing ?? "")) picked.push(CAUTIONS.inertGas);
  if (c.degassing === "tablet") picked.push(CAUTIONS.chlorinatedTablet);
  if (c.fluxed) picked.push(CAUTIONS.flux);
  if (c.process === "lost-foam") picked.push(CAUTIONS.foam, CAUTIONS.blowBack);
  if (["green-sand", "no-bake-sand", "investment", "lost-foam"].includes(c.process)) picked.push(CAUTIONS.silica);
  const general = picked.map((x) => `${x.text} (${x.source})`);
  return [...new Set([...causeCautions, ...general]), CAUTIONS.defer.text];
}
