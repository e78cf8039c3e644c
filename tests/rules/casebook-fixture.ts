import { findBuiltInAlloy } from "../../rules/alloys";
import type { StoredCase } from "../../rules/backtest";
import { caseSchema } from "../../rules/case";
import type { KbCause, KbRule, RuleSet } from "../../rules/kb-schema";
import { ruleSetVersion } from "../../rules/knowledge-base";

/**
 * A five-case casebook and two rules small enough to work out by hand. Scores are the noisy-OR of
 * rules/rank.ts with one rule per cause: weight × 0.95 (the severity factor for severity 2).
 * Cold pour: 0.6 × 0.95 = 0.57; the draft's turbulence: 0.8 × 0.95 = 0.76, so the draft wins where both fire.
 */
export const causes: KbCause[] = [
  { id: "cold-pour", title: "Metal poured too cold", fixes: ["Pour hotter"] },
  { id: "turbulent-fill", title: "Turbulent fill", fixes: ["Shorten the drop"] },
];
export const coldRule: KbRule = {
  id: "misrun-cold",
  explains: [{ type: "misrun" }],
  cause: "cold-pour",
  effect: "supports",
  weight: 0.6,
  conditions: { all: [{ fact: "pourTempC", operator: "lessThan", value: 680 }] },
  because: "Poured at {pourTempC} °C",
  sources: ["shop experience"],
};
export const draft: KbRule = {
  id: "shop-draft",
  explains: [{ type: "misrun" }],
  cause: "turbulent-fill",
  effect: "supports",
  weight: 0.8,
  conditions: { all: [{ fact: "sprueHeightMm", operator: "greaterThan", value: 250 }] },
  because: "A tall drop",
  sources: ["shop experience"],
};
export const base: RuleSet = { version: ruleSetVersion(causes, [coldRule]), causes, rules: [coldRule] };

export const alloy = findBuiltInAlloy("A356.0")!;
const stored = (castingId: number, c: Record<string, unknown>, confirmed?: string | null): StoredCase => ({
  castingId,
  meltId: castingId,
  partName: `part ${castingId}`,
  pouredOn: "2026-01-0" + castingId,
  case: caseSchema.parse({ alloy: "A356.0", process: "green-sand", ...c }),
  alloy,
  confirmed: confirmed === undefined ? null : { causeId: confirmed },
});
const misrun = [{ type: "misrun", location: "throughout", severity: 2 }];
export const casebook: StoredCase[] = [
  stored(1, { defects: misrun, pourTempC: 660, sprueHeightMm: 300 }, "turbulent-fill"), // both fire: top turns right
  stored(2, { defects: misrun, pourTempC: 660, sprueHeightMm: 100 }, "cold-pour"), // draft silent
  stored(3, { defects: misrun, pourTempC: 720, sprueHeightMm: 300 }), // only the draft fires; not confirmed
  stored(4, { defects: misrun, pourTempC: 650, sprueHeightMm: 280 }, "cold-pour"), // both fire: top turns wrong
  stored(5, { defects: [{ type: "gas-porosity" }], sprueHeightMm: 300 }), // the draft does not explain porosity
];
