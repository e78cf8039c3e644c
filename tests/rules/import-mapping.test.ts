import { describe, expect, it } from "vitest";
import { guessMapping } from "../../lib/import-fields";

describe("an old pour log's headings are matched to fields", () => {
  it("reads the sand's water under either name, and a unit written after the heading", () => {
    const mapping = guessMapping(["Part", "Mould moisture %", "Pour temp (F)"]);
    expect(mapping.find((m) => m.column === 1)?.field).toBe("sandMoisturePct");
    expect(mapping.find((m) => m.column === 2)).toEqual({ column: 2, field: "pourTemp", unit: "F" });
    expect(guessMapping(["Sand moisture %"])[0]?.field).toBe("sandMoisturePct");
  });
});

describe("weights in an old pour log", () => {
  it("tells the charge weight from the charge, and reads each weight's unit", () => {
    const mapping = guessMapping(["Charge", "Charge weight (lb)", "Casting weight (kg)", "Poured weight lb"]);
    expect(mapping).toEqual([
      { column: 0, field: "charge" },
      { column: 1, field: "chargeWeight", unit: "lb" },
      { column: 2, field: "castingWeight", unit: "kg" },
      { column: 3, field: "pouredWeight", unit: "lb" },
    ]);
  });
});
