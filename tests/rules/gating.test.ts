import { describe, expect, it } from "vitest";
import {
  fillTimeS,
  flowRateM3PerS,
  gatingFromCase,
  ingateAreaFromRatioM2,
  ingateVelocityMPerS,
  ingateVelocityRatio,
  isPressurised,
  parseGatingRatio,
  runnerVelocityMPerS,
  sprueBaseVelocityMPerS,
} from "@/rules/compute/gating";

// Worked example, docs/gating-and-copper-facts.md "Filling" [calc] on the Groover sprue ([hb] Groover,
// Fundamentals of Modern Manufacturing): h = 0.20 m, sprue base 2.5 cm², cavity 1560 cm³, Cd = 0.8.
const H_M = 0.2;
const BASE_M2 = 2.5e-4;
const CAVITY_M3 = 1560e-6;

describe("gating by continuity (worked example in docs/gating-and-copper-facts.md)", () => {
  it("sprue base runs at 158.5 cm/s with Cd 0.8 and 198.1 cm/s without losses", () => {
    expect(sprueBaseVelocityMPerS(H_M)).toBeCloseTo(1.585, 2);
    expect(sprueBaseVelocityMPerS(H_M, 1)).toBeCloseTo(1.981, 3);
  });

  it("passes 396 cm³/s and fills the 1560 cm³ cavity in 3.9 s (3.15 s with Cd = 1, as Groover)", () => {
    const q = flowRateM3PerS(sprueBaseVelocityMPerS(H_M), BASE_M2);
    expect(q * 1e6).toBeCloseTo(396, 0);
    expect(fillTimeS(CAVITY_M3, q)).toBeCloseTo(3.9, 1);
    expect(fillTimeS(CAVITY_M3, flowRateM3PerS(sprueBaseVelocityMPerS(H_M, 1), BASE_M2))).toBeCloseTo(3.15, 2);
  });

  it("1:2:4 slows the metal to 0.40 m/s at the ingates (runner 0.79 m/s), 0.50 m/s with Cd = 1", () => {
    const ratio = parseGatingRatio("1:2:4")!;
    const ingateM2 = ingateAreaFromRatioM2(BASE_M2, ratio);
    expect(ingateM2 * 1e4).toBeCloseTo(10, 6);
    const v = ingateVelocityMPerS({
      sprueBaseVelocityMPerS: sprueBaseVelocityMPerS(H_M),
      sprueBaseAreaM2: BASE_M2,
      ingateAreaM2: ingateM2,
    });
    expect(v).toBeCloseTo(0.396, 3);
    expect(runnerVelocityMPerS(sprueBaseVelocityMPerS(H_M), ratio)).toBeCloseTo(0.79, 2);
    expect(
      ingateVelocityMPerS({
        sprueBaseVelocityMPerS: sprueBaseVelocityMPerS(H_M, 1),
        sprueBaseAreaM2: BASE_M2,
        ingateAreaM2: ingateM2,
      }),
    ).toBeCloseTo(0.495, 3);
    expect(isPressurised(ratio)).toBe(false);
  });

  it("1:2:1 jets at 1.58 m/s, about 3 times the 0.5 m/s limit (Campbell, rule 2 [hb])", () => {
    const ratio = parseGatingRatio("1:2:1")!;
    const v = ingateVelocityMPerS({
      sprueBaseVelocityMPerS: sprueBaseVelocityMPerS(H_M),
      sprueBaseAreaM2: BASE_M2,
      ingateAreaM2: ingateAreaFromRatioM2(BASE_M2, ratio),
    });
    expect(v).toBeCloseTo(1.585, 2);
    expect(ingateVelocityRatio(v, 10)).toBeCloseTo(3.17, 2);
    expect(isPressurised(ratio)).toBe(true);
  });

  it("a 3:2:1 system chokes at the ingates: never faster than the sprue base", () => {
    const v = ingateVelocityMPerS({ sprueBaseVelocityMPerS: 1.585, sprueBaseAreaM2: 3e-4, ingateAreaM2: 1e-4 });
    expect(v).toBe(1.585);
  });

  it("reads ratios written several ways and refuses nonsense", () => {
    expect(parseGatingRatio("1 : 2 : 4")).toEqual({ sprue: 1, runner: 2, ingate: 4 });
    expect(parseGatingRatio("1-2-2")).toEqual({ sprue: 1, runner: 2, ingate: 2 });
    expect(parseGatingRatio("1:2")).toBeUndefined();
    expect(parseGatingRatio("1:0:4")).toBeUndefined();
    expect(parseGatingRatio("a:b:c")).toBeUndefined();
  });

  it("refuses impossible inputs with a message", () => {
    expect(() => sprueBaseVelocityMPerS(-0.1)).toThrow(RangeError);
    expect(() => sprueBaseVelocityMPerS(0.2, 1.2)).toThrow(/Cd/);
    expect(() => flowRateM3PerS(1, 0)).toThrow(RangeError);
    expect(() => fillTimeS(1e-3, 0)).toThrow(RangeError);
  });

  it("from a case: areas in mm², or a ratio, give the same ingate velocity; nothing without the sprue", () => {
    const byAreas = gatingFromCase({ sprueHeightMm: 200, chokeAreaMm2: 250, ingateAreaMm2: 1000 });
    const byRatio = gatingFromCase({ sprueHeightMm: 200, gatingRatio: "1:2:4" });
    expect(byAreas.ingateVelocityMPerS).toBeCloseTo(0.396, 3);
    expect(byRatio.ingateVelocityMPerS).toBeCloseTo(0.396, 3);
    expect(byAreas.flowRateM3PerS! * 1e6).toBeCloseTo(396, 0);
    expect(byAreas.pressurised).toBe(false);
    const none = gatingFromCase({ chokeAreaMm2: 250, ingateAreaMm2: 1000 });
    expect(none.ingateVelocityMPerS).toBeUndefined();
    expect(gatingFromCase({ sprueHeightMm: 200 }).ingateVelocityMPerS).toBeUndefined();
  });
});
