import { expect } from "vitest";
import { causeRecordsOf, confirmedCasesOf, ruleRecordsOf, type Tally } from "../../rules/calibration";
import { calibrationTallies, recomputedTallies } from "../../server/rulebook/calibration";
import { shopLearning, shopRules } from "../../server/rulebook/context";
import type { Person } from "./helpers";

export const confirm = async (p: Person, castingId: number, body: object) => {
  const res = await p.agent.post(`/api/review/castings/${castingId}/confirmations`).send(body);
  expect(res.status, res.text).toBe(201);
};
const sorted = (ts: Tally[]) => [...ts].sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b)));

/** The kept learning against every confirmed case run again: tallies, rule records and cause records. */
export async function expectSameAsRecomputed(shopId: string, step: string) {
  const learning = await shopLearning(shopId);
  const rules = await shopRules(shopId);
  const reference = await recomputedTallies(shopId, rules);
  expect(sorted(await calibrationTallies(shopId, rules)), step).toEqual(sorted(reference));
  expect(learning.ruleRecords, step).toEqual(ruleRecordsOf(reference, rules.everyRule.rules));
  expect(learning.causeRecords, step).toEqual(causeRecordsOf(reference));
  expect(learning.confirmedCases, step).toBe(confirmedCasesOf(reference));
  return learning;
}
