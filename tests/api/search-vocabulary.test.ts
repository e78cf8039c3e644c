import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { env } from "../../server/env";
import { migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

/**
 * The shop's vocabulary version (search_vocabularies) says whether a server's similar words for a
 * query word still hold (server/search/similar-words.ts). Writes go through connections of their own,
 * as two app servers' would.
 */
const one = new pg.Client({ connectionString: env.DATABASE_URL });
const two = new pg.Client({ connectionString: env.DATABASE_URL });
beforeAll(async () => {
  await migrateOnce();
  await Promise.all([one.connect(), two.connect()]);
});
afterAll(() => Promise.all([one.end(), two.end()]));

const versionOf = async (shopId: string) =>
  Number(
    (await one.query("select version from search_vocabularies where shop_id = $1", [shopId])).rows[0]?.version ?? 0,
  );
const comment = (c: pg.Client, shopId: string, castingId: number, body: string, by: string) =>
  c.query("insert into comments (shop_id, casting_id, body, created_by) values ($1, $2, $3, $4)", [
    shopId,
    castingId,
    body,
    by,
  ]);

describe("the shop's vocabulary version", () => {
  it("rises when a write brings new words, at commit, and not for words the shop already has", async () => {
    const { shopId, caster } = await shopWithCrew("Vocabulary Shop");
    const casting = await newCasting(caster, (await newMelt(caster)).id);
    const start = await versionOf(shopId);
    expect(start).toBeGreaterThan(0); // the casting's own words

    await two.query("begin");
    await comment(two, shopId, casting.id, "Brimbleworth quondamite residue", caster.userId);
    expect(await versionOf(shopId)).toBe(start); // not before the commit
    await two.query("commit");
    const risen = await versionOf(shopId);
    expect(risen).toBeGreaterThan(start);

    await comment(two, shopId, casting.id, "brimbleworth quondamite", caster.userId);
    expect(await versionOf(shopId)).toBe(risen);
  });

  it("lets two writers commit whichever order they wrote new words and confirmations in", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Vocabulary Order Shop");
    const melt = await newMelt(caster);
    const [a, b, c, d, e] = [
      await newCasting(caster, melt.id),
      await newCasting(caster, melt.id),
      await newCasting(caster, melt.id),
      await newCasting(caster, melt.id),
      await newCasting(caster, melt.id),
    ];
    const confirm = (client: pg.Client, castingId: number) =>
      client.query(
        "insert into confirmations (shop_id, casting_id, cause_id, created_by) values ($1, $2, 'cold-pour', $3)",
        [shopId, castingId, mentor.userId],
      );
    // The cause's words are the shop's already, so the two confirmations below add no word that both
    // writers would insert (the second would wait for the first's transaction before any commit).
    await confirm(one, e.id);
    // One writes new words then a confirmation, the other the reverse. SET CONSTRAINTS ... IMMEDIATE
    // runs a writer's deferred bumps at a chosen moment, so the commits interleave as they could by
    // chance: each writer holding one of the shop's two rows (revision, vocabulary) and wanting the other.
    await Promise.all([one.query("begin"), two.query("begin")]);
    await comment(one, shopId, a.id, "Zorbelline flanges", caster.userId);
    await confirm(one, d.id);
    await confirm(two, b.id);
    await comment(two, shopId, c.id, "Quillomant risers", caster.userId);
    const before = await versionOf(shopId);
    await one.query("set constraints search_vocabulary_words immediate");
    // With the revision row always taken first this waits for the first writer's commit; without, it
    // takes the revision row and the two commits deadlock (PostgreSQL then fails one of them).
    const second = two.query("set constraints shop_revision_confirmations immediate");
    await new Promise((r) => setTimeout(r, 100));
    await Promise.all([one.query("commit"), second.then(() => two.query("commit"))]);
    expect(await versionOf(shopId)).toBeGreaterThan(before);
    const confirmed = await one.query("select count(*)::int as n from confirmations where shop_id = $1", [shopId]);
    expect(confirmed.rows[0].n).toBe(3);
  });
});
