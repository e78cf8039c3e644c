import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { castings, melts } from "../../db/schema";
import { joinShop, migrateOnce, shopWithCrew, signUp } from "./helpers";
import { coldLostFoamMelt, newCasting, newMelt, shopCounts } from "./notebook-fixtures";

beforeAll(migrateOnce);

type Agent = Awaited<ReturnType<typeof shopWithCrew>>["caster"];
const listedMelts = async (p: Agent) =>
  ((await p.agent.get("/api/melts?pageSize=100")).body.items as { id: number }[]).map((m) => m.id);
const listedCastings = async (p: Agent) =>
  ((await p.agent.get("/api/castings?pageSize=100")).body.items as { id: number }[]).map((c) => c.id);

describe("archiving melts and castings", () => {
  it("lets the author archive a melt: gone from the lists, its page says archived, the author undoes it", async () => {
    const { caster } = await shopWithCrew("Archive Own Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id);
    const archived = await caster.agent.post(`/api/melts/${melt.id}/archive`);
    expect(archived.status).toBe(200);
    expect(archived.body).toMatchObject({ archivedBy: { id: caster.userId }, archivedAt: expect.any(String) });
    expect(await listedMelts(caster)).not.toContain(melt.id);
    expect((await caster.agent.get("/api/melts")).body.items).toEqual([]);
    // Its castings leave the shop-wide list with it, but its own page still shows them.
    expect(await listedCastings(caster)).not.toContain(casting.id);
    const page = await caster.agent.get(`/api/melts/${melt.id}`);
    expect(page.body).toMatchObject({ archivedAt: expect.any(String), castings: [{ id: casting.id }] });
    expect((await caster.agent.get(`/api/castings/${casting.id}`)).body.melt.archivedAt).toEqual(expect.any(String));
    // Archiving twice is a clear 409, not a second change.
    expect((await caster.agent.post(`/api/melts/${melt.id}/archive`)).status).toBe(409);
    // "Undo" right after: the one who archived it brings it back.
    const undone = await caster.agent.post(`/api/melts/${melt.id}/restore`);
    expect(undone.status).toBe(200);
    expect(undone.body).toMatchObject({ archivedAt: null, archivedBy: null });
    expect(await listedMelts(caster)).toContain(melt.id);
    expect(await listedCastings(caster)).toContain(casting.id);
    expect((await caster.agent.post(`/api/melts/${melt.id}/restore`)).status).toBe(409);
  });

  it("hides an archived casting from both lists and the melt's counts; its page says archived", async () => {
    const { caster, mentor } = await shopWithCrew("Archive Casting Shop");
    const melt = await newMelt(caster);
    const kept = await newCasting(caster, melt.id, { partName: "Kept plate", outcome: "good" });
    const gone = await newCasting(caster, melt.id, { partName: "Gone plate", outcome: "scrap" });
    // A mentor archives a caster's casting.
    const res = await mentor.agent.post(`/api/castings/${gone.id}/archive`);
    expect(res.status).toBe(200);
    expect(await listedCastings(caster)).toEqual([kept.id]);
    const meltPage = await caster.agent.get(`/api/melts/${melt.id}`);
    expect(meltPage.body.castings.map((c: { id: number }) => c.id)).toEqual([kept.id]);
    const row = (await caster.agent.get("/api/melts")).body.items[0];
    expect(row).toMatchObject({ castingCount: 1, scrapCount: 0 });
    const detail = await caster.agent.get(`/api/castings/${gone.id}`);
    expect(detail.body).toMatchObject({ archivedAt: expect.any(String), archivedBy: { id: mentor.userId } });
    expect(detail.body.archivedBy.name).toMatch(/mentor/);
  });

  it("refuses a caster who archives another caster's melt or casting, and changes nothing", async () => {
    const { shopId, caster } = await shopWithCrew("Archive Other Shop");
    const other = await signUp("Archive Other Shop-caster-2");
    await joinShop(other, shopId, "caster");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id);
    const a = await other.agent.post(`/api/melts/${melt.id}/archive`);
    expect(a.status).toBe(403);
    expect(a.body.error.message).toMatch(/Only the person who logged this melt, a mentor or an owner/);
    expect((await other.agent.post(`/api/castings/${casting.id}/archive`)).status).toBe(403);
    const [m] = await db.select().from(melts).where(eq(melts.id, melt.id));
    const [c] = await db.select().from(castings).where(eq(castings.id, casting.id));
    expect([m.archivedAt, c.archivedAt]).toEqual([null, null]);
  });

  it("lets only an owner restore, except the archiver's own undo right after", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Archive Restore Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id);
    // Archived by a mentor: the caster who logged it may not bring it back; the mentor may undo.
    await mentor.agent.post(`/api/melts/${melt.id}/archive`);
    const refused = await caster.agent.post(`/api/melts/${melt.id}/restore`);
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/Only a shop owner/);
    expect((await mentor.agent.post(`/api/melts/${melt.id}/restore`)).status).toBe(200);
    // The caster's own archive, long after: the undo has passed, so only an owner restores it.
    await caster.agent.post(`/api/castings/${casting.id}/archive`);
    await db
      .update(castings)
      .set({ archivedAt: new Date(Date.now() - 60 * 60_000) })
      .where(and(eq(castings.id, casting.id)));
    expect((await caster.agent.post(`/api/castings/${casting.id}/restore`)).status).toBe(403);
    expect((await mentor.agent.post(`/api/castings/${casting.id}/restore`)).status).toBe(403);
    const [still] = await db.select().from(castings).where(eq(castings.id, casting.id));
    expect(still.archivedAt).not.toBeNull();
    expect((await owner.agent.post(`/api/castings/${casting.id}/restore`)).status).toBe(200);
    expect(await listedCastings(caster)).toContain(casting.id);
  });

  it("answers 404 for another shop's melt or casting, and for ids that are not ids", async () => {
    const a = await shopWithCrew("Archive Shop A");
    const b = await shopWithCrew("Archive Shop B");
    const melt = await newMelt(a.caster);
    const casting = await newCasting(a.caster, melt.id);
    for (const path of [
      `/api/melts/${melt.id}/archive`,
      `/api/melts/${melt.id}/restore`,
      `/api/castings/${casting.id}/archive`,
      `/api/castings/${casting.id}/restore`,
      "/api/melts/0/archive",
      "/api/castings/abc/archive",
    ])
      expect((await b.owner.agent.post(path)).status, path).toBe(404);
    const [m] = await db.select().from(melts).where(eq(melts.id, melt.id));
    expect(m.archivedAt).toBeNull();
  });
});

describe("a save sent twice (idempotency key)", () => {
  it("makes one melt for one key and answers the repeat with the first melt", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Retry Melt Shop");
    const idempotencyKey = randomUUID();
    const first = await caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, idempotencyKey });
    const again = await caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, idempotencyKey, notes: "x" });
    expect(first.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(again.body).not.toHaveProperty("idempotencyKey");
    // Two at the same moment (two tabs sending one queued save) still make one.
    const raceKey = randomUUID();
    const [x, y] = await Promise.all(
      [caster, mentor].map((p) => p.agent.post("/api/melts").send({ ...coldLostFoamMelt, idempotencyKey: raceKey })),
    );
    expect([x.status, y.status]).toEqual([201, 201]);
    expect(y.body.id).toBe(x.body.id);
    expect((await shopCounts(shopId)).melts).toBe(2);
    // Without a key every save is its own melt.
    await caster.agent.post("/api/melts").send(coldLostFoamMelt);
    expect((await shopCounts(shopId)).melts).toBe(3);
  });

  it("keeps keys per shop and refuses a key that is not a UUID", async () => {
    const a = await shopWithCrew("Retry Shop A");
    const b = await shopWithCrew("Retry Shop B");
    const idempotencyKey = randomUUID();
    const ours = await a.caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, idempotencyKey });
    const theirs = await b.caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, idempotencyKey });
    expect(theirs.status).toBe(201);
    expect(theirs.body.id).not.toBe(ours.body.id);
    expect((await shopCounts(b.shopId)).melts).toBe(1);
    const bad = await a.caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, idempotencyKey: "again" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.idempotencyKey).toMatch(/UUID/);
  });

  it("makes one casting, with its marks once, for one key", async () => {
    const { shopId, caster } = await shopWithCrew("Retry Casting Shop");
    const melt = await newMelt(caster);
    const idempotencyKey = randomUUID();
    const marks = [{ type: "misrun", location: "edge", severity: 2 }];
    const one = await caster.agent.post(`/api/castings/melts/${melt.id}`).send({ ...thin(), idempotencyKey, marks });
    const two = await caster.agent.post(`/api/castings/melts/${melt.id}`).send({ ...thin(), idempotencyKey, marks });
    expect(one.status).toBe(201);
    expect(two.body.id).toBe(one.body.id);
    expect(await shopCounts(shopId)).toMatchObject({ castings: 1, marks: 1 });
  });
});

const thin = () => ({ partName: "Retry plate", minSectionMm: 4, outcome: "scrap" });

describe("archived cases and the casebook search", () => {
  it("an archived casting, or one of an archived melt, is not found; restored, it is found again", async () => {
    const { owner, caster } = await shopWithCrew("Archive Search Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id, { partName: "Quenchwheel sprocket" });
    const found = async () =>
      ((await caster.agent.get("/api/search").query({ q: "quenchwheel" })).body.items as { id: number }[]).map(
        (i) => i.id,
      );
    expect(await found()).toEqual([casting.id]);
    expect((await caster.agent.post(`/api/castings/${casting.id}/archive`)).status).toBe(200);
    expect(await found()).toEqual([]);
    expect((await owner.agent.post(`/api/castings/${casting.id}/restore`)).status).toBe(200);
    expect(await found()).toEqual([casting.id]);
    expect((await owner.agent.post(`/api/melts/${melt.id}/archive`)).status).toBe(200);
    expect(await found()).toEqual([]);
    expect((await owner.agent.post(`/api/melts/${melt.id}/restore`)).status).toBe(200);
    expect(await found()).toEqual([casting.id]);
  });
});
