import {
  alloyHydrogenSolubilityCm3Per100g,
  siliconSolubilityFactor,
  solidHydrogenSolubilityCm3Per100g,
  vapourPressureKPa,
} from "../compute/hydrogen";
import { CalcInputError, isAluminium, type CalcAlloy, type CalcLine, type CalcResult } from "./result";

export type HydrogenInput = { alloy: string; meltTempC: number; humidityPct?: number; airTempC?: number };

/**
 * A good melt holds about 0.1-0.2 cm³/100 g, far below the 1-atm figure; porosity rises above about
 * 0.2 after degassing ([web] vendors, shared foundry facts "Hydrogen in aluminium").
 */
export const USUAL_MELT_HYDROGEN_CM3_PER_100G: readonly [number, number] = [0.1, 0.2];

const SOURCE = "rules/compute/hydrogen.ts; Ransley and Neufeld (1948) [hb], silicon by Doutre (1991) [hb, second-hand]";

/** The most hydrogen the liquid could hold under 1 atm of hydrogen: an upper bound, never a measurement. */
export function hydrogen(input: HydrogenInput, alloy: CalcAlloy): CalcResult {
  if (!isAluminium(alloy))
    throw new CalcInputError("alloy", "the solubility figures here are for aluminium alloys only");
  if (input.meltTempC <= alloy.liquidusC)
    throw new CalcInputError(
      "meltTempC",
      `at or below the liquidus of ${alloy.designation} (${alloy.liquidusC} °C) the metal is not all liquid`,
    );
  const siPct = alloy.siliconPct ?? 0;
  const liquid = alloyHydrogenSolubilityCm3Per100g({ tempC: input.meltTempC, siliconPct: siPct });
  // At the solidus the solid takes far less; the difference is what comes out of solution on freezing.
  const solid = solidHydrogenSolubilityCm3Per100g(alloy.solidusC) * siliconSolubilityFactor(siPct);
  const lines: CalcLine[] = [
    {
      label: "Upper bound: liquid under 1 atm of hydrogen",
      quantity: "solubility-cm3-per-100g",
      si: liquid,
      formula: `log₁₀ S = −2760 / T + 2.796, × 10^(−0.0119 · ${siPct} % Si)`,
      source: SOURCE,
    },
    {
      label: "Solid at the solidus under 1 atm",
      quantity: "solubility-cm3-per-100g",
      si: solid,
      formula: "log₁₀ S = −2080 / T + 0.788, same silicon factor",
      source: "rules/compute/hydrogen.ts; solid solubility [mem]",
    },
  ];
  const inputs = [
    { label: "Melt temperature", quantity: "temperature" as const, si: input.meltTempC },
    { label: `Silicon in ${alloy.designation}`, quantity: "percent" as const, si: siPct },
  ];
  const notes = [
    "This is the most the melt could dissolve under pure hydrogen at 1 atm: an upper bound, not what the melt holds.",
    `A well-degassed melt holds about ${USUAL_MELT_HYDROGEN_CM3_PER_100G[0]}-${USUAL_MELT_HYDROGEN_CM3_PER_100G[1]} cm³/100 g; hotter metal takes up hydrogen faster.`,
  ];
  if (input.humidityPct !== undefined && input.airTempC !== undefined) {
    inputs.push(
      { label: "Air temperature", quantity: "temperature" as const, si: input.airTempC },
      { label: "Humidity", quantity: "percent" as const, si: input.humidityPct },
    );
    lines.push({
      label: "Water vapour in the air",
      quantity: "pressure-kpa",
      si: vapourPressureKPa(input.airTempC, input.humidityPct),
      formula: "e = RH · 6.1094 · exp(17.625 t / (t + 243.04)) hPa",
      source: "rules/compute/hydrogen.ts; Alduchov and Eskridge (1996)",
    });
    notes.push(
      "Moisture in the air, the charge and the tools is where the hydrogen comes from: damp days need more degassing.",
    );
  }
  return {
    summary: `At most ${liquid.toFixed(2)} cm³/100 g (1-atm upper bound)`,
    inputs,
    lines,
    notes,
    warnings: [],
  };
}
