/**
 * Freezing time by Chvorinov's rule, t = C_m · M^n, M = V/A the casting modulus, n = 2 [hb]
 * (Groover, Fundamentals of Modern Manufacturing). Lengths in cm and times in minutes, as in
 * Groover's worked example, so C_m is in min/cm².
 */
export const CHVORINOV_EXPONENT = 2;

/** Riser rule of thumb: the riser's modulus at least 1.2 × the casting's, so it freezes last [mem]. */
export const RISER_MODULUS_FACTOR = 1.2;

/** Modulus M = V/A: the volume that holds heat over the area that loses it. */
export function modulusCm(volumeCm3: number, coolingAreaCm2: number): number {
  return volumeCm3 / coolingAreaCm2;
}

/** A plate much wider than thick loses heat through both faces: M = thickness / 2. */
export function plateModulusMm(thicknessMm: number): number {
  return thicknessMm / 2;
}

/** A cylinder with H = D, cooling on every face: V/A = (π D³/4) / (3π D²/2) = D/6. */
export function cylinderModulusCm(diameterCm: number): number {
  return diameterCm / 6;
}

export function chvorinovTimeMin(
  modulusCm: number,
  mouldConstantMinPerCm2: number,
  exponent = CHVORINOV_EXPONENT,
): number {
  return mouldConstantMinPerCm2 * modulusCm ** exponent;
}

/** C_m from a casting poured in the same mould material whose freezing time is known. */
export function mouldConstantMinPerCm2(
  freezeTimeMin: number,
  modulusCm: number,
  exponent = CHVORINOV_EXPONENT,
): number {
  return freezeTimeMin / modulusCm ** exponent;
}

/** Diameter (= height) of a cylindrical riser that freezes in freezeTimeMin: M = (t/C_m)^(1/n), D = 6 M. */
export function riserDiameterCm(
  freezeTimeMin: number,
  mouldConstantMinPerCm2: number,
  exponent = CHVORINOV_EXPONENT,
): number {
  return 6 * (freezeTimeMin / mouldConstantMinPerCm2) ** (1 / exponent);
}

/** Smallest riser modulus that still feeds a casting of this modulus (rule of thumb, [mem]). */
export function minRiserModulusCm(castingModulusCm: number): number {
  return RISER_MODULUS_FACTOR * castingModulusCm;
}

/** Freezing time of one section over another's by Chvorinov: (M1/M2)^n, the mould constant cancels. */
export function freezeTimeRatio(modulusA: number, modulusB: number, exponent = CHVORINOV_EXPONENT): number {
  return (modulusA / modulusB) ** exponent;
}

/**
 * Casting : neck : riser moduli about 1 : 1.1 : 1.2, so the neck freezes after the casting and before
 * the riser and the feed path stays open (rule of thumb, [mem]).
 */
export const NECK_MODULUS_FACTOR = 1.1;

/** A box L × W × T cooling on all six faces: M = LWT / 2(LW + LT + WT). */
export function boxModulusCm(lengthCm: number, widthCm: number, thicknessCm: number): number {
  const volume = lengthCm * widthCm * thicknessCm;
  const area = 2 * (lengthCm * widthCm + lengthCm * thicknessCm + widthCm * thicknessCm);
  return modulusCm(volume, area);
}

/** A cylinder D × H cooling on its side and both ends: M = (π D² H / 4) / (π D H + π D² / 2). */
export function cylinderSectionModulusCm(diameterCm: number, heightCm: number): number {
  const volume = (Math.PI * diameterCm ** 2 * heightCm) / 4;
  const area = Math.PI * diameterCm * heightCm + (Math.PI * diameterCm ** 2) / 2;
  return modulusCm(volume, area);
}

/** A short round neck cools only round its side: M = (π d² L / 4) / (π d L) = d / 4, so d = 4 · 1.1 · M. */
export function neckDiameterCm(castingModulusCm: number, factor = NECK_MODULUS_FACTOR): number {
  return 4 * factor * castingModulusCm;
}

/**
 * Feeding distance of a plate, rule of thumb from steel plates [mem]: a riser feeds about 2 T round
 * itself (riser zone) and an edge adds about 2.5 T (end zone), so a riser with a free edge beyond it
 * feeds about 4.5 T. Aluminium and copper alloys feed differently: a first guess, common practice.
 */
export function plateFeedingDistanceMm(thicknessMm: number): { riserZoneMm: number; withEndZoneMm: number } {
  return { riserZoneMm: 2 * thicknessMm, withEndZoneMm: 4.5 * thicknessMm };
}
