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
