import { describe, expect, it } from "vitest";
import { findBuiltInAlloy } from "../../rules/alloys";
import { CalcInputError, runCalculator, type CalcAlloy, type CalcResult } from "../../rules/calculators";
import { shrinkRuleMarking } from "../../rules/calculators/pattern";
import { gatingPrefill } from "../../lib/calculator-fields";

const alloy = (d: string): CalcAlloy => {
  const a = findBuiltInAlloy(d);
  if (!a) throw new Error(d);
  return a;
};
const line = (r: CalcResult, label: string) => {
  const l = r.lines.find((x) => x.label.startsWith(label));
  if (!l) throw new Error(`no line ${label}: ${r.lines.map((x) => x.label).join(", ")}`);
  return l.si;
};
const refusal = (f: () => unknown) => {
  try {
    f();
  } catch (e) {
    if (e instanceof CalcInputError) return e.field;
    throw e;
  }
  throw new Error("accepted");
};

describe("pour temperature (docs/calculator-facts.md 'Pour temperature')", () => {
  const a356 = alloy("A356.0");
  it("A356 in green sand: 700-760 °C [mem]; middle 730 °C is 115 °C over a 615 °C liquidus; +30 °C loss is 760 °C", () => {
    const r = runCalculator("pour-temperature", { alloy: "A356.0", process: "green-sand", transferLossC: 30 }, a356);
    expect(line(r, "Window, low")).toBe(700);
    expect(line(r, "Window, high")).toBe(760);
    expect(line(r, "Superheat")).toBe(115);
    expect(line(r, "Melt temperature")).toBe(760);
  });
  it("a planned 690 °C falls 10 °C below the window and is warned about", () => {
    const r = runCalculator(
      "pour-temperature",
      { alloy: "A356.0", process: "green-sand", plannedPourC: 690, transferLossC: 25 },
      a356,
    );
    expect(r.warnings.join(" ")).toMatch(/10 °C below/);
    expect(line(r, "Melt temperature")).toBe(715);
  });
  it("refuses a pour at or below the solidus (555 °C for A356 in the alloy table)", () => {
    expect(
      refusal(() =>
        runCalculator(
          "pour-temperature",
          { alloy: "A356.0", process: "green-sand", plannedPourC: 540, transferLossC: 0 },
          a356,
        ),
      ),
    ).toBe("plannedPourC");
  });
});

describe("metal to melt (docs/calculator-facts.md 'Metal' [calc])", () => {
  const a356 = alloy("A356.0"); // 2685 kg/m³ [web]
  it("1000 cm³ of A356 is 2.685 kg; at 50 % yield 5.37 kg poured; 5 % melt loss is 5.653 kg to melt", () => {
    const r = runCalculator(
      "metal",
      { alloy: "A356.0", method: "volume", volumeCm3: 1000, yieldPct: 50, meltLossPct: 5 },
      a356,
    );
    expect(line(r, "Casting weight")).toBeCloseTo(2.685, 3);
    expect(line(r, "Metal poured")).toBeCloseTo(5.37, 3);
    expect(line(r, "Metal to melt")).toBeCloseTo(5.6526, 3);
  });
  it("a 20 g foam pattern at 20 kg/m³ is 1000 cm³ of metal (volume for volume)", () => {
    const r = runCalculator(
      "metal",
      { alloy: "A356.0", method: "foam", foamMassKg: 0.02, foamDensityKgM3: 20, yieldPct: 100, meltLossPct: 0 },
      a356,
    );
    expect(line(r, "Casting volume")).toBeCloseTo(1000, 6);
  });
  it("warns when the charge passes the crucible or three quarters of it [mem] common practice", () => {
    const base = { alloy: "A356.0", method: "previous" as const, previousCastingKg: 2, yieldPct: 50, meltLossPct: 0 };
    expect(runCalculator("metal", { ...base, crucibleKg: 3 }, a356).warnings.join()).toMatch(/more than the crucible/);
    expect(runCalculator("metal", { ...base, crucibleKg: 5 }, a356).warnings.join()).toMatch(/three quarters/);
    expect(runCalculator("metal", { ...base, crucibleKg: 10 }, a356).warnings).toEqual([]);
  });
  it("asks for the figure its way of working needs", () => {
    expect(
      refusal(() => runCalculator("metal", { alloy: "A356.0", method: "foam", yieldPct: 50, meltLossPct: 0 }, a356)),
    ).toBe("foamMassKg");
  });
});

describe("pattern size ([web] shrink-rule charts, docs/calculator-facts.md 'Pattern shrink allowance')", () => {
  it("aluminium 1.30 % is the 5/32 in/ft rule: a 300 mm casting needs a 303.9 mm pattern", () => {
    const r = runCalculator("pattern", { alloy: "A356.0", lengthMm: 300, widthMm: 100 }, alloy("A356.0"));
    expect(line(r, "Pattern length")).toBeCloseTo(303.9, 6);
    expect(line(r, "Pattern width")).toBeCloseTo(101.3, 6);
    expect(r.lines.some((l) => l.label.includes("5/32 in/ft"))).toBe(true);
  });
  it("brass and bronze 1.56 % is the 3/16 in/ft rule", () => {
    expect(shrinkRuleMarking((1.5625 / 100) * 12)).toBe("3/16 in/ft");
  });
});

describe("riser, Groover's plate 75 x 125 x 20 mm (docs/calculator-facts.md 'Chvorinov' [hb])", () => {
  const r = runCalculator(
    "riser",
    { shape: "plate", lengthMm: 125, widthMm: 75, thicknessMm: 20, mouldConstantMinPerCm2: 3.26 },
    undefined,
  );
  it("modulus 187.5 / 267.5 = 0.701 cm, freezing in 1.6 min", () => {
    expect(line(r, "Casting modulus")).toBeCloseTo(7.01, 2);
    expect(line(r, "Casting freezes")).toBeCloseTo(1.6, 1);
  });
  it("riser modulus 1.2 x [mem]: D = H = 6 · 0.841 = 5.05 cm, freezing in 2.3 min, later than the plate", () => {
    expect(line(r, "Riser diameter")).toBeCloseTo(50.5, 1);
    expect(line(r, "Riser freezes")).toBeCloseTo(2.31, 2);
  });
  it("neck d = 4 · 1.1 · 0.701 = 3.08 cm [mem] 1 : 1.1 : 1.2; plate feeding distance 4.5 T = 90 mm [mem]", () => {
    expect(line(r, "Neck diameter")).toBeCloseTo(30.85, 1);
    expect(line(r, "Feeding distance")).toBe(90);
  });
  it("a cylinder D = H = 60 mm has modulus D/6 = 10 mm (geometry)", () => {
    const c = runCalculator("riser", { shape: "cylinder", diameterMm: 60, heightMm: 60 }, undefined);
    expect(line(c, "Casting modulus")).toBeCloseTo(10, 9);
  });
  it("refuses a section with a missing size", () => {
    expect(refusal(() => runCalculator("riser", { shape: "typed", volumeCm3: 100 }, undefined))).toBe("areaCm2");
  });
});

describe("hydrogen, Ransley-Neufeld with Doutre's silicon factor (docs/calculator-facts.md 'Hydrogen in aluminium')", () => {
  it("A356 (7 % Si) at 700 °C: 0.912 · 0.825 = 0.752 cm³/100 g, an upper bound", () => {
    const r = runCalculator("hydrogen", { alloy: "A356.0", meltTempC: 700 }, alloy("A356.0"));
    expect(line(r, "Upper bound")).toBeCloseTo(0.752, 2);
    expect(r.summary).toMatch(/upper bound/);
  });
  it("refuses copper alloys and a melt at or below the liquidus", () => {
    expect(refusal(() => runCalculator("hydrogen", { alloy: "C83600", meltTempC: 1150 }, alloy("C83600")))).toBe(
      "alloy",
    );
    expect(refusal(() => runCalculator("hydrogen", { alloy: "A356.0", meltTempC: 600 }, alloy("A356.0")))).toBe(
      "meltTempC",
    );
  });
});

// Worked example of docs/gating-and-copper-facts.md "Filling" [calc] on the Groover sprue ([hb] Groover,
// Fundamentals of Modern Manufacturing): h = 0.20 m, sprue base 2.5 cm², cavity 1560 cm³, Cd = 0.8.
describe("gating (docs/gating-and-copper-facts.md 'Filling', worked example)", () => {
  const groover = { sprueHeightMm: 200, chokeAreaCm2: 2.5, castingVolumeCm3: 1560, position: "bottom" as const };
  it("1:2:4 gives ingates of 10 cm² at 0.40 m/s, within 0.5 m/s; 396 cm³/s fills 1560 cm³ in 3.9 s", () => {
    const r = runCalculator("gating", { ...groover, ingateFrom: "ratio", gatingRatio: "1:2:4" }, undefined);
    expect(line(r, "Sprue-base velocity")).toBeCloseTo(1.585, 2);
    expect(line(r, "Flow")).toBeCloseTo(396, 0);
    expect(line(r, "Runner velocity")).toBeCloseTo(0.79, 2);
    expect(line(r, "Ingate velocity")).toBeCloseTo(0.4, 2);
    expect(line(r, "Pour time")).toBeCloseTo(3.9, 1);
    expect(r.warnings).toEqual([]);
    expect(r.summary).toMatch(/within the 0.5 m\/s/);
  });
  it("1:2:1 jets at 1.58 m/s, about 3 × the limit, and asks for 7.9 cm² of ingates (Q / 0.5 m/s)", () => {
    const r = runCalculator("gating", { ...groover, ingateFrom: "ratio", gatingRatio: "1:2:1" }, undefined);
    expect(line(r, "Ingate velocity")).toBeCloseTo(1.58, 2);
    expect(line(r, "Ingate area for the critical velocity")).toBeCloseTo(7.92, 2);
    expect(r.warnings[0]).toMatch(/3\.2 × the critical velocity.*7\.9 cm²/);
    expect(r.notes.join(" ")).toMatch(/pressurised/);
  });
  it("walls of 5 mm or less are judged against about 1 m/s (Campbell's rule 2 [hb])", () => {
    const r = runCalculator(
      "gating",
      { ...groover, ingateFrom: "area", ingateAreaCm2: 5, minSectionMm: 4, position: "side" },
      undefined,
    );
    expect(line(r, "Critical ingate velocity")).toBe(1);
    expect(line(r, "Ingate velocity")).toBeCloseTo(0.79, 2);
    expect(r.warnings).toEqual([]);
  });
  it("top gating says the metal falls inside the cavity; a missing ratio or area is refused by field", () => {
    const top = runCalculator(
      "gating",
      { ...groover, ingateFrom: "ratio", gatingRatio: "1:2:4", position: "top" },
      undefined,
    );
    expect(top.notes.join(" ")).toMatch(/falls inside the cavity/);
    expect(refusal(() => runCalculator("gating", { ...groover, ingateFrom: "ratio" }, undefined))).toBe("gatingRatio");
    expect(refusal(() => runCalculator("gating", { ...groover, ingateFrom: "area" }, undefined))).toBe("ingateAreaCm2");
  });
});

describe("the gating calculator opened from a casting starts from its logged gating", () => {
  it("areas go from mm² to cm² (1 cm² = 100 mm²); a ratio offered is kept, another falls back to the ingate area", () => {
    const logged = { sprueHeightMm: 200, chokeAreaMm2: 250, ingateAreaMm2: 1000, gating: "bottom" };
    expect(gatingPrefill({ ...logged, gatingRatio: "1 : 2 : 4" })).toMatchObject({
      sprueHeightMm: 200,
      chokeAreaCm2: 2.5,
      ingateFrom: "ratio",
      gatingRatio: "1:2:4",
      position: "bottom",
    });
    expect(gatingPrefill({ ...logged, gatingRatio: "1:3:3" })).toMatchObject({ ingateFrom: "area", ingateAreaCm2: 10 });
  });
});
