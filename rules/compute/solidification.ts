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
