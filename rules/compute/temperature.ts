/** Temperatures. ITS-90 keeps 273.15 K between the kelvin and the degree Celsius (Preston-Thomas 1990). */
export const KELVIN_AT_0_C = 273.15;

export function celsiusToKelvin(tempC: number): number {
  return tempC + KELVIN_AT_0_C;
}

/**
 * Superheat: how far the metal is above its liquidus, so how much heat it can lose before it starts
 * to freeze. Negative when poured below the liquidus (already mushy).
 */
export function superheatC(pourTempC: number, liquidusC: number): number {
  return pourTempC - liquidusC;
}
