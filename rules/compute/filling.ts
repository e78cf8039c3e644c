/** Filling a mould through a sprue. SI units throughout. */

/** Standard gravity, m/s² (CGPM 1901, exact). */
export const STANDARD_GRAVITY_MS2 = 9.80665;

/**
 * Critical metal-front velocity for aluminium, about 0.5 m/s: faster, the front folds its oxide skin
 * into the metal (Campbell, Castings Practice: The Ten Rules of Castings, rule 2 [hb]).
 * In sections a few mm thick the figure is about 1 m/s (same source); the reason, surface tension
 * holding the front together in a narrow channel, is [mem].
 */
export const CRITICAL_VELOCITY_MS = 0.5;
export const THIN_SECTION_CRITICAL_VELOCITY_MS = 1;
/** "A few mm": taken as 5 mm and thinner (the brief's reading of Campbell, not his number). */
export const THIN_SECTION_MM = 5;

/** Free fall (Torricelli, losses ignored): v = sqrt(2 g h). */
export function freeFallVelocityMS(fallHeightM: number): number {
  return Math.sqrt(2 * STANDARD_GRAVITY_MS2 * fallHeightM);
}

/** The fall that gives this velocity: h = v² / 2g (0.5 m/s is a fall of about 12.7 mm). */
export function fallHeightForVelocityM(velocityMS: number): number {
  return velocityMS ** 2 / (2 * STANDARD_GRAVITY_MS2);
}

/**
 * Velocity guide for a casting: 0.5 m/s, about 1 m/s where the thinnest section is 5 mm or less.
 * Campbell gives these for aluminium [hb]; applying them to copper-base alloys rests on his remark that
 * most liquid metals have a critical velocity near 0.5 m/s [mem].
 */
export function velocityGuideMS(minSectionMm?: number): number {
  return minSectionMm !== undefined && minSectionMm <= THIN_SECTION_MM
    ? THIN_SECTION_CRITICAL_VELOCITY_MS
    : CRITICAL_VELOCITY_MS;
}
