import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { env } from "../../server/env";
import { learningComputations, shopRevision } from "../../server/rulebook/context";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

/**
 * The shop's revision decides whether a kept rule set and calibration still hold. Writes made through
 * `other` (a connection of its own, as another app server's would be) must be seen here too.
 */
const other = new pg.Client({ connectionString: env.DATABASE_URL });
beforeAll(async () => {
  await migrateOnce();
  await other.connect();
});
afterAll(() => other.end());

const misrun = { marks: [{ type: "misrun", location: "far-from-gate", severity: 3 }] };
type Cause = { id: string; record: { confirmed: number; right: number } };
async function coldPourRecord(p: Person, castingId: number) {
  const res = await p.agent.post(`/api/diagnosis/castings/${castingId}`);
  expect(res.status, res.text).toBe(201);
  return (res.body.result.causes as Cause[]).find((c) => c.id === "cold-pour")!.record;
}

describe("the shop's revision", () => {
  it("keeps the learning while nothing changes and sees another server's confirmation at once", async () => {
    const { shopId, caster } = await shopWithCrew("Revision Shop");
    const melt = await newMelt(caster);
    const confirmedOne = await newCasting(caster, melt.id, misrun);
    const asked = await newCasting(caster, melt.id, misrun);
    expect(await coldPourRecord(caster, asked.id)).toEqual({ confirmed: 0, right: 0 });
    const computed = learningComputations();
    await coldPourRecord(caster, asked.id);
    await coldPourRecord(caster, asked.id);
    expect(learningComputations()).toBe(computed); // nothing written: nothing recomputed

    const before = await shopRevision(shopId);
    await other.query(
      "insert into confirmations (shop_id, casting_id, cause_id, created_by) values ($1, $2, 'cold-pour', $3)",
      [shopId, confirmedOne.id, caster.userId],
    );
    expect(await shopRevision(shopId)).toBe(before + 1);
    // 700 °C into lost foam is a cold pour ([mem] docs/foundry-facts.md): the confirmed case counts now.
    expect(await coldPourRecord(caster, asked.id)).toMatchObject({ confirmed: 1 });
    expect(learningComputations()).toBe(computed + 1);
  });

  it("is raised by each write a diagnosis reads, and not by writes it does not", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Revision Writes Shop");
    const melt = await newMelt(caster);
    const confirmed = await newCasting(caster, melt.id, misrun);
    const loose = await newCasting(caster, (await newMelt(caster)).id, misrun);
    const ok = (res: { status: number; text: string }) => expect(res.status, res.text).toBeLessThan(300);
    const raises = async (what: string, write: () => Promise<unknown>, by: 0 | 1 = 1) => {
      const before = await shopRevision(shopId);
      await write();
      const raised = (await shopRevision(shopId)) - before;
      // One per row written (the triggers are row-level), so "raised" is any rise.
      if (by) expect(raised, what).toBeGreaterThan(0);
      else expect(raised, what).toBe(0);
    };
    await raises("a confirmation", async () =>
      ok(await mentor.agent.post(`/api/review/castings/${confirmed.id}/confirmations`).send({ causeId: "cold-pour" })),
    );
    await raises("editing a confirmed casting", async () =>
      ok(await caster.agent.patch(`/api/castings/${confirmed.id}`).send({ pourTimeS: 9 })),
    );
    await raises("editing its melt", async () =>
      ok(await caster.agent.patch(`/api/melts/${melt.id}`).send({ pourTempC: 705 })),
    );
    await raises("a mark on a confirmed casting", async () =>
      ok(
        await caster.agent
          .post(`/api/marks/castings/${confirmed.id}`)
          .send({ type: "cold-shut", location: "side", severity: 1 }),
      ),
    );
    await raises("switching a built-in rule off", async () =>
      ok(await mentor.agent.put("/api/rulebook/rules/h2-no-degassing/switch").send({ off: true })),
    );
    await raises("an alloy's figures changing", () =>
      other.query(
        "update alloys set liquidus_c = liquidus_c + 1 where id = (select alloy_id from melts where id = $1)",
        [melt.id],
      ),
    );
    await raises(
      "an unconfirmed casting's edit",
      async () => ok(await caster.agent.patch(`/api/castings/${loose.id}`).send({ pourTimeS: 4 })),
      0,
    );
    await raises("a new unconfirmed casting", () => newCasting(caster, melt.id, misrun), 0);
    await raises(
      "the built-in alloys upserted with the same figures",
      () => other.query("update alloys set liquidus_c = liquidus_c where shop_id is null"),
      0,
    );
  });

  it("works the learning out once for requests that arrive together", async () => {
    const { shopId, caster } = await shopWithCrew("Revision Crowd Shop");
    const castings = await Promise.all(
      Array.from({ length: 3 }, async () => newCasting(caster, (await newMelt(caster)).id, misrun)),
    );
    await other.query(
      "insert into confirmations (shop_id, casting_id, cause_id, created_by) values ($1, $2, 'cold-pour', $3)",
      [shopId, castings[0].id, caster.userId],
    );
    const computed = learningComputations();
    const records = await Promise.all(Array.from({ length: 8 }, (_, i) => coldPourRecord(caster, castings[i % 3].id)));
    expect(records.every((r) => r.confirmed === 1)).toBe(true);
    expect(learningComputations()).toBe(computed + 1);
  });
});
