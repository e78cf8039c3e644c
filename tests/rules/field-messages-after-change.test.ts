import { describe, expect, it } from "vitest";
import { messagesAfterChange } from "@/lib/field-errors";

describe("a form's messages after a field changes", () => {
  const shown = { pourTempC: "above 1,400 °C", alloy: "choose an alloy", _: "type something first" };

  it("drops the changed field's message and the whole-form one, keeps the others", () => {
    expect(messagesAfterChange(shown, "pourTempC", "1500", "750")).toEqual({ alloy: "choose an alloy" });
  });

  it("keeps the same object when nothing it holds is about the change", () => {
    const only = { alloy: "choose an alloy" };
    expect(messagesAfterChange(only, "notes", "", "skimmed twice")).toBe(only);
  });

  it("drops each changed member of a group of fields, not the unchanged ones", () => {
    const errors = { fluxPct: "type a number, or leave it empty", ramHardness: "type a number, or leave it empty" };
    const before = { fluxPct: "x", ramHardness: "y" };
    const after = { fluxPct: "0.5", ramHardness: "y" };
    expect(messagesAfterChange(errors, "conditions", before, after)).toEqual({
      ramHardness: "type a number, or leave it empty",
    });
  });
});
