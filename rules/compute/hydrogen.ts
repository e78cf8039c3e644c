import { celsiusToKelvin } from "./temperature";

/**
 * Hydrogen solubility in aluminium, cm³ H2 (STP) per 100 g of metal. Figures from
 * docs/foundry-facts.md "Hydrogen in aluminium".
 */

/**
 * Liquid aluminium at 1 atm H2: log10 S = -2760/T + 2.796, T in K.
 * Ransley and Neufeld, J. Inst. Metals 74 (1948) [hb], quoted second-hand.
 */
export function liquidHydrogenSolubilityCm3Per100g(tempC: number): number {
  return 10 ** (-2760 / celsiusToKelvin(tempC) + 2.796);
}

/** Solid aluminium at 1 atm H2: log10 S = -2080/T + 0.788 [mem]; about 1/19 of the liquid's at the melting point. */
export function solidHydrogenSolubilityCm3Per100g(tempC: number): number {
  return 10 ** (-2080 / celsiusToKelvin(tempC) + 0.788);
}

/** Sieverts' law: diatomic hydrogen dissolves as atoms, so S grows with sqrt(p_H2) [hb]. */
export function sievertsSolubilityCm3Per100g(solubilityAt1AtmCm3Per100g: number, hydrogenPressureAtm: number): number {
  return solubilityAt1AtmCm3Per100g * Math.sqrt(hydrogenPressureAtm);
}

/** Silicon lowers hydrogen solubility by 10^(-0.0119 · wt% Si): Doutre (1991) [hb, second-hand]. */
export function siliconSolubilityFactor(siliconPct: number): number {
  return 10 ** (-0.0119 * siliconPct);
}

/** Liquid-alloy solubility: Ransley-Neufeld, corrected for silicon, scaled by Sieverts' law. */
export function alloyHydrogenSolubilityCm3Per100g(input: {
  tempC: number;
  siliconPct?: number;
  hydrogenPressureAtm?: number;
}): number {
  const pureAt1Atm = liquidHydrogenSolubilityCm3Per100g(input.tempC);
  const alloyAt1Atm = pureAt1Atm * siliconSolubilityFactor(input.siliconPct ?? 0);
  return sievertsSolubilityCm3Per100g(alloyAt1Atm, input.hydrogenPressureAtm ?? 1);
}

/**
 * Saturation vapour pressure of water over a flat water surface, Magnus form with the
 * coefficients of Alduchov and Eskridge, J. Appl. Meteor. 35 (1996) 601-609:
 * e_s = 6.1094 · exp(17.625 · t / (t + 243.04)) hPa, t in °C (good to about 0.1 % from -40 to 50 °C).
 */
export function saturationVapourPressureKPa(tempC: number): number {
  const hPa = 6.1094 * Math.exp((17.625 * tempC) / (tempC + 243.04));
  return hPa / 10;
}

/** Water vapour pressure of the air: relative humidity is e / e_s (by definition). */
export function vapourPressureKPa(airTempC: number, humidityPct: number): number {
  return (humidityPct / 100) * saturationVapourPressureKPa(airTempC);
}
