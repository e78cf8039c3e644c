import { describe, it, expect } from "vitest";
import { caseSchema, type DiagnosisCase } from "@/rules/case";
import { ALLOY_FAMILIES, FACTS } from "@/rules/fact-catalog";
import { BUILT_IN_ALLOYS, findBuiltInAlloy, type AlloySpec } from "@/rules/alloys";
import { deriveFacts, roundFact } from "@/rules/facts";

const alloy = (designation: string): AlloySpec => {
  const found = findBuiltInAlloy(designation);
  if (!found) throw new Error(`no built-in alloy ${designation}`);
  return found;
};
const makeCase = (input: Record<string, unknown>): DiagnosisCase =>
  caseSchema.parse({ defects: [{ type: "misrun" }], alloy: "A356.0", process: "green-sand", ...input });
const factsOf = (input: Record<string, unknown>, designation = "A356.0") =>
  deriveFacts(makeCase({ alloy: designation, ...input }), alloy(designation));

describe("built-in alloys", () => {
  it("holds the aluminium, copper-base and iron alloys of the foundry facts with sane, sourced figures", () => {
    expect(BUILT_IN_ALLOYS.length).toBeGreaterThanOrEqual(32);
    for (const d of [
      "206.0",
      "208.0",
      "242.0",
      "355.0",
      "380.0",
      "514.0",
      "520.0",
      "771.0",
      "C86500",
      "C87300",
      "C87600",
      "C92200",
      "C93200",
      "C95800",
      "gray-iron",
      "ductile-iron",
    ])
      expect(findBuiltInAlloy(d)?.designation, d).toBe(d);
    for (const a of BUILT_IN_ALLOYS) {
      expect(ALLOY_FAMILIES).toContain(a.family);
      expect(a.liquidusC).toBeGreaterThan(a.solidusC);
      expect(a.sources).toMatch(/\[(mem|web|hb)\]/);
    }
  });
  it("finds alloys ignoring case, spaces and a missing .0", () => {
    expect(findBuiltInAlloy("A356.0")?.designation).toBe("A356.0");
    expect(findBuiltInAlloy("a356")?.designation).toBe("A356.0");
    expect(findBuiltInAlloy("356")?.designation).toBe("356.0");
    expect(findBuiltInAlloy(" c83600 ")?.designation).toBe("C83600");
    expect(findBuiltInAlloy("6061")?.liquidusC).toBe(652); // [web] foundry-facts
    expect(findBuiltInAlloy("7075")).toBeUndefined();
    expect(findBuiltInAlloy("")).toBeUndefined();
  });
});

describe("deriveFacts", () => {
  it("produces exactly the catalogued facts", () => {
    const facts = factsOf({});
    expect(Object.keys(facts).sort()).toEqual(FACTS.map((f) => f.name).sort());
  });

  it("leaves facts undefined when their inputs are missing, never 0", () => {
    const facts = factsOf({});
    for (const name of [
      "pourTempC",
      "superheatC",
      "meltSuperheatC",
      "pourWindowPosition",
      "pourBelowWindowC",
      "pourAboveWindowC",
      "hydrogenSolubilityCm3Per100g",
      "vapourPressureKPa",
      "moistureRisk",
      "frontVelocityMS",
      "frontVelocityRatio",
      "sectionRatio",
      "freezeTimeRatio",
      "thickSectionModulusMm",
      "coatingApplied",
      "coatingCoats",
    ]) {
      expect(facts[name], name).toBeUndefined();
    }
    // What the alloy and process alone decide is known.
    expect(facts).toMatchObject({
      alloyFamily: "al-si",
      isAluminium: true,
      liquidusC: 615,
      solidusC: 555,
      freezingRangeC: 60, // A356.0 [mem] ASM Vol. 2
      pourWindowLowC: 700,
      pourWindowHighC: 760,
      velocityGuideMS: 0.5,
      defectCount: 1,
      worstSeverity: 2,
    });
  });

  it("calls a cold lost-foam pour into 5 mm walls 'below' the window", () => {
    // The design's example: superheat 95 °C (A356.0 liquidus 615 °C [mem]); lost foam 730-790 °C [mem].
    const facts = factsOf({ process: "lost-foam", pourTempC: 710, minSectionMm: 5, maxSectionMm: 12 });
    expect(facts.superheatC).toBe(95);
    expect(facts).toMatchObject({ pourWindowPosition: "below", pourBelowWindowC: 20, pourAboveWindowC: 0 });
  });

  it("calls a hot green-sand pour into heavy walls 'above' the window", () => {
    const facts = factsOf({ pourTempC: 780, minSectionMm: 12 }); // green sand 700-760 °C [mem]
    expect(facts).toMatchObject({ pourWindowPosition: "above", pourBelowWindowC: 0, pourAboveWindowC: 20 });
  });

  it("rates a humid day with no degassing as high moisture risk", () => {
    const facts = factsOf({ ambientTempC: 30, humidityPct: 80, degassing: "none", charge: "ingot" });
    // Magnus, Alduchov and Eskridge 1996: e_s(30 °C) = 4.237 kPa, so 80 % is 3.39 kPa [calc].
    expect(facts.vapourPressureKPa as number).toBeCloseTo(3.389, 3);
    expect(facts.moistureRisk).toBe("high");
    expect(facts.degassing).toBe("none");
  });

  it("rates moisture from sand, coating and charge", () => {
    // Thresholds are common practice (rules/compute/moisture-risk.ts); green sand 3-5 % is usual [mem].
    expect(factsOf({ ambientTempC: 15, humidityPct: 40, sandMoisturePct: 4, charge: "ingot" }).moistureRisk).toBe(
      "low",
    );
    expect(factsOf({ ambientTempC: 15, humidityPct: 40, charge: "mixed-scrap" }).moistureRisk).toBe("moderate");
    expect(factsOf({ sandMoisturePct: 7, sandType: "synthetic-bentonite" }).moistureRisk).toBe("high");
    // Natural-bonded sand wants about 5-8 % water [mem]: 7 % is not wet for it.
    expect(factsOf({ sandMoisturePct: 7, sandType: "natural-bonded" }).moistureRisk).toBe("low");
    expect(factsOf({ process: "lost-foam", coating: { applied: true, dried: false } }).moistureRisk).toBe("high");
    expect(factsOf({ humidityPct: 85 }).moistureRisk).toBe("high"); // humidity alone when the air temperature is missing
  });

  it("flattens the coating", () => {
    expect(factsOf({ coating: { applied: true, dried: false, coats: 2 } })).toMatchObject({
      coatingApplied: true,
      coatingDried: false,
      coatingCoats: 2,
    });
  });

  it("gives hydrogen solubility at the melt temperature, with silicon, for aluminium only", () => {
    // Ransley-Neufeld 1.254 cm³/100 g at 750 °C [calc] × silicon factor 0.8255 for 7 % Si (Doutre [hb]).
    expect(factsOf({ meltTempC: 750, pourTempC: 700 }).hydrogenSolubilityCm3Per100g as number).toBeCloseTo(1.0355, 3);
    // No melt temperature: at the pour temperature, 0.912 × 0.8255 [calc].
    expect(factsOf({ pourTempC: 700 }).hydrogenSolubilityCm3Per100g as number).toBeCloseTo(0.7526, 3);
    expect(factsOf({ meltTempC: 1150 }, "C83600").hydrogenSolubilityCm3Per100g).toBeUndefined();
  });

  it("gives copper-base pour windows per alloy and section from the copper table", () => {
    // CDA/NFFS "Copper Casting Alloys" pouring-temperature table [mem], docs/gating-and-copper-facts.md:
    // C83600 light sections 1150-1290 °C, heavy 1090-1200 °C.
    const light = factsOf({ pourTempC: 1120, minSectionMm: 6 }, "C83600");
    expect(light).toMatchObject({ isAluminium: false, metal: "copper", pourWindowLowC: 1150, pourWindowHighC: 1290 });
    expect(light).toMatchObject({ pourWindowPosition: "below", pourBelowWindowC: 30 });
    const heavy = factsOf({ pourTempC: 1120, minSectionMm: 40 }, "C83600");
    expect(heavy).toMatchObject({ pourWindowLowC: 1090, pourWindowHighC: 1200, pourWindowPosition: "inside" });
    // C86500 manganese bronze: light 1040-1100, heavy 980-1040 °C.
    expect(factsOf({ pourTempC: 1060, minSectionMm: 30 }, "C86500").pourWindowPosition).toBe("above");
  });

  it("gives the front velocity against the guide", () => {
    // 200 mm free fall: 1.98 m/s [calc]; guide 1 m/s for a 3 mm wall (Campbell rule 2 [hb]).
    const facts = factsOf({ sprueHeightMm: 200, minSectionMm: 3 });
    expect(facts.frontVelocityMS as number).toBeCloseTo(1.9806, 4);
    expect(facts.velocityGuideMS).toBe(1);
    expect(facts.frontVelocityRatio as number).toBeCloseTo(1.9806, 4);
    expect(factsOf({ sprueHeightMm: 200, minSectionMm: 8 }).frontVelocityRatio as number).toBeCloseTo(3.961, 3);
  });

  it("compares thick and thin sections by Chvorinov", () => {
    const facts = factsOf({ minSectionMm: 5, maxSectionMm: 20 });
    expect(facts).toMatchObject({ sectionRatio: 4, freezeTimeRatio: 16, thickSectionModulusMm: 10 }); // plate M = t/2, n = 2 [hb]
    expect(factsOf({ maxSectionMm: 20 }).sectionRatio).toBeUndefined();
  });

  it("counts defects and finds the worst severity", () => {
    const c = makeCase({
      defects: [{ type: "misrun", severity: 1 }, { type: "fold", severity: 3 }, { type: "blister" }],
    });
    expect(deriveFacts(c, alloy("A356.0"))).toMatchObject({ defectCount: 3, worstSeverity: 3 });
  });

  it("rounds nothing itself; roundFact rounds for display", () => {
    const facts = factsOf({ sprueHeightMm: 200, pourTempC: 700.04 });
    expect(facts.frontVelocityMS).not.toBe(1.98);
    expect(roundFact("frontVelocityMS", facts.frontVelocityMS)).toBe(1.98);
    expect(roundFact("superheatC", facts.superheatC)).toBe(85);
    expect(roundFact("pourTempC", 700.04)).toBe(700);
    expect(roundFact("hydrogenSolubilityCm3Per100g", 1.03546)).toBe(1.035);
    expect(roundFact("moistureRisk", "high")).toBe("high");
    expect(roundFact("notAFact", 1.23456)).toBe(1.23456);
    expect(roundFact("superheatC", undefined)).toBeUndefined();
  });
});
