import { describe, expect, it } from "vitest";
import { castingYieldPct, meltYield } from "@/rules/compute/casting-yield";
import { KG_PER_LB } from "@/lib/units";

// Definition: yield = casting weight / poured weight (casting, gating and risers together), Giesserei-Lexikon
// "Output" [web]; worked example in docs/calculator-facts.md "Casting yield" [calc].
describe("casting yield", () => {
  it("is the casting's share of the metal poured into its mould", () => {
    expect(castingYieldPct(1.8, 3.0)).toBeCloseTo(60, 6);
    expect(castingYieldPct(2.4, 3.6)).toBeCloseTo(66.67, 2);
  });

  it("is the same ratio in pounds (docs/calculator-facts.md: 3.97 lb from 6.61 lb)", () => {
    expect(castingYieldPct(1.8 / KG_PER_LB, 3.0 / KG_PER_LB)).toBeCloseTo(60, 6);
  });

  it("is unknown until both weights are there, and never divides by nothing", () => {
    expect(castingYieldPct(1.8, null)).toBeUndefined();
    expect(castingYieldPct(undefined, 3)).toBeUndefined();
    expect(castingYieldPct(1, 0)).toBeUndefined();
  });

  it("sums a melt's castings over their poured metal, and compares the pour with the charge", () => {
    // docs/calculator-facts.md "Casting yield": 4.2 / 6.6 = 63.6 %; 6.6 of 8.0 kg is 82.5 %, 1.4 kg left.
    const y = meltYield(
      [
        { castingWeightKg: 1.8, pouredWeightKg: 3.0 },
        { castingWeightKg: 2.4, pouredWeightKg: 3.6 },
      ],
      8.0,
    );
    expect(y.yieldPct).toBeCloseTo(63.64, 2);
    expect(y.castingKg).toBeCloseTo(4.2, 9);
    expect(y.pouredKg).toBeCloseTo(6.6, 9);
    expect(y.pouredOfChargePct).toBeCloseTo(82.5, 6);
    expect(y.leftOrLostKg).toBeCloseTo(1.4, 9);
    expect(y.weighed).toBe(2);
  });

  it("is not the mean of the castings' yields: a big mould counts for more", () => {
    const y = meltYield([
      { castingWeightKg: 1, pouredWeightKg: 2 }, // 50 %
      { castingWeightKg: 9, pouredWeightKg: 10 }, // 90 %
    ]);
    expect(y.yieldPct).toBeCloseTo((10 / 12) * 100, 6); // 83.3 %, not 70 %
  });

  it("leaves out a casting missing one weight from the yield, but counts its poured metal against the charge", () => {
    const y = meltYield(
      [
        { castingWeightKg: 1.8, pouredWeightKg: 3.0 },
        { castingWeightKg: null, pouredWeightKg: 2.0 },
        { castingWeightKg: 1.0, pouredWeightKg: null },
      ],
      6,
    );
    expect(y.weighed).toBe(1);
    expect(y.castings).toBe(3);
    expect(y.yieldPct).toBeCloseTo(60, 6);
    expect(y.pouredAllKg).toBeCloseTo(5, 9);
    expect(y.pouredWeighed).toBe(2);
    expect(y.leftOrLostKg).toBeCloseTo(1, 9);
  });

  it("says nothing of the charge when none was weighed or nothing poured was", () => {
    expect(meltYield([{ castingWeightKg: 1, pouredWeightKg: 2 }]).pouredOfChargePct).toBeUndefined();
    expect(meltYield([{ castingWeightKg: 1, pouredWeightKg: null }], 5).leftOrLostKg).toBeUndefined();
    expect(meltYield([], 5).yieldPct).toBeUndefined();
  });
});
