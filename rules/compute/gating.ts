import { CRITICAL_VELOCITY_MS, freeFallVelocityMS, velocityGuideMS } from "./filling";

/**
 * The gating system: how fast metal leaves the sprue base and how fast it enters the cavity. Free fall
 * down the sprue is not the speed at which metal enters the cavity; the gating slows it (or not).
 * Figures and the worked example are in docs/gating-and-copper-facts.md ("Filling"). SI units: m, m², s.
 *
 * The chain: v_base = Cd · sqrt(2 g h); Q = v_base · A_choke; v_ingate = Q / A_ingates (continuity).
 * When the ingates are smaller than the sprue base (a pressurised system, 1:2:1 or 3:2:1), the ingates
 * are the choke and the metal jets through them at about sprue-base speed.
 */

/** Discharge coefficient of a gating system, about 0.6-0.8 [mem]; 0.8 as in the worked example. */
export const DEFAULT_DISCHARGE_COEFFICIENT = 0.8;

/** Sprue-base velocity with losses: v = Cd · sqrt(2 g h), h the sprue height (cup level to sprue base). */
export function sprueBaseVelocityMPerS(sprueHeightM: number, dischargeCoefficient = DEFAULT_DISCHARGE_COEFFICIENT) {
  if (!(sprueHeightM >= 0)) throw new RangeError("the sprue height is 0 m or more");
  if (!(dischargeCoefficient > 0 && dischargeCoefficient <= 1)) throw new RangeError("Cd is above 0 and at most 1");
  return dischargeCoefficient * freeFallVelocityMS(sprueHeightM);
}

/** Volume flow through the choke: Q = v · A (m³/s). */
export function flowRateM3PerS(chokeVelocityMPerS: number, chokeAreaM2: number) {
  if (!(chokeAreaM2 > 0)) throw new RangeError("the choke area is above 0 m²");
  return chokeVelocityMPerS * chokeAreaM2;
}

/**
 * Ingate velocity by continuity from the sprue-base (choke) velocity and the sprue-base and total
 * ingate areas: v_i = v_base · A_base / A_i, but never faster than the sprue base, because when the
 * ingates are the smallest area they are the choke and the flow is limited there.
 * The slowing holds only when runner and ingates run full ([mem], Campbell's argument): bottom gating.
 */
export function ingateVelocityMPerS(input: {
  sprueBaseVelocityMPerS: number;
  sprueBaseAreaM2: number;
  ingateAreaM2: number;
}) {
  const { sprueBaseVelocityMPerS: vBase, sprueBaseAreaM2: aBase, ingateAreaM2: aIngate } = input;
  if (!(aBase > 0) || !(aIngate > 0)) throw new RangeError("the sprue-base and ingate areas are above 0 m²");
  return vBase * Math.min(1, aBase / aIngate);
}

/** A gating ratio sprue : runner : ingate, e.g. "1:2:4" (unpressurised) or "1:2:1" (pressurised). */
export type GatingRatio = { sprue: number; runner: number; ingate: number };

/** Reads "1:2:4" (also "1-2-4", "1 : 2 : 4"); undefined when it is not three positive numbers. */
export function parseGatingRatio(text: string): GatingRatio | undefined {
  const parts = text.trim().split(/\s*[:/-]\s*/);
  if (parts.length !== 3) return undefined;
  const [sprue, runner, ingate] = parts.map(Number);
  if (![sprue, runner, ingate].every((x) => Number.isFinite(x) && x > 0)) return undefined;
  return { sprue, runner, ingate };
}

/** Total ingate area from the sprue-base area and a gating ratio: A_i = A_base · ingate / sprue. */
export function ingateAreaFromRatioM2(sprueBaseAreaM2: number, ratio: GatingRatio) {
  return (sprueBaseAreaM2 * ratio.ingate) / ratio.sprue;
}

/** Runner velocity by continuity, like the ingates: v_r = v_base · A_base / A_runner (at most v_base). */
export function runnerVelocityMPerS(sprueBaseVelocity: number, ratio: GatingRatio) {
  return sprueBaseVelocity * Math.min(1, ratio.sprue / ratio.runner);
}

/** Pressurised when the ingates are no larger than the sprue base: the system runs full but jets. */
export const isPressurised = (ratio: GatingRatio) => ratio.ingate <= ratio.sprue;

/** The total ingate area that brings a flow Q down to a target velocity: A = Q / v (continuity). */
export function ingateAreaForVelocityM2(flowM3PerS: number, targetVelocityMPerS: number) {
  if (!(targetVelocityMPerS > 0)) throw new RangeError("the target velocity is above 0 m/s");
  return flowM3PerS / targetVelocityMPerS;
}

/** Time to fill a cavity at a steady flow: t = V / Q (s). */
export function fillTimeS(cavityVolumeM3: number, flowM3PerS: number) {
  if (!(flowM3PerS > 0)) throw new RangeError("the flow is above 0 m³/s");
  return cavityVolumeM3 / flowM3PerS;
}

/**
 * The mean flow a pour achieved from the metal poured and the time it took (Q = V / t), for comparing
 * a logged pour time with what the gating could pass.
 */
export function meanFlowM3PerS(pouredVolumeM3: number, pourTimeS: number) {
  if (!(pourTimeS > 0)) throw new RangeError("the pour time is above 0 s");
  return pouredVolumeM3 / pourTimeS;
}

/** The ingate velocity over the critical velocity for this section (0.5 m/s; 1 m/s in walls of 5 mm or less). */
export function ingateVelocityRatio(ingateVelocity: number, minSectionMm?: number) {
  return ingateVelocity / velocityGuideMS(minSectionMm);
}

export { CRITICAL_VELOCITY_MS, velocityGuideMS };

/** Everything the rules need from a case's gating, SI in, SI out; undefined where an input is missing. */
export function gatingFromCase(input: {
  sprueHeightMm?: number;
  chokeAreaMm2?: number;
  ingateAreaMm2?: number;
  gatingRatio?: string;
  minSectionMm?: number;
}) {
  const heightM = input.sprueHeightMm === undefined ? undefined : input.sprueHeightMm / 1000;
  const baseV = heightM === undefined ? undefined : sprueBaseVelocityMPerS(heightM);
  const ratio = input.gatingRatio === undefined ? undefined : parseGatingRatio(input.gatingRatio);
  const baseAreaM2 = input.chokeAreaMm2 === undefined ? undefined : input.chokeAreaMm2 / 1e6;
  let ingateAreaM2 = input.ingateAreaMm2 === undefined ? undefined : input.ingateAreaMm2 / 1e6;
  // Without a measured ingate area a ratio is enough: the velocities depend only on the area ratio.
  let areaRatio: number | undefined; // A_base / A_ingate
  if (baseAreaM2 !== undefined && ingateAreaM2 !== undefined) areaRatio = baseAreaM2 / ingateAreaM2;
  else if (ratio) {
    areaRatio = ratio.sprue / ratio.ingate;
    if (baseAreaM2 !== undefined) ingateAreaM2 = ingateAreaFromRatioM2(baseAreaM2, ratio);
  }
  const ingateV =
    baseV === undefined || areaRatio === undefined
      ? undefined
      : ingateVelocityMPerS({ sprueBaseVelocityMPerS: baseV, sprueBaseAreaM2: areaRatio, ingateAreaM2: 1 });
  return {
    sprueBaseVelocityMPerS: baseV,
    ingateVelocityMPerS: ingateV,
    ingateVelocityRatio: ingateV === undefined ? undefined : ingateVelocityRatio(ingateV, input.minSectionMm),
    flowRateM3PerS: baseV === undefined || baseAreaM2 === undefined ? undefined : flowRateM3PerS(baseV, baseAreaM2),
    ingateAreaM2,
    pressurised: areaRatio === undefined ? undefined : areaRatio >= 1,
  };
}
