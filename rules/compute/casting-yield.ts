/**
 * Casting yield: the casting's weight as a share of all the metal poured into its mould, the rest
 * being sprue, runners, risers and overflows that go back to the furnace (docs/calculator-facts.md
 * "Casting yield", after the Giesserei-Lexikon entry "Output"). It measures how much metal the gating
 * costs, not whether the casting is sound, so it never feeds the diagnosis.
 */
export type Weighed = { castingWeightKg: number | null; pouredWeightKg: number | null };

/** Yield of one mould in percent, or undefined until both weights are known. */
export function castingYieldPct(castingKg: number | null | undefined, pouredKg: number | null | undefined) {
  if (typeof castingKg !== "number" || typeof pouredKg !== "number" || !(pouredKg > 0)) return undefined;
  return (castingKg / pouredKg) * 100;
}

export type MeltYield = {
  /** Castings of the melt with both weights, and how many castings the melt has. */
  weighed: number;
  castings: number;
  /** Sums over the weighed castings only, so a mould weighed once does not skew the ratio. */
  castingKg: number;
  pouredKg: number;
  yieldPct?: number;
  /** Metal poured into every mould with a poured weight, against the charge. */
  pouredAllKg: number;
  pouredWeighed: number;
  chargeKg?: number;
  pouredOfChargePct?: number;
  /** Charge less metal poured: what stayed in the crucible or was lost as dross and skimmings. */
  leftOrLostKg?: number;
};

/** A melt's yield: the sum of its castings over the sum of what was poured for them, and what was poured of the charge. */
export function meltYield(castings: Weighed[], chargeKg?: number | null): MeltYield {
  const both = castings.filter((c) => castingYieldPct(c.castingWeightKg, c.pouredWeightKg) !== undefined);
  const castingKg = both.reduce((s, c) => s + c.castingWeightKg!, 0);
  const pouredKg = both.reduce((s, c) => s + c.pouredWeightKg!, 0);
  const poured = castings.filter((c) => typeof c.pouredWeightKg === "number");
  const pouredAllKg = poured.reduce((s, c) => s + c.pouredWeightKg!, 0);
  const charge = typeof chargeKg === "number" && chargeKg > 0 ? chargeKg : undefined;
  return {
    weighed: both.length,
    castings: castings.length,
    castingKg,
    pouredKg,
    yieldPct: both.length ? castingYieldPct(castingKg, pouredKg) : undefined,
    pouredAllKg,
    pouredWeighed: poured.length,
    chargeKg: charge,
    pouredOfChargePct: charge && poured.length ? (pouredAllKg / charge) * 100 : undefined,
    leftOrLostKg: charge && poured.length ? charge - pouredAllKg : undefined,
  };
}
