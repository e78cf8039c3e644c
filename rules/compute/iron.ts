/**
 * Gray and ductile iron: carbon equivalent and liquidus (docs/gating-and-copper-facts.md "Iron").
 * Composition in wt %.
 */

/** CE = %C + (%Si + %P) / 3; eutectic at CE ≈ 4.3 (Fe-C) [web]; 4.2 per Stefanescu (2021) [hb]. */
export function carbonEquivalentPct(carbonPct: number, siliconPct: number, phosphorusPct = 0) {
  return carbonPct + (siliconPct + phosphorusPct) / 3;
}
export const EUTECTIC_CE_PCT = 4.3;

/**
 * Liquidus of hypoeutectic to eutectic iron, TL = 1625 - 110 · CEL with
 * CEL = C + 0.23 Si - 0.03 Mn + 0.32 P + 0.64 S + 0.02 Ni + 0.06 Cr
 * [hb] Koriyama, Kanno, Iwami and Kang, Int. J. Metalcasting (2020), abstract.
 */
export function ironLiquidusC(c: {
  carbonPct: number;
  siliconPct: number;
  manganesePct?: number;
  phosphorusPct?: number;
  sulphurPct?: number;
}) {
  const cel =
    c.carbonPct +
    0.23 * c.siliconPct -
    0.03 * (c.manganesePct ?? 0) +
    0.32 * (c.phosphorusPct ?? 0) +
    0.64 * (c.sulphurPct ?? 0);
  return 1625 - 110 * cel;
}
