import type { DiagnosisCase } from "./case";
import type { AlloySpec } from "./alloys";
import { factSpec, type FactQuantity, type Facts } from "./fact-catalog";
import { superheatC } from "./compute/temperature";
import { pourWindowC, pourWindowPosition } from "./compute/pour-window";
import { alloyHydrogenSolubilityCm3Per100g, vapourPressureKPa } from "./compute/hydrogen";
import { moistureRisk } from "./compute/moisture-risk";
import { freeFallVelocityMS, velocityGuideMS } from "./compute/filling";
import { gatingFromCase } from "./compute/gating";
import { sandTemper, temperBasis } from "./compute/green-sand";
import { carbonEquivalentPct } from "./compute/iron";
import { findBuiltInAlloy, metalOf } from "./alloys";
import { freezeTimeRatio, plateModulusMm } from "./compute/solidification";

type FactValue = Facts[string];

/** Apply f only when every input is known: a missing input stays missing, never zero. */
function known<A extends unknown[], R>(
  f: (...args: A) => R,
  ...args: { [K in keyof A]: A[K] | undefined }
): R | undefined {
  return args.some((a) => a === undefined) ? undefined : f(...(args as A));
}

/**
 * Every fact of rules/fact-catalog.ts for one case: its inputs, flattened, and the values derived from
 * them with rules/compute. Nothing is rounded here (roundFact is for display).
 */
export function deriveFacts(c: DiagnosisCase, alloy: AlloySpec): Facts {
  const metal = metalOf(alloy.family);
  const isAluminium = metal === "aluminium";
  // A shop's copy of a built-in alloy (same designation) keeps the built-in's per-alloy pour ranges.
  const ranges = alloy.pourLightC ? alloy : findBuiltInAlloy(alloy.designation);
  const window = pourWindowC({
    family: alloy.family,
    process: c.process,
    liquidusC: alloy.liquidusC,
    minSectionMm: c.minSectionMm,
    pourLightC: ranges?.family === alloy.family ? ranges.pourLightC : undefined,
    pourHeavyC: ranges?.family === alloy.family ? ranges.pourHeavyC : undefined,
  });
  const place = known((t: number) => pourWindowPosition(t, window), c.pourTempC);
  // Solubility where the melt was hottest, else at pouring; aluminium only (the fit is for aluminium).
  const hydrogenTempC = c.meltTempC ?? c.pourTempC;
  const vapourKPa = known(vapourPressureKPa, c.ambientTempC, c.humidityPct);
  const frontVelocityMS = known((mm: number) => freeFallVelocityMS(mm / 1000), c.sprueHeightMm);
  const guideMS = velocityGuideMS(c.minSectionMm);
  // In lost foam the front is paced by the foam's decomposition, not the sprue: no ingate velocity
  // (docs/gating-and-copper-facts.md "Filling").
  const gating =
    c.process === "lost-foam"
      ? undefined
      : gatingFromCase({
          sprueHeightMm: c.sprueHeightMm,
          chokeAreaMm2: c.chokeAreaMm2,
          ingateAreaMm2: c.ingateAreaMm2,
          gatingRatio: c.gatingRatio,
          minSectionMm: c.minSectionMm,
        });

  const sand = {
    process: c.process,
    sandType: c.sandType,
    moisturePct: c.sandMoisturePct,
    compactabilityPct: c.sandCompactabilityPct,
    feel: c.sandFeel,
  };
  const facts: Facts = {
    process: c.process,
    pourTempC: c.pourTempC,
    meltTempC: c.meltTempC,
    degassing: c.degassing,
    degasMinutes: c.degasMinutes,
    degasToPourMin: c.degasToPourMin,
    densityIndexPct: c.densityIndexPct,
    grainRefined: c.grainRefined,
    modifier: c.modifier,
    crucible: c.crucible,
    meltCarbonPct: c.meltCarbonPct,
    meltSiliconPct: c.meltSiliconPct,
    inoculated: c.inoculated,
    treatmentToPourMin: c.treatmentToPourMin,
    deoxidised: c.deoxidised,
    fluxed: c.fluxed,
    skimmed: c.skimmed,
    charge: c.charge,
    ambientTempC: c.ambientTempC,
    humidityPct: c.humidityPct,
    sandMoisturePct: c.sandMoisturePct,
    sandType: c.sandType,
    sandCompactabilityPct: c.sandCompactabilityPct,
    greenStrengthKPa: c.greenStrengthKPa,
    sandFeel: c.sandFeel,
    mouldTempC: c.mouldTempC,
    mouldDried: c.mouldDried,
    coatingApplied: c.coating?.applied,
    coatingDried: c.coating?.dried,
    coatingCoats: c.coating?.coats,
    coatingPermeability: c.coating?.permeability,
    foamDensityKgM3: c.foamDensityKgM3,
    foamType: c.foamType,
    glueJoints: c.glueJoints,
    sandVibrated: c.sandVibrated,
    minSectionMm: c.minSectionMm,
    maxSectionMm: c.maxSectionMm,
    sprueHeightMm: c.sprueHeightMm,
    chokeAreaMm2: c.chokeAreaMm2,
    ingateAreaMm2: c.ingateAreaMm2,
    gating: c.gating,
    hasFilter: c.hasFilter,
    pourTimeS: c.pourTimeS,
    hasRiser: c.hasRiser,
    hasOverflow: c.hasOverflow,
    hasVents: c.hasVents,

    alloyFamily: alloy.family,
    isAluminium,
    metal,
    leadedAlloy:
      metal === "copper" ? Boolean(alloy.leaded ?? ranges?.leaded) || /lead/i.test(alloy.designation) : false,
    liquidusC: alloy.liquidusC,
    solidusC: alloy.solidusC,
    freezingRangeC: alloy.liquidusC - alloy.solidusC,
    superheatC: known(superheatC, c.pourTempC, alloy.liquidusC),
    meltSuperheatC: known(superheatC, c.meltTempC, alloy.liquidusC),
    pourWindowLowC: window.lowC,
    pourWindowHighC: window.highC,
    pourWindowPosition: place?.position,
    pourBelowWindowC: place?.belowWindowC,
    pourAboveWindowC: place?.aboveWindowC,
    hydrogenSolubilityCm3Per100g: isAluminium
      ? known(
          (tempC: number) => alloyHydrogenSolubilityCm3Per100g({ tempC, siliconPct: alloy.siliconPct }),
          hydrogenTempC,
        )
      : undefined,
    vapourPressureKPa: vapourKPa,
    moistureRisk: moistureRisk({
      process: c.process,
      vapourPressureKPa: vapourKPa,
      humidityPct: c.humidityPct,
      sandMoisturePct: c.sandMoisturePct,
      coatingApplied: c.coating?.applied,
      coatingDried: c.coating?.dried,
      charge: c.charge,
      sandType: c.sandType,
    }),
    frontVelocityMS,
    velocityGuideMS: guideMS,
    frontVelocityRatio: known((v: number) => v / guideMS, frontVelocityMS),
    sprueBaseVelocityMS: gating?.sprueBaseVelocityMPerS,
    ingateVelocityMS: gating?.ingateVelocityMPerS,
    ingateVelocityRatio: gating?.ingateVelocityRatio,
    pressurisedGating: gating?.pressurised,
    sandTemper: sandTemper(sand),
    sandTemperBasis: temperBasis(sand),
    carbonEquivalentPct: metal === "iron" ? known(carbonEquivalentPct, c.meltCarbonPct, c.meltSiliconPct) : undefined,
    sectionRatio: known((max: number, min: number) => max / min, c.maxSectionMm, c.minSectionMm),
    freezeTimeRatio: known(
      (max: number, min: number) => freezeTimeRatio(plateModulusMm(max), plateModulusMm(min)),
      c.maxSectionMm,
      c.minSectionMm,
    ),
    thickSectionModulusMm: known(plateModulusMm, c.maxSectionMm),
    defectCount: c.defects.length,
    worstSeverity: Math.max(...c.defects.map((d) => d.severity)),
  };
  return facts;
}

/** Display decimals by quantity: temperatures to 0.1 °C, velocities to 0.01 m/s, hydrogen to 0.001. */
const DECIMALS: Record<FactQuantity, number> = {
  temperature: 1,
  "temperature-difference": 1,
  velocity: 2,
  hydrogen: 3,
  pressure: 2,
  ratio: 2,
  length: 1,
  time: 1,
  minutes: 1,
  percent: 1,
  density: 1,
  count: 0,
  area: 0,
};

/** A fact's value rounded for display; non-numbers and unknown names pass through. */
export function roundFact(name: string, value: number): number;
export function roundFact(name: string, value: FactValue): FactValue;
export function roundFact(name: string, value: FactValue): FactValue {
  const spec = factSpec(name);
  if (typeof value !== "number" || spec?.kind !== "number") return value;
  const scale = 10 ** DECIMALS[spec.quantity];
  return Math.round(value * scale) / scale;
}
