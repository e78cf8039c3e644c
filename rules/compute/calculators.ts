import { RISER_MODULUS_FACTOR } from "./solidification";

/**
 * Computations the calculators need beyond those the rules use; the gating physics both share is in
 * gating.ts. Figures and worked examples are in docs/calculator-facts.md (with their sources).
 */

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

/**
 * A cylindrical riser (height = diameter) whose modulus is the factor times the casting's, so it
 * freezes later: M = D/6, so D = 6 · factor · M_casting (factor 1.2 [mem], rule of thumb).
 */
export function riserDiameterForModulusCm(castingModulusCm: number, factor = RISER_MODULUS_FACTOR): number {
  return 6 * factor * castingModulusCm;
}
