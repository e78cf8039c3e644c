import { describe, expect, it } from "vitest";
import { ApiError } from "../../lib/api";
import { fieldErrors, messagesInUnits } from "../../lib/field-errors";
import { textToNumbers } from "../../lib/form-numbers";
import { alloyConflicts, castingInput, meltFields } from "../../lib/notebook-schemas";
import type { Units } from "../../lib/units";

const SI: Units = { temperature: "C", length: "mm", mass: "kg" };
const US: Units = { temperature: "F", length: "in", mass: "lb" };

describe("limits in a form's messages, in the person's units", () => {
  const melt = (v: Record<string, unknown>) => meltFields.partial().safeParse({ ...v }).error!;

  it("says the temperature scale's top in °F", () => {
    // 1,700 °C × 9/5 + 32 = 3,092 °F (the Fahrenheit scale's definition, NIST SP 811).
    expect(fieldErrors(melt({ pourTempC: 1800 }), { topLevel: true, units: US }).pourTempC).toBe("above 3,092 °F");
    expect(fieldErrors(melt({ pourTempC: 1800 }), { topLevel: true, units: SI }).pourTempC).toBe("above 1,700 °C");
    // No units given: SI, as the server words it.
    expect(fieldErrors(melt({ pourTempC: 1800 })).pourTempC).toBe("above 1,700 °C");
  });

  it("says the air's limits in °F: -40 is the same on both scales, 60 °C is 140 °F", () => {
    // -40 × 9/5 + 32 = -40; 60 × 9/5 + 32 = 140.
    expect(fieldErrors(melt({ ambientTempC: -50 }), { units: US }).ambientTempC).toBe("below -40 °F");
    expect(fieldErrors(melt({ ambientTempC: 70 }), { units: US }).ambientTempC).toBe("above 140 °F");
  });

  it("says a size limit in inches and a foam density in lb/ft³", () => {
    // 5000 mm / 25.4 = 196.85 in; 200 kg/m³ / 16.0185 = 12.49 lb/ft³ (1959 pound and foot).
    const casting = castingInput.safeParse({ partName: "Bracket", minSectionMm: 6000 }).error!;
    expect(fieldErrors(casting, { units: US }).minSectionMm).toBe("above 197 in");
    expect(fieldErrors(melt({ foamDensityKgM3: 250 }), { units: US }).foamDensityKgM3).toBe("above 12 lb/ft³");
  });

  it("says the alloy's solidus in °F", () => {
    // A356.0's solidus taken as 555 °C [mem] (ASM Vol. 2): 555 × 9/5 + 32 = 1,031 °F.
    const found = alloyConflicts({ pourTempC: 540 }, { designation: "A356.0", solidusC: 555 });
    expect(messagesInUnits(found, US).pourTempC).toBe(
      "at or below A356.0's solidus (1,031 °F): the metal would be solid",
    );
  });

  it("says a server's limits in the person's units", () => {
    const err = new ApiError(
      400,
      "Some values need fixing.",
      { pourTempC: "above 1,700 °C", notes: "too long" },
      {
        pourTempC: "above {1700 °C}",
      },
    );
    expect(err.fieldsIn(US)).toEqual({ pourTempC: "above 3,092 °F", notes: "too long" });
  });

  it("tells an inch person how to type a size it could not read", () => {
    const spec = { minSectionMm: "length", pourTempC: "temperature" } as const;
    const { values, errors } = textToNumbers(spec, { minSectionMm: "1 1/2", pourTempC: "1,350" }, US);
    expect(values.minSectionMm).toBeCloseTo(38.1, 10); // 1.5 in × 25.4
    expect(values.pourTempC).toBeCloseTo(732.22, 2); // (1350 - 32) × 5/9
    expect(errors).toEqual({});
    expect(textToNumbers(spec, { minSectionMm: "an eighth", pourTempC: "" }, US).errors.minSectionMm).toBe(
      'type inches as 1.5, 1 1/2, 1-1/2 or 3/4", or leave it empty',
    );
  });
});
