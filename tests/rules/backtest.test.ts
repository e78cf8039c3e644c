import { describe, expect, it } from "vitest";
import { backtest, firedRules, withRule } from "../../rules/backtest";
import { caseSchema } from "../../rules/case";
import type { KbRule } from "../../rules/kb-schema";
import { alloy, base, casebook, draft } from "./casebook-fixture";

describe("trying a draft rule on past cases", () => {
  it("counts firings, agreement and top causes as worked out by hand", async () => {
    const r = await backtest({ cases: casebook, base, rule: draft });
    expect(r.cases).toBe(5);
    expect(r.fired).toBe(3); // cases 1, 3, 4
    expect(r.firedConfirmed).toBe(2); // cases 1 and 4
    expect(r.agreed).toBe(1); // case 1 was turbulence; case 4 was a cold pour
    expect(r.confirmedCases).toBe(3); // 1, 2, 4
    expect(r.topRightBefore).toBe(2); // cold pour on top: right for 2 and 4
    expect(r.topRightAfter).toBe(2); // turbulence on 1 and 4, cold pour on 2: right for 1 and 2
    expect(r.changed.map((c) => [c.castingId, c.before?.id ?? null, c.after?.id ?? null, c.verdict])).toEqual([
      [1, "cold-pour", "turbulent-fill", "now-right"],
      [3, null, "turbulent-fill", "unconfirmed"],
      [4, "cold-pour", "turbulent-fill", "now-wrong"],
    ]);
  });

  it("a weaker draft fires as often but changes no top cause where the cold pour also fired", async () => {
    const r = await backtest({ cases: casebook, base, rule: { ...draft, weight: 0.5 } }); // 0.475 < 0.57
    expect(r.fired).toBe(3);
    expect(r.changed.map((c) => c.castingId)).toEqual([3]);
    expect(r.topRightAfter).toBe(r.topRightBefore);
  });

  it("a rule that speaks against a cause agrees when the confirmed cause is another", async () => {
    const against: KbRule = { ...draft, cause: "cold-pour", effect: "weakens", weight: 0.9 };
    const r = await backtest({ cases: casebook, base, rule: against });
    expect(r.firedConfirmed).toBe(2);
    expect(r.agreed).toBe(1); // case 1 (turbulence) agrees; case 4 (cold pour) does not
    // Case 1: cold pour 0.57 × (1 − 0.9) = 0.057 stays on top (nothing else); case 4 alike: no change of top.
    expect(r.changed).toEqual([]);
  });

  it("replaces the rule's earlier version instead of counting it twice", async () => {
    const published = { ...draft, weight: 0.3 };
    const withOld = withRule(base, published);
    const r = await backtest({ cases: casebook, base: withOld, rule: draft });
    expect(withRule(withOld, draft).rules.filter((x) => x.id === draft.id)).toHaveLength(1);
    // Before: 0.3 × 0.95 = 0.285 < 0.57 keeps cold pour on top in 1 and 4; case 3 already had turbulence.
    expect(r.changed.map((c) => c.castingId)).toEqual([1, 4]);
  });

  it("fires only for marks in the places the rule names", async () => {
    const atGate: KbRule = { ...draft, explains: [{ type: "misrun", locations: ["far-from-gate"] }] };
    const rs = withRule(base, atGate);
    const c = (location: string) =>
      caseSchema.parse({
        alloy: "A356.0",
        process: "green-sand",
        sprueHeightMm: 300,
        defects: [{ type: "misrun", location }],
      });
    expect((await firedRules(c("far-from-gate"), alloy, rs)).has(atGate.id)).toBe(true);
    expect((await firedRules(c("near-gate"), alloy, rs)).has(atGate.id)).toBe(false);
    // A mark "throughout" the part fits a rule for any place, as diagnose() reads it.
    expect((await firedRules(c("throughout"), alloy, rs)).has(atGate.id)).toBe(true);
  });
});
