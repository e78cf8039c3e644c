import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { melts, ruleSwitches } from "../../db/schema";
import { db } from "../../server/db";
import { calibrationCasesRun, refreshCalibration } from "../../server/rulebook/calibration";
import { shopLearning, shopRules } from "../../server/rulebook/context";
import { confirm, expectSameAsRecomputed } from "./calibration-check";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";
import { misrunRule } from "../../scripts/fixtures/misrun-rule";

beforeAll(migrateOnce);

/**
 * The shop's own misrun rule (scripts/fixtures/misrun-rule.ts). The cold melt has 85 °C of superheat,
 * the hot one 165 °C (A356 liquidus 615 °C [mem], docs/foundry-facts.md); the castings' walls are 4 mm.
 */
/** Three confirmed misruns (two cold, one hot) and one confirmed gas porosity. */
async function shopWithCases(name: string) {
  const crew = await shopWithCrew(name);
  const cold = await newMelt(crew.caster);
  const hot = await newMelt(crew.caster, { pourTempC: 780, meltTempC: 800 });
  const misrun = [{ type: "misrun", location: "far-from-gate", severity: 3 }];
  const gas = [{ type: "gas-porosity", location: "throughout", severity: 2 }];
  const cases = [
    [cold.id, misrun, "cold-pour"],
    [cold.id, misrun, "cold-pour"],
    [hot.id, misrun, "turbulent-fill"],
    [hot.id, gas, "hydrogen-pickup"],
  ] as const;
  for (const [meltId, marks, causeId] of cases) {
    const c = await newCasting(crew.caster, meltId, { marks: [...marks] });
    await confirm(crew.mentor, c.id, { causeId });
  }
  return { ...crew, cold, hot };
}

/** The cases the engine ran on for the calibration while `act` ran. */
async function casesRunBy(act: () => Promise<unknown>) {
  const before = calibrationCasesRun();
  await act();
  return calibrationCasesRun() - before;
}
const ok = async (req: Promise<{ status: number; text: string }>, status = 200) => {
  const res = await req;
  expect(res.status, res.text).toBe(status);
};
const publish = (mentor: Person, id: string) => ok(mentor.agent.post(`/api/rulebook/rules/${id}/publish`));

describe("a rule change works out only what it changes", () => {
  it("a publish runs only the published rule, and only on cases with a mark it explains; so do edits", async () => {
    const { shopId, mentor } = await shopWithCases("Publish Shop");
    await expectSameAsRecomputed(shopId, "before any rule of the shop's own");
    const made = await mentor.agent.post("/api/rulebook/rules").send(misrunRule(100));
    expect(made.status, made.text).toBe(201);
    const id = made.body.id as string;
    // A saved draft is not in use: nothing to work out.
    expect(await casesRunBy(() => shopLearning(shopId))).toBe(0);

    // The three misruns, not the gas porosity (the rule cannot fire there), and no other rule.
    expect(await casesRunBy(() => publish(mentor, id))).toBe(3);
    let l = await expectSameAsRecomputed(shopId, "after publish");
    expect(l.ruleRecords.get(id)).toEqual({ fired: 2, agreed: 2 }); // the two cold ones

    await ok(mentor.agent.put(`/api/rulebook/rules/${id}`).send(misrunRule(200)));
    expect(await casesRunBy(() => shopLearning(shopId))).toBe(0); // a draft of the edit: still the old one
    expect(await casesRunBy(() => publish(mentor, id))).toBe(3);
    l = await expectSameAsRecomputed(shopId, "after the first edit");
    expect(l.ruleRecords.get(id)).toEqual({ fired: 3, agreed: 2 }); // the hot one too, confirmed otherwise

    await ok(mentor.agent.put(`/api/rulebook/rules/${id}`).send(misrunRule(50)));
    expect(await casesRunBy(() => publish(mentor, id))).toBe(3);
    l = await expectSameAsRecomputed(shopId, "after the second edit");
    expect(l.ruleRecords.has(id)).toBe(false); // fires on none of them now

    // Retiring it takes its key out: nothing needs running.
    expect(await casesRunBy(() => ok(mentor.agent.post(`/api/rulebook/rules/${id}/retire`)))).toBe(0);
    await expectSameAsRecomputed(shopId, "after retiring it");
  });

  it("switching a built-in rule off and on again re-tallies from the kept firings without running a case", async () => {
    const { shopId, owner } = await shopWithCases("Switch Shop");
    const before = await expectSameAsRecomputed(shopId, "before the switch");
    const [ruleId] = [...before.ruleRecords.keys()].filter((r) => !r.startsWith("shop-"));
    expect(ruleId).toBeDefined();
    const toggle = (off: boolean) => ok(owner.agent.put(`/api/rulebook/rules/${ruleId}/switch`).send({ off }));

    expect(await casesRunBy(() => toggle(true))).toBe(0);
    const off = await expectSameAsRecomputed(shopId, "switched off");
    expect(off.off.has(ruleId)).toBe(true);
    // Its own record is still kept (every rule fired, switched off or not).
    expect(off.ruleRecords.get(ruleId)).toEqual(before.ruleRecords.get(ruleId));
    expect(await casesRunBy(() => toggle(false))).toBe(0);
    const on = await expectSameAsRecomputed(shopId, "switched on again");
    expect(on.causeRecords).toEqual(before.causeRecords);
  });

  it("two rebuilds of one shop at once both finish, each row worked out once, and equal a full recomputation", async () => {
    const { shopId, mentor, cold, hot } = await shopWithCases("Race Shop");
    const [ruleId] = [...(await shopLearning(shopId)).ruleRecords.keys()];
    // Written outside the routes, so no request rebuilds first: a switch (every row) and a hotter melt
    // (its castings' rows changed, so the engine runs on them).
    await db.insert(ruleSwitches).values({ shopId, ruleId, off: true, createdBy: mentor.userId });
    await db.update(melts).set({ pourTempC: 760, meltTempC: 780 }).where(eq(melts.id, cold.id));
    const rules = await shopRules(shopId);
    // One row a transaction, so the two take turns batch by batch, while a write marks rows of both
    // melts changed in the other order than the rebuilds lock them.
    const [a, b] = await Promise.all([
      refreshCalibration(shopId, rules, { batchSize: 1 }),
      refreshCalibration(shopId, rules, { batchSize: 1 }),
      db.transaction(async (tx) => {
        await tx.update(melts).set({ notes: "Skimmed twice" }).where(eq(melts.id, hot.id));
        await tx.update(melts).set({ notes: "Pot cooled" }).where(eq(melts.id, cold.id));
      }),
    ]);
    // Each row at most once between them (rows the write was changing are left for the next refresh).
    expect(a.rows + b.rows).toBeLessThanOrEqual(4);
    expect(a.casesRun + b.casesRun).toBeLessThanOrEqual(4);
    await expectSameAsRecomputed(shopId, "after two rebuilds and a write at once");

    // The same again with nothing else writing: both finish, and between them every row is done once.
    await db.insert(ruleSwitches).values({ shopId, ruleId, off: false, createdBy: mentor.userId });
    const again = await shopRules(shopId);
    const [c, d] = await Promise.all([
      refreshCalibration(shopId, again, { batchSize: 1 }),
      refreshCalibration(shopId, again, { batchSize: 1 }),
    ]);
    expect(c.rows + d.rows).toBe(4);
    expect(c.casesRun + d.casesRun).toBe(0); // a switch: the kept firings say it all
    await expectSameAsRecomputed(shopId, "after two rebuilds at once");
  });
});
