import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { freePort } from "../../scripts/local-postgres";
import { startLocalObjectStore, type LocalObjectStore } from "../../server/photos/store-stand-in";

/**
 * The object store goes away under a running server and comes back. This file has a store of its own
 * on a fixed port (the other files' store is never stopped); the server reads S3_* on first use, so
 * pointing the environment at it before the app is loaded is enough.
 */
const parent = mkdtempSync(join(tmpdir(), "casebook-store-outage-"));
const bucket = "outage-photos";
const port = await freePort();
let store: LocalObjectStore | undefined;
const startStore = async () => (store = await startLocalObjectStore({ dir: parent, bucket, port }));
await startStore();
process.env.S3_ENDPOINT = store!.endpoint;
process.env.S3_BUCKET = bucket;

const h = await import("./helpers");
const { newCasting, newMelt } = await import("./notebook-fixtures");
const { storedKeys } = await import("./object-store");
const { db } = await import("../../server/db");
const { photos } = await import("../../db/schema");
const { eq } = await import("drizzle-orm");
const sharp = (await import("sharp")).default;

const logged = vi.spyOn(console, "error").mockImplementation(() => {});
beforeAll(h.migrateOnce);
afterAll(async () => {
  logged.mockRestore();
  await store?.close();
  rmSync(parent, { recursive: true, force: true });
});

const jpeg = () =>
  sharp({ create: { width: 80, height: 60, channels: 3, background: "#777" } })
    .jpeg()
    .toBuffer();

describe("when the photo store cannot be reached", () => {
  it("answers 503 with a plain message, writes no row and no object, and serves again when it returns", async () => {
    const { caster } = await h.shopWithCrew("Store Outage Shop");
    const casting = await newCasting(caster, (await newMelt(caster)).id);
    const kept = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await jpeg(), "a.jpg");
    expect(kept.status).toBe(201);
    const objectsBefore = await storedKeys();
    expect(objectsBefore).toHaveLength(2);

    await store!.close();
    store = undefined;
    const upload = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await jpeg(), "b.jpg");
    expect(upload.status).toBe(503);
    expect(upload.body.error.message).toMatch(/photo store is not answering.*nothing was saved/);
    const read = await caster.agent.get(kept.body.imageUrl);
    expect(read.status).toBe(503);
    expect(read.body.error.message).toMatch(/photo store is not answering/);
    // The rest of the casebook still works without the store.
    expect((await caster.agent.get(`/api/castings/${casting.id}`)).status).toBe(200);
    const rows = await db.select().from(photos).where(eq(photos.castingId, casting.id));
    expect(rows.map((r) => r.id)).toEqual([kept.body.id]);

    await startStore();
    expect(await storedKeys()).toEqual(objectsBefore);
    const again = await caster.agent.get(kept.body.imageUrl).buffer(true);
    expect(again.status).toBe(200);
    expect((await sharp(again.body).metadata()).format).toBe("jpeg");
  });
});
