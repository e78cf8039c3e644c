import { describe, expect, it } from "vitest";
import { exampleReason } from "../../lib/fact-examples";
import { reasonInUnits } from "../../lib/reason-text";
import { SI_UNITS } from "../../lib/units";

describe("the rule form's preview of a reason", () => {
  it("fills every placeholder with an example, in the reader's units", () => {
    const text = "Poured at {pourTempC} °C into {process}, {alloyFamily}";
    expect(reasonInUnits(exampleReason(text, false), SI_UNITS)).toBe(
      "Poured at 720 °C into green sand, aluminium-silicon",
    );
    // 720 °C is 1328 °F (°F = °C × 9/5 + 32, the definition of the scale).
    const us = { ...SI_UNITS, temperature: "F" as const };
    expect(reasonInUnits(exampleReason("Poured at {pourTempC} °C", false), us)).toBe("Poured at 1328 °F");
  });

  it("marks a reason of a rule that speaks against the cause", () => {
    expect(reasonInUnits(exampleReason("Flux used: {fluxed}", true), SI_UNITS)).toBe("Against: Flux used: yes");
  });
});
