import { describe, expect, it } from "vitest";
import { ALLOY_FAMILIES } from "../../rules/fact-catalog";
import { PROCESSES } from "../../rules/case";
import { valueWord } from "../../rules/value-words";
import { describeLeaf } from "../../rules/rule-words";
import { formatFact } from "../../lib/fact-display";
import { moistureLabel, PROCESS_LABELS } from "../../lib/labels";
import { meltConditionRows } from "../../lib/condition-rows";
import { SI_UNITS } from "../../lib/units";

describe("stored codes in words", () => {
  it("says alloy families in words, never as their codes", () => {
    expect(valueWord("al-si")).toBe("aluminium-silicon");
    expect(valueWord("al-si-cu")).toBe("aluminium-silicon-copper");
    expect(formatFact("alloyFamily", "al-mg", SI_UNITS)).toEqual({
      label: "alloy family",
      value: "aluminium-magnesium",
    });
    for (const f of ALLOY_FAMILIES) expect(valueWord(f)).not.toMatch(/^al /);
  });

  it("spells each process one way in labels, rule sentences and fact lists", () => {
    for (const p of PROCESSES) expect(valueWord(p)).toBe(PROCESS_LABELS[p]);
    expect(describeLeaf({ fact: "process", operator: "equal", value: "no-bake-sand" })).toBe("process is no-bake sand");
  });

  it("names the mould's water as the melt form does", () => {
    expect(moistureLabel("green-sand")).toBe("Sand moisture");
    expect(moistureLabel("investment")).toBe("Mould moisture");
    const rows = meltConditionRows({ process: "no-bake-sand", sandMoisturePct: 3 } as never, SI_UNITS);
    expect(rows.map((r) => r.label)).toContain("Sand moisture");
    expect(rows.map((r) => r.label)).not.toContain("Mould moisture");
  });
});
