import convert from "convert-units";
import { describe, expect, it } from "vitest";
import { formatValue, fromField, fromSi, KG_M3_PER_LB_FT3, SI_UNITS, toField, toSi, type Units } from "../../lib/units";
import { calcFormat, calcFromField, calcToField, calcUnit } from "../../lib/calculator-fields";

const US: Units = { temperature: "F", length: "in", mass: "lb" };
const SI: Units = { temperature: "C", length: "mm", mass: "kg" };

describe("length", () => {
  it("takes 1 in as exactly 25.4 mm", () => {
    // International yard and pound agreement (1959): 1 yd = 0.9144 m exactly, so 1 in = 25.4 mm exactly.
    expect(toSi("length", 1, US)).toBe(25.4);
    expect(fromSi("length", 254, US)).toBe(10);
    // Same agreement: 1 ft = 0.3048 m exactly (also in NIST SP 811, the Guide for the Use of the SI).
    expect(toSi("length", 12, US)).toBeCloseTo(304.8, 10);
  });

  it("agrees with convert-units to within its rounded foot", () => {
    // convert-units 2.3.4 defines the foot as 1/3.28084 m (a rounded figure), so only 1e-7 relative.
    expect(toSi("length", 1, US) / convert(1).from("in").to("mm")).toBeCloseTo(1, 6);
  });
});

describe("mass", () => {
  it("takes 1 lb as exactly 0.45359237 kg", () => {
    // International yard and pound agreement (1959): 1 lb = 0.45359237 kg exactly.
    expect(toSi("mass", 1, US)).toBe(0.45359237);
    expect(fromSi("mass", 0.45359237 * 100, US)).toBeCloseTo(100, 10);
  });

  it("agrees with convert-units to within its rounded pound", () => {
    // convert-units 2.3.4 uses 453.592 g (rounded), 8e-7 relative off the definition.
    expect(toSi("mass", 1, US) / convert(1).from("lb").to("kg")).toBeCloseTo(1, 5);
  });

  it("converts foam density between kg/m³ and lb/ft³", () => {
    // From the 1959 definitions: 1 lb/ft³ = 0.45359237 kg / 0.3048³ m³ = 16.018463... kg/m³.
    expect(KG_M3_PER_LB_FT3).toBeCloseTo(16.01846337, 7);
    expect(fromSi("density", 20.8, US)).toBeCloseTo(1.2985, 3);
  });
});

describe("temperature", () => {
  it("uses °F = °C × 9/5 + 32 at water's freezing point", () => {
    // The Fahrenheit scale's definition as given in NIST SP 811: t/°F = 1.8 t/°C + 32; water freezes at 0 °C = 32 °F.
    expect(fromSi("temperature", 0, US)).toBe(32);
    expect(toSi("temperature", 32, US)).toBe(0);
    // Same definition: water boils at 100 °C = 212 °F at standard pressure.
    expect(fromSi("temperature", 100, US)).toBeCloseTo(212, 10);
  });

  it("converts aluminium's ITS-90 freezing point, 660.323 °C, to 1220.58 °F", () => {
    // ITS-90, Preston-Thomas, Metrologia 27 (1990) Table 1: Al freezing point 660.323 °C; ×9/5+32 = 1220.5814 °F.
    expect(fromSi("temperature", 660.323, US)).toBeCloseTo(1220.5814, 9);
    expect(toSi("temperature", 1220.5814, US)).toBeCloseTo(660.323, 9);
  });

  it("agrees with convert-units on temperatures across the foundry's range", () => {
    // convert-units 2.3.4 (a general reference library) anchors °F on the same exact definition.
    for (const c of [-40, 0, 20, 660.323, 1084.62, 1538]) {
      expect(fromSi("temperature", c, US)).toBeCloseTo(convert(c).from("C").to("F"), 9);
    }
  });

  it("converts a temperature difference without the 32° offset", () => {
    // A kelvin (or °C step) is 9/5 of a °F step: same definition, no offset for differences.
    expect(fromSi("temperature-difference", 100, US)).toBe(180);
    expect(toSi("temperature-difference", 9, US)).toBe(5);
  });
});

describe("form text", () => {
  it("leaves SI values alone for a person who works in SI", () => {
    expect(toSi("temperature", 725, SI)).toBe(725);
    expect(toField("length", 4.25, SI)).toBe("4.3");
  });

  it("shows values rounded for the unit and reads them back", () => {
    expect(toField("temperature", 725, US)).toBe("1337");
    expect(toField("length", 5, US)).toBe("0.197");
    expect(fromField("length", "0,25", US)).toBeCloseTo(6.35, 10);
    expect(formatValue("temperature", 725, US)).toBe("1337 °F");
    expect(formatValue("length", null, US)).toBe("–");
  });

  it("reads empty text as not logged and nonsense as not a number", () => {
    expect(fromField("temperature", "  ", US)).toBeUndefined();
    expect(fromField("temperature", "hot", US)).toBeNaN();
  });
});

describe("velocity and area follow the length choice", () => {
  it("converts m/s to in/s and mm² to in² from the exact inch", () => {
    // 1 in = 25.4 mm exactly (1959 agreement): 1 m/s = 1000/25.4 in/s = 39.370... in/s; 1 in² = 645.16 mm².
    expect(fromSi("velocity", 1, US)).toBeCloseTo(39.37007874, 7);
    expect(toSi("area", 1, US)).toBeCloseTo(645.16, 10);
    // convert-units 2.3.4 (its foot is 1/3.28084 m): 1 m/s in ft/s × 12, and mm² to in².
    expect(fromSi("velocity", 0.5, US) / (convert(0.5).from("m/s").to("ft/s") * 12)).toBeCloseTo(1, 5);
    expect(fromSi("area", 300, US) / convert(300).from("mm2").to("in2")).toBeCloseTo(1, 5);
  });
});

describe("sizes rounded as a caster writes them", () => {
  it("gives 0.12 in, not 0.118; 5.9 in, not 5.906; whole °F; lb to 0.1", () => {
    // 3 mm / 25.4 = 0.1181 in; 150 mm / 25.4 = 5.9055 in (1 in = 25.4 mm exactly).
    expect(formatValue("length", 3, US)).toBe("0.12 in");
    expect(formatValue("length", 150, US)).toBe("5.9 in");
    expect(formatValue("length", 25.4 * 120, US)).toBe("120 in");
    // 740.3 °C × 9/5 + 32 = 1364.54 °F.
    expect(formatValue("temperature", 740.3, US)).toBe("1365 °F");
    // 2.5 kg / 0.45359237 = 5.5116 lb.
    expect(formatValue("mass", 2.5, US)).toBe("5.5 lb");
    // 20.8 kg/m³ / 16.0185 = 1.2985 lb/ft³.
    expect(formatValue("density", 20.8, US)).toBe("1.3 lb/ft³");
    expect(formatValue("length", 4.25, SI)).toBe("4.3 mm");
  });

  it("keeps form text fine enough that saving it again does not move the value", () => {
    expect(toField("length", 3, US)).toBe("0.118");
    expect(fromField("length", toField("length", 3, US), US)! - 3).toBeLessThan(0.02);
  });
});

describe("inches as casters write them", () => {
  const inches = (t: string) => fromField("length", t, US)! / 25.4;
  it("reads fractions, mixed numbers and the inch mark", () => {
    expect(inches("1/8")).toBeCloseTo(0.125, 10);
    expect(inches('3/4"')).toBeCloseTo(0.75, 10);
    expect(inches("1 1/2")).toBeCloseTo(1.5, 10);
    expect(inches("1-1/2")).toBeCloseTo(1.5, 10);
    expect(inches('1-1/2"')).toBeCloseTo(1.5, 10);
    expect(inches("2 in")).toBeCloseTo(2, 10);
    expect(inches(".5″")).toBeCloseTo(0.5, 10);
    expect(inches("0,25")).toBeCloseTo(0.25, 10);
  });

  it("refuses what is not a size", () => {
    for (const t of ["1/0", "1 3/2", "3/4/5", "1 1", "half", "1..5", "-1/2", '""', "1/2 mm"])
      expect(fromField("length", t, US), t).toBeNaN();
  });

  it("leaves fractions to inches: in mm a fraction is not a number", () => {
    expect(fromField("length", "1/8", SI)).toBeNaN();
  });

  it("reads grouped thousands as casters type a °F pour temperature", () => {
    // 1,350 °F = (1350 - 32) × 5/9 = 732.2 °C.
    expect(fromField("temperature", "1,350", US)).toBeCloseTo(732.22, 2);
    expect(fromField("temperature", "-4", US)).toBeCloseTo(-20, 10);
  });
});

describe("calculator volumes and areas for a person who works in inches", () => {
  // 1 in = 2.54 cm exactly (1959), so 1 in³ = 16.387064 cm³ and 1 in² = 6.4516 cm²; convert-units
  // checks them to within its rounded definitions (about 5e-6 relative for volume).
  it("types and reads in³ and in², and keeps cm³ and cm² for a metric person", () => {
    expect(calcFromField("volume-cm3", "1", US)! / convert(1).from("in3").to("cm3")).toBeCloseTo(1, 4);
    expect(calcFromField("area-cm2", "1", US)! / convert(1).from("in2").to("cm2")).toBeCloseTo(1, 4);
    expect(calcToField("volume-cm3", 16.387064, US)).toBe("1");
    expect(calcUnit("area-cm2", US)).toBe("in²");
    expect(calcUnit("area-cm2", SI_UNITS)).toBe("cm²");
    // The Groover sprue's 396 cm³/s is 24.2 in³/s (396 / 16.387064).
    expect(calcFormat("flow-cm3-per-s", 396, US)).toBe("24.2 in³/s");
    expect(calcFormat("flow-cm3-per-s", 396, SI_UNITS)).toBe("396 cm³/s");
  });
});
