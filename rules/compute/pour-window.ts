import type { Process } from "../case";
import { metalOf } from "../alloys";
import type { AlloyFamily } from "../fact-catalog";

/**
 * The usual pour-temperature window for an alloy family, process and thinnest section. Figures from
 * docs/foundry-facts.md; where that says [mem] they are recalled from memory and should
 * be checked against ASM Handbook Vol. 15 before they are relied on.
 */
export type PourWindow = { lowC: number; highC: number; source: string };

// Aluminium alloys by process [mem] (foundry-facts.md "Pouring temperatures of aluminium alloys").
// No-bake sand and plaster are not in that table: no-bake is taken as green sand, plaster (an
// insulating mould like an investment shell) as investment. Both are assumptions, common practice.
const ALUMINIUM_WINDOWS_C: Record<Process, [number, number, string]> = {
  "green-sand": [700, 760, "green sand, Al-Si: about 700-760 °C [mem]"],
  "no-bake-sand": [700, 760, "no-bake sand, taken as green sand (700-760 °C [mem]), common practice"],
  "lost-foam": [
    730,
    790,
    'lost foam: about 730-790 °C [mem], hotter than green sand because decomposing the foam takes heat from the front (ASM Vol. 15 "Lost Foam Casting")',
  ],
  investment: [680, 760, "investment, preheated shell: about 680-760 °C [mem]"],
  plaster: [680, 760, "plaster, taken as investment (680-760 °C [mem]), common practice"],
  "permanent-mould": [680, 760, "permanent mould: about 680-760 °C [mem]"],
};

/** A wall this thin or thinner loses its heat fast and needs hotter metal (common practice). */
export const THIN_WALL_MM = 4;
/** How far thin walls move the window up: green sand goes to about 790 °C at the top [mem]. */
export const THIN_WALL_SHIFT_C = 30;
/**
 * Aluminium is not poured above about 790 °C: the top of the thin-wall green-sand and lost-foam
 * figures [mem] and about the top of the 704-788 °C molten-aluminium handling range
 * [web] Aluminum Association. A melt too hot takes up hydrogen (ASM Desk Edition [hb]).
 */
export const ALUMINIUM_CEILING_C = 790;
/**
 * Copper-base alloys: liquidus plus 100-200 °C of superheat, heavy sections at the low end and light
 * ones at the high end. [mem] common practice, not from a document read for this project.
 */
export const COPPER_SUPERHEAT_BAND_C: readonly [number, number] = [100, 200];

/**
 * Light and heavy sections for the per-alloy copper and iron ranges (docs/gating-and-copper-facts.md):
 * gray iron is "thin" under 10 mm and "heavy" over 50 mm [mem]; the copper table gives light and heavy
 * castings without a thickness, so 10 mm and 25 mm are taken for copper alloys (common practice). In
 * between, the window runs from the middle of the two lows to the middle of the two highs.
 */
export const LIGHT_SECTION_MM = 10;
export const HEAVY_SECTION_MM: Record<"copper" | "iron", number> = { copper: 25, iron: 50 };

function sectionWindow(
  light: readonly [number, number],
  heavy: readonly [number, number],
  metal: "copper" | "iron",
  minSectionMm: number | undefined,
  what: string,
): PourWindow {
  const source = `${what}: light sections ${light[0]}-${light[1]} °C, heavy ${heavy[0]}-${heavy[1]} °C`;
  if (minSectionMm === undefined)
    return { lowC: heavy[0], highC: light[1], source: `${source}; section not logged, so the whole span` };
  if (minSectionMm <= LIGHT_SECTION_MM)
    return { lowC: light[0], highC: light[1], source: `${source}; light (walls ≤ ${LIGHT_SECTION_MM} mm)` };
  if (minSectionMm >= HEAVY_SECTION_MM[metal])
    return { lowC: heavy[0], highC: heavy[1], source: `${source}; heavy (walls ≥ ${HEAVY_SECTION_MM[metal]} mm)` };
  return {
    lowC: (light[0] + heavy[0]) / 2,
    highC: (light[1] + heavy[1]) / 2,
    source: `${source}; medium walls, between the two (common practice)`,
  };
}

export function pourWindowC(input: {
  family: AlloyFamily;
  process: Process;
  liquidusC: number;
  minSectionMm?: number;
  pourLightC?: readonly [number, number];
  pourHeavyC?: readonly [number, number];
}): PourWindow {
  const metal = metalOf(input.family);
  if (metal !== "aluminium" && input.pourLightC && input.pourHeavyC)
    return sectionWindow(
      input.pourLightC,
      input.pourHeavyC,
      metal,
      input.minSectionMm,
      metal === "copper"
        ? 'CDA/NFFS "Copper Casting Alloys" pouring-temperature table [mem]'
        : "gray and ductile iron pouring by section [mem]",
    );
  const thin = input.minSectionMm !== undefined && input.minSectionMm <= THIN_WALL_MM;
  const thinNote = thin ? `; walls ≤ ${THIN_WALL_MM} mm: ${THIN_WALL_SHIFT_C} °C hotter (common practice)` : "";
  const shift = thin ? THIN_WALL_SHIFT_C : 0;

  if (metal !== "aluminium") {
    const [low, high] = COPPER_SUPERHEAT_BAND_C;
    return {
      lowC: input.liquidusC + low + shift,
      highC: input.liquidusC + high + shift,
      source: `${input.family} of no known grade: liquidus + ${low}-${high} °C [mem], common practice${thinNote}`,
    };
  }
  const [lowC, highC, source] = ALUMINIUM_WINDOWS_C[input.process];
  return {
    lowC: Math.min(lowC + shift, ALUMINIUM_CEILING_C),
    highC: Math.min(highC + shift, ALUMINIUM_CEILING_C),
    source: thin ? `${source}${thinNote}, up to about ${ALUMINIUM_CEILING_C} °C [mem]` : source,
  };
}

export type PourWindowPlace = {
  position: "below" | "inside" | "above";
  /** Degrees below the window's low end; 0 unless below. */
  belowWindowC: number;
  /** Degrees above the window's high end; 0 unless above. */
  aboveWindowC: number;
};

export function pourWindowPosition(pourTempC: number, window: Pick<PourWindow, "lowC" | "highC">): PourWindowPlace {
  if (pourTempC < window.lowC) return { position: "below", belowWindowC: window.lowC - pourTempC, aboveWindowC: 0 };
  if (pourTempC > window.highC) return { position: "above", belowWindowC: 0, aboveWindowC: pourTempC - window.highC };
  return { position: "inside", belowWindowC: 0, aboveWindowC: 0 };
}
