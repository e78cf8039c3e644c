import type { Process } from "../case";
import type { AlloyFamily } from "../fact-catalog";

/**
 * The usual pour-temperature window for an alloy family, process and thinnest section. Figures from
 * shared/reference/foundry-facts.md; where that says [mem] they are recalled from memory and should
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

export function pourWindowC(input: {
  family: AlloyFamily;
  process: Process;
  liquidusC: number;
  minSectionMm?: number;
}): PourWindow {
  const thin = input.minSectionMm !== undefined && input.minSectionMm <= THIN_WALL_MM;
  const thinNote = thin ? `; walls ≤ ${THIN_WALL_MM} mm: ${THIN_WALL_SHIFT_C} °C hotter (common practice)` : "";
  const shift = thin ? THIN_WALL_SHIFT_C : 0;

  if (input.family === "copper-base") {
    const [low, high] = COPPER_SUPERHEAT_BAND_C;
    return {
      lowC: input.liquidusC + low + shift,
      highC: input.liquidusC + high + shift,
      source: `copper-base: liquidus + ${low}-${high} °C [mem], common practice${thinNote}`,
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
