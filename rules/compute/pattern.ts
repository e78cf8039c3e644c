/**
 * Pattern sizes and metal needed. Shrink allowances are from patternmakers' shrink-rule charts [web]
 * (docs/foundry-facts.md "Pattern shrink allowance").
 */

const INCHES_PER_FOOT = 12;

/** Pattern size = casting size × (1 + allowance): the pattern is made larger by what the metal shrinks. */
export function patternSizeMm(castingSizeMm: number, shrinkAllowancePct: number): number {
  return castingSizeMm * (1 + shrinkAllowancePct / 100);
}

/** Casting size a pattern gives: the inverse of patternSizeMm. */
export function castingSizeMm(patternSizeMm: number, shrinkAllowancePct: number): number {
  return patternSizeMm / (1 + shrinkAllowancePct / 100);
}

/** A shrink rule marked in inches per foot as a percentage: 5/32 in/ft = 1.30 %. */
export function shrinkInPerFtToPct(inchesPerFoot: number): number {
  return (inchesPerFoot / INCHES_PER_FOOT) * 100;
}

export function shrinkPctToInPerFt(shrinkAllowancePct: number): number {
  return (shrinkAllowancePct / 100) * INCHES_PER_FOOT;
}

/**
 * Metal to melt for a casting: its mass divided by the casting yield (casting mass over the mass
 * poured, the rest being sprue, runners and risers). Yield is a shop's own figure; 1 means the casting
 * alone. Solid density is used, so this is the mass of the finished casting's metal.
 */
export function metalNeededKg(input: { castingVolumeCm3: number; densityKgM3: number; castingYield: number }): number {
  if (input.castingYield <= 0 || input.castingYield > 1) throw new RangeError("casting yield is above 0 and at most 1");
  const castingKg = input.castingVolumeCm3 * 1e-6 * input.densityKgM3;
  return castingKg / input.castingYield;
}

/** Volume of a foam pattern from its mass and the foam's density (1 g at 1 kg/m³ is 1000 cm³). */
export function foamPatternVolumeCm3(foamMassG: number, foamDensityKgM3: number): number {
  return (foamMassG / 1000 / foamDensityKgM3) * 1e6;
}

/**
 * Lost foam: the metal replaces the foam volume for volume, so weighing the foam pattern gives the metal
 * needed. Expanded polystyrene for aluminium is about 19-24 kg/m³ [web]/[mem].
 */
export function metalForFoamPatternKg(input: {
  foamMassG: number;
  foamDensityKgM3: number;
  densityKgM3: number;
  castingYield: number;
}): number {
  return metalNeededKg({
    castingVolumeCm3: foamPatternVolumeCm3(input.foamMassG, input.foamDensityKgM3),
    densityKgM3: input.densityKgM3,
    castingYield: input.castingYield,
  });
}
