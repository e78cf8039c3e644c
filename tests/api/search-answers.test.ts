import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { SearchAnswer } from "../../lib/search-schemas";
import { env } from "../../server/env";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

/**
 * A server keeps search answers under the shop's documents version and revision
 * (server/search/answers.ts). Writes here go through a connection of its own, as another app
 * server's would: the next identical search must show them.
 */
const other = new pg.Client({ connectionString: env.DATABASE_URL });
beforeAll(async () => {
  await migrateOnce();
  await other.connect();
});
afterAll(() => other.end());

async function search(p: Person, query: Record<string, string>) {
  const res = await p.agent.get("/api/search").query(query);
  expect(res.status, res.text).toBe(200);
  return res.body as SearchAnswer;
}
const ids = (a: SearchAnswer) => a.items.map((i) => i.id).sort((x, y) => x - y);

describe("kept search answers", () => {
  it("answer alike while nothing changes and show another server's write at once", async () => {
    const { shopId, caster } = await shopWithCrew("Kept Answers Shop");
    const melt = await newMelt(caster);
    const lid = await newCasting(caster, melt.id, { partName: "Zorbix lid", marks: [] });
    const plain = await newCasting(caster, melt.id, { partName: "Plain bracket", marks: [] });
    const first = await search(caster, { q: "zorbix" });
    expect(ids(first)).toEqual([lid.id]);
    expect(await search(caster, { q: "zorbix" })).toEqual(first);

    await other.query("insert into comments (shop_id, casting_id, body, created_by) values ($1, $2, $3, $4)", [
      shopId,
      plain.id,
      "Same zorbix pattern as the lid",
      caster.userId,
    ]);
    expect(ids(await search(caster, { q: "zorbix" }))).toEqual([lid.id, plain.id]);
    // A casting removed elsewhere leaves the kept answer too.
    await other.query("delete from castings where id = $1", [lid.id]);
    expect(ids(await search(caster, { q: "zorbix" }))).toEqual([plain.id]);
  });

  it("show a person's name as it is now", async () => {
    const { caster } = await shopWithCrew("Kept Names Shop");
    const casting = await newCasting(caster, (await newMelt(caster)).id, { partName: "Quorrel hinge", marks: [] });
    const before = await search(caster, { q: "quorrel" });
    expect(before.items.map((i) => i.id)).toEqual([casting.id]);
    await other.query(`update "user" set name = 'Renamed Caster' where id = $1`, [caster.userId]);
    const after = await search(caster, { q: "quorrel" });
    expect(after.items[0].createdBy).toEqual({ id: caster.userId, name: "Renamed Caster" });
  });

  it("are never another shop's, for the same words and filters", async () => {
    const one = await shopWithCrew("Kept Shop One");
    const two = await shopWithCrew("Kept Shop Two");
    const mine = await newCasting(one.caster, (await newMelt(one.caster)).id, { partName: "Vellix cap", marks: [] });
    const theirs = await newCasting(two.caster, (await newMelt(two.caster)).id, { partName: "Vellix cap", marks: [] });
    expect(ids(await search(one.caster, { q: "vellix" }))).toEqual([mine.id]);
    expect(ids(await search(two.caster, { q: "vellix" }))).toEqual([theirs.id]);
    expect(ids(await search(one.caster, { q: "vellix" }))).toEqual([mine.id]);
  });
});
