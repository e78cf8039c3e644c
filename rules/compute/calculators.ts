import { DEFAULT_DISCHARGE_COEFFICIENT, sprueBaseVelocityMPerS } from "./gating";
import { RISER_MODULUS_FACTOR } from "./solidification";

/**
 * Computations the calculators need beyond those the rules use. Figures and worked examples are in
 * docs/calculator-facts.md (copied from the shared foundry facts with their sources).
 */

/** Discharge coefficient of a sprue, about 0.6-0.8 [mem]: one figure, in rules/compute/gating.ts. */
export { DEFAULT_DISCHARGE_COEFFICIENT };

/** Melt temperature to reach so the metal still has pourTempC after the transfer loss the shop sets. */
export function meltTempForPourC(pourTempC: number, transferLossC: number): number {
  if (transferLossC < 0) throw new RangeError("the transfer loss is zero or more degrees");
  return pourTempC + transferLossC;
}

/** Metal to charge when a fraction of it is lost in melting (dross, skim, oxidation): m / (1 - loss). */
export function chargeForMeltLossKg(pouredKg: number, meltLossPct: number): number {
  if (meltLossPct < 0 || meltLossPct >= 100) throw new RangeError("melt loss is from 0 up to, not including, 100 %");
  return pouredKg / (1 - meltLossPct / 100);
}

/** Sprue-base velocity with losses: v = Cd · sqrt(2 g h) (Torricelli with a discharge coefficient). */
export function sprueBaseVelocityMS(
  sprueHeightM: number,
  dischargeCoefficient = DEFAULT_DISCHARGE_COEFFICIENT,
): number {
  return sprueBaseVelocityMPerS(sprueHeightM, dischargeCoefficient);
}

/** Continuity: the same flow through a larger total ingate area runs slower, v_i = v_c · A_c / A_i. */
export function ingateVelocityMS(chokeVelocityMS: number, chokeAreaM2: number, ingateAreaM2: number): number {
  return (chokeVelocityMS * chokeAreaM2) / ingateAreaM2;
}

/** The total ingate area that brings a flow Q down to a target velocity: A = Q / v. */
export function ingateAreaForVelocityM2(flowM3PerS: number, targetVelocityMS: number): number {
  return flowM3PerS / targetVelocityMS;
}

/**
 * A cylindrical riser (height = diameter) whose modulus is the factor times the casting's, so it
 * freezes later: M = D/6, so D = 6 · factor · M_casting (factor 1.2 [mem], rule of thumb).
 */
export function riserDiameterForModulusCm(castingModulusCm: number, factor = RISER_MODULUS_FACTOR): number {
  return 6 * factor * castingModulusCm;
}
