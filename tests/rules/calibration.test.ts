import { describe, expect, it } from "vitest";
import { findBuiltInAlloy } from "../../rules/alloys";
import {
  causeRecords,
  confirmedFirings,
  FACTOR_MAX,
  FACTOR_MIN,
  ruleRecords,
  smoothedAgreement,
  weightFactorOf,
  weightFactors,
} from "../../rules/calibration";
import { caseSchema } from "../../rules/case";
import { diagnose } from "../../rules/engine";
import { withRule } from "../../rules/backtest";
import { base, casebook, draft } from "./casebook-fixture";

describe("weight calibration from confirmed cases", () => {
  it("leaves a rule with no record at its author's weight", () => {
    expect(weightFactorOf(undefined)).toBe(1);
    expect(weightFactorOf({ fired: 0, agreed: 0 })).toBe(1);
  });

  it("smooths with a Beta(2, 2) prior: 7 of 9 reads as 9/13, not 7/9", () => {
    expect(smoothedAgreement({ fired: 9, agreed: 7 })).toBeCloseTo(9 / 13, 10);
    expect(weightFactorOf({ fired: 9, agreed: 7 })).toBeCloseTo(0.5 + 9 / 13, 10);
  });

  it("moves up with agreement and down with disagreement, more with more cases", () => {
    const one = weightFactorOf({ fired: 1, agreed: 1 });
    const nine = weightFactorOf({ fired: 9, agreed: 9 });
    expect(one).toBeGreaterThan(1);
    expect(nine).toBeGreaterThan(one);
    expect(weightFactorOf({ fired: 1, agreed: 0 })).toBeLessThan(1);
    expect(weightFactorOf({ fired: 9, agreed: 0 })).toBeLessThan(weightFactorOf({ fired: 1, agreed: 0 }));
    // One case does not swing it far: a single agreement moves the factor by 0.1 only.
    expect(one).toBeCloseTo(1.1, 10);
    for (let agreed = 1; agreed <= 9; agreed++)
      expect(weightFactorOf({ fired: 9, agreed })).toBeGreaterThan(weightFactorOf({ fired: 9, agreed: agreed - 1 }));
  });

  it("stays within its bounds however long the record", () => {
    for (const fired of [1, 10, 1000, 1e6]) {
      expect(weightFactorOf({ fired, agreed: fired })).toBeLessThan(FACTOR_MAX);
      expect(weightFactorOf({ fired, agreed: 0 })).toBeGreaterThan(FACTOR_MIN);
    }
  });

  it("keeps each rule's and each cause's record on the fixture casebook", async () => {
    const rs = withRule(base, draft);
    const firings = await confirmedFirings(casebook, rs);
    expect(firings).toHaveLength(3); // cases 1, 2, 4 are confirmed
    const rules = ruleRecords(firings, rs.rules);
    // Cold pour (below 680 °C) fired on 1, 2, 4 (660, 660, 650 °C) and was right for 2 and 4.
    expect(rules.get("misrun-cold")).toEqual({ fired: 3, agreed: 2 });
    // The draft (drop above 250 mm) fired on 1 and 4 (300, 280 mm) and was right for 1.
    expect(rules.get("shop-draft")).toEqual({ fired: 2, agreed: 1 });
    const byCause = causeRecords(firings, rs.rules);
    expect(byCause.get("cold-pour")).toEqual({ confirmed: 3, right: 2 });
    expect(byCause.get("turbulent-fill")).toEqual({ confirmed: 2, right: 1 });
  });

  it("ranks a cause whose rule was often right above one whose rule was often wrong", async () => {
    // Equal weights: 0.6 each. Left to themselves the two tie; the shop's record breaks the tie.
    const even = withRule(base, { ...draft, weight: 0.6 });
    const c = caseSchema.parse({
      alloy: "A356.0",
      process: "green-sand",
      pourTempC: 660,
      sprueHeightMm: 300,
      defects: [{ type: "misrun" }],
    });
    const alloy = findBuiltInAlloy("A356.0")!;
    const factor = weightFactors(
      new Map([
        ["misrun-cold", { fired: 9, agreed: 1 }],
        ["shop-draft", { fired: 9, agreed: 8 }],
      ]),
    );
    const plain = await diagnose(c, { alloy, ruleSet: even });
    expect(plain.causes[0].score).toBe(plain.causes[1].score);
    const learned = await diagnose(c, { alloy, ruleSet: even, weightFactor: factor });
    expect(learned.causes.map((x) => x.id)).toEqual(["turbulent-fill", "cold-pour"]);
    expect(learned.causes[0].score).toBeGreaterThan(plain.causes[0].score);
    expect(learned.causes[1].score).toBeLessThan(plain.causes[1].score);
    expect(learned.causes[0].score).toBeLessThanOrEqual(1);
  });
});
