import { chargeForMeltLossKg } from "../compute/calculators";
import { foamPatternVolumeCm3, metalNeededKg } from "../compute/pattern";
import { CalcInputError, type CalcAlloy, type CalcResult, type CalcValue } from "./result";

export const METAL_METHODS = ["volume", "foam", "previous"] as const;
export type MetalMethod = (typeof METAL_METHODS)[number];

export type MetalInput = {
  alloy: string;
  /** From the pattern's volume, a foam pattern's weight (before glue and coating), or a previous casting's weight. */
  method: MetalMethod;
  volumeCm3?: number;
  foamMassKg?: number;
  foamDensityKgM3?: number;
  previousCastingKg?: number;
  /** Casting over metal poured, %: the rest is sprue, runners and risers. */
  yieldPct: number;
  meltLossPct: number;
  crucibleKg?: number;
};

/**
 * A crucible is not filled to the brim: about three quarters of its rated capacity leaves room to
 * skim and carry without slopping. Common practice [mem], not from a document read for this project.
 */
export const CRUCIBLE_FILL_FRACTION = 0.75;

function castingVolumeCm3(input: MetalInput, alloy: CalcAlloy): { cm3: number; why: CalcValue[] } {
  const need = (field: keyof MetalInput, v: number | undefined) => {
    if (v === undefined) throw new CalcInputError(field, "needed for this way of working it out");
    return v;
  };
  if (input.method === "volume") {
    const cm3 = need("volumeCm3", input.volumeCm3);
    return { cm3, why: [{ label: "Pattern volume", quantity: "volume-cm3", si: cm3 }] };
  }
  if (input.method === "foam") {
    const massKg = need("foamMassKg", input.foamMassKg);
    const density = need("foamDensityKgM3", input.foamDensityKgM3);
    return {
      cm3: foamPatternVolumeCm3(massKg * 1000, density),
      why: [
        { label: "Foam pattern weight (before glue and coating)", quantity: "mass", si: massKg },
        { label: "Foam density", quantity: "density", si: density },
      ],
    };
  }
  const kg = need("previousCastingKg", input.previousCastingKg);
  return {
    cm3: (kg / alloy.densityKgM3) * 1e6,
    why: [{ label: "Previous casting's weight", quantity: "mass", si: kg }],
  };
}

/** Metal to melt: the casting's metal, over the yield, plus what the melt loses. */
export function metalToMelt(input: MetalInput, alloy: CalcAlloy): CalcResult {
  const { cm3, why } = castingVolumeCm3(input, alloy);
  const castingKg = metalNeededKg({ castingVolumeCm3: cm3, densityKgM3: alloy.densityKgM3, castingYield: 1 });
  const pouredKg = metalNeededKg({
    castingVolumeCm3: cm3,
    densityKgM3: alloy.densityKgM3,
    castingYield: input.yieldPct / 100,
  });
  const chargeKg = chargeForMeltLossKg(pouredKg, input.meltLossPct);
  const warnings: string[] = [];
  if (input.crucibleKg !== undefined) {
    if (chargeKg > input.crucibleKg)
      warnings.push("The charge is more than the crucible holds: melt twice or use a bigger crucible.");
    else if (chargeKg > input.crucibleKg * CRUCIBLE_FILL_FRACTION)
      warnings.push("The charge fills more than three quarters of the crucible: little room to skim and carry.");
  }
  const pattern = "rules/compute/pattern.ts";
  return {
    summary: `Melt ${chargeKg.toFixed(2)} kg for ${castingKg.toFixed(2)} kg of casting`,
    inputs: [
      ...why,
      { label: `Density of ${alloy.designation}`, quantity: "density", si: alloy.densityKgM3 },
      { label: "Casting yield", quantity: "percent", si: input.yieldPct },
      { label: "Melt loss", quantity: "percent", si: input.meltLossPct },
      ...(input.crucibleKg !== undefined
        ? [{ label: "Crucible capacity", quantity: "mass" as const, si: input.crucibleKg }]
        : []),
    ],
    lines: [
      {
        label: "Casting volume",
        quantity: "volume-cm3",
        si: cm3,
        formula:
          input.method === "foam"
            ? "V = m_foam / ρ_foam (metal replaces foam volume for volume)"
            : input.method === "previous"
              ? "V = m_casting / ρ_alloy"
              : "V = pattern volume",
        source: pattern,
      },
      {
        label: "Casting weight",
        quantity: "mass",
        si: castingKg,
        formula: "m = V · ρ_alloy",
        source: `${pattern}; density from the alloy table`,
      },
      {
        label: "Metal poured",
        quantity: "mass",
        si: pouredKg,
        formula: "m_poured = m_casting / yield",
        source: `${pattern}; yield is the shop's own figure`,
      },
      {
        label: "Metal to melt",
        quantity: "mass",
        si: chargeKg,
        formula: "m_charge = m_poured / (1 − melt loss)",
        source: 'docs/calculator-facts.md "Metal" [calc]',
      },
    ],
    notes:
      input.method === "foam" ? ["Weigh the foam before glue and coating: both add weight that is not metal."] : [],
    warnings,
  };
}
