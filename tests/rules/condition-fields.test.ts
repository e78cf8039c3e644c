import { describe, expect, it } from "vitest";
import { CASTING_CONDITIONS, MELT_CONDITIONS } from "../../lib/condition-fields";
import { conditionsFromDraft, conditionsToDraft, loggedConditions } from "../../lib/condition-drafts";
import { meltFields } from "../../lib/notebook-schemas";
import { caseSchema } from "../../rules/case";
import type { Units } from "../../lib/units";

const SI: Units = { temperature: "C", length: "mm", mass: "kg" };
const US: Units = { temperature: "F", length: "in", mass: "lb" };

describe("pour conditions in the forms", () => {
  it("every condition is an input of the diagnosis contract and a stored melt or casting field", () => {
    const contract = new Set([...Object.keys(caseSchema.shape), "coatingPermeability"]);
    for (const g of [...MELT_CONDITIONS, ...CASTING_CONDITIONS])
      for (const f of g.fields) expect(contract.has(f.key), f.key).toBe(true);
    for (const f of MELT_CONDITIONS.flatMap((g) => g.fields)) expect(Object.keys(meltFields.shape)).toContain(f.key);
  });

  it("a field that does not apply is cleared, not kept unseen: deoxidised is for copper, the density index for aluminium", () => {
    const draft = { deoxidised: false, densityIndexPct: "6", crucible: "clay-graphite" };
    const copper = conditionsFromDraft(MELT_CONDITIONS, draft, { process: "green-sand", metal: "copper" }, SI);
    expect(copper.values).toMatchObject({ deoxidised: false, densityIndexPct: null, crucible: "clay-graphite" });
    const aluminium = conditionsFromDraft(MELT_CONDITIONS, draft, { process: "green-sand", metal: "aluminium" }, SI);
    expect(aluminium.values).toMatchObject({ deoxidised: null, densityIndexPct: 6 });
  });

  it("a mould temperature typed in °F is stored in °C and read back in °F (°C = (°F − 32) × 5/9, exact by definition)", () => {
    const context = { process: "permanent-mould" as const, metal: "aluminium" as const };
    const sent = conditionsFromDraft(MELT_CONDITIONS, { mouldTempC: "662" }, context, US);
    expect(sent.values.mouldTempC).toBeCloseTo(350, 6);
    expect(conditionsToDraft(MELT_CONDITIONS, { mouldTempC: 350 }, US).mouldTempC).toBe("662");
    expect(conditionsFromDraft(MELT_CONDITIONS, { mouldTempC: "hot" }, context, US).errors.mouldTempC).toMatch(
      /number/,
    );
  });

  it("reads the logged ones back in words", () => {
    const rows = loggedConditions(
      CASTING_CONDITIONS,
      { gatingRatio: "1:2:4", hasFilter: true, chokeAreaMm2: 250, gating: null },
      SI,
    );
    expect(rows).toEqual([
      { label: "Sprue-base (choke) area", value: "250 mm²" },
      { label: "Gating ratio sprue : runner : ingate", value: "1:2:4" },
      { label: "Filter in the runner", value: "yes" },
    ]);
  });
});
