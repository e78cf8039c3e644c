import { describe, expect, it } from "vitest";
import { reasonInUnits } from "../../lib/reason-text";
import type { Units } from "../../lib/units";

const SI: Units = { temperature: "C", length: "mm", mass: "kg" };
const US: Units = { temperature: "F", length: "in", mass: "lb" };

describe("reasons in a person's units", () => {
  const reason = {
    template: "Poured at {pourTempC} °C, superheat {superheatC} °C, walls of {minSectionMm} mm, in {process}",
    against: false,
    values: { pourTempC: 700, superheatC: 85, minSectionMm: 25.4, process: "lost-foam" },
  };

  it("leaves SI reasons as the rule wrote them", () => {
    expect(reasonInUnits(reason, SI)).toBe("Poured at 700 °C, superheat 85 °C, walls of 25.4 mm, in lost foam");
  });

  it("converts temperatures with the offset, differences without it, and sizes to inches", () => {
    // °F = °C × 9/5 + 32 (the definition of the Fahrenheit scale): 700 °C = 1292 °F; a difference of
    // 85 K is 153 °F-degrees. 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
    expect(reasonInUnits(reason, US)).toBe("Poured at 1292 °F, superheat 153 °F, walls of 1 in, in lost foam");
  });

  it("marks evidence against a cause and says unknown for a missing value", () => {
    const against = { template: "Degassed for {degasMinutes} min", against: true, values: { degasMinutes: null } };
    expect(reasonInUnits(against, US)).toBe("Against: Degassed for unknown min");
  });
});
