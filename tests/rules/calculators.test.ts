import { describe, expect, it } from "vitest";
import { chargeForMeltLossKg, meltTempForPourC, riserDiameterForModulusCm } from "../../rules/compute/calculators";
import {
  fillTimeS,
  flowRateM3PerS,
  ingateAreaForVelocityM2,
  ingateVelocityMPerS,
  sprueBaseVelocityMPerS,
} from "../../rules/compute/gating";
import { chvorinovTimeMin, modulusCm } from "../../rules/compute/solidification";

// Worked examples from docs/calculator-facts.md. Groover takes g = 9.81 m/s² (198.1 cm/s at 0.20 m);
// the code uses standard gravity 9.80665, so velocities agree to 0.01 m/s.
describe("gating, the Groover sprue with Cd = 0.8 (docs/calculator-facts.md 'Filling' [calc] from [hb] Groover)", () => {
  const vBase = sprueBaseVelocityMPerS(0.2);
  const chokeM2 = 2.5e-4;
  it("sprue base 1.585 m/s, flow 396 cm³/s, fill of 1560 cm³ in 3.9 s", () => {
    expect(vBase).toBeCloseTo(1.58, 2);
    const q = flowRateM3PerS(vBase, chokeM2);
    expect(q * 1e6).toBeCloseTo(396.2, 0);
    expect(fillTimeS(1560e-6, q)).toBeCloseTo(3.94, 2);
  });
  it("1:2:4 (ingates 10 cm²) gives 0.40 m/s; 1:2:1 (2.5 cm²) 1.58 m/s", () => {
    expect(
      ingateVelocityMPerS({ sprueBaseVelocityMPerS: vBase, sprueBaseAreaM2: chokeM2, ingateAreaM2: 10e-4 }),
    ).toBeCloseTo(0.396, 3);
    expect(
      ingateVelocityMPerS({ sprueBaseVelocityMPerS: vBase, sprueBaseAreaM2: chokeM2, ingateAreaM2: 2.5e-4 }),
    ).toBeCloseTo(1.58, 2);
  });
  it("the ingate area for 0.5 m/s is Q / 0.5 = 7.92 cm² [calc]", () => {
    expect(ingateAreaForVelocityM2(flowRateM3PerS(vBase, chokeM2), 0.5) * 1e4).toBeCloseTo(7.92, 2);
  });
});

describe("riser, Groover's plate 7.5 x 12.5 x 2.0 cm (docs/calculator-facts.md 'Chvorinov' [hb])", () => {
  const m = modulusCm(187.5, 267.5);
  it("modulus 0.701 cm, 1.6 min at C_m 3.26 min/cm²", () => {
    expect(m).toBeCloseTo(0.701, 3);
    expect(chvorinovTimeMin(m, 3.26)).toBeCloseTo(1.6, 1);
  });
  it("a riser of 1.2 x the modulus is D = H = 5.05 cm and freezes after the plate [calc]", () => {
    const d = riserDiameterForModulusCm(m);
    expect(d).toBeCloseTo(5.05, 2);
    expect(chvorinovTimeMin(d / 6, 3.26)).toBeGreaterThan(chvorinovTimeMin(m, 3.26));
  });
});

describe("metal and temperature arithmetic [calc]", () => {
  it("10 kg poured with 5 % melt loss needs 10.53 kg charged", () => {
    expect(chargeForMeltLossKg(10, 5)).toBeCloseTo(10.526, 3);
  });
  it("refuses a melt loss of 100 % and a negative transfer loss", () => {
    expect(() => chargeForMeltLossKg(10, 100)).toThrow(RangeError);
    expect(() => meltTempForPourC(740, -5)).toThrow(RangeError);
    expect(meltTempForPourC(740, 25)).toBe(765);
  });
});
