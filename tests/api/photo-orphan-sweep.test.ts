import { PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { env } from "../../server/env";
import { listen } from "../../server/index";
import { sweepOrphanPhotos } from "../../server/photos/orphan-sweep";
import { storedKeys } from "./object-store";

/**
 * Issue 9, item 11: objects left in the photo store by a server killed between putting an upload and
 * committing its row are removed by the sweep; an object a row names never is, nor a young one.
 * Everything is put and looked at through the store's own S3 API (this file's bucket).
 */
// The start-up sweep reads its grace from the environment, which is read on first use: the app the
// helpers build reads it, so they are loaded after this line.
process.env.ORPHAN_PHOTO_GRACE_MINUTES = "0";
const { migrateOnce, shopWithCrew } = await import("./helpers");
const { newCasting, newMelt } = await import("./notebook-fixtures");
beforeAll(migrateOnce);

const s3 = new S3Client({
  endpoint: env.S3_ENDPOINT,
  region: env.S3_REGION,
  forcePathStyle: true,
  credentials: { accessKeyId: env.S3_ACCESS_KEY_ID!, secretAccessKey: env.S3_SECRET_ACCESS_KEY! },
});
afterAll(() => s3.destroy());

/** What a killed upload leaves: an object under a fresh name, with no row. */
const putOrphan = (key: string) =>
  s3.send(
    new PutObjectCommand({
      Bucket: env.S3_BUCKET,
      Key: key,
      Body: Buffer.from("half an upload"),
      ContentType: "image/jpeg",
    }),
  );

const jpeg = () =>
  sharp({ create: { width: 320, height: 240, channels: 3, background: "#777" } })
    .jpeg()
    .toBuffer();

describe("the photo store sweep", () => {
  it("removes only objects no row names, page by page, and keeps every photo's image and thumbnail", async () => {
    const { caster } = await shopWithCrew("Sweep Shop");
    const casting = await newCasting(caster, (await newMelt(caster)).id);
    const kept: string[] = [];
    for (let i = 0; i < 2; i++) {
      const res = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await jpeg(), "p.jpg");
      expect(res.status).toBe(201);
    }
    kept.push(...(await storedKeys()));
    expect(kept).toHaveLength(4); // two photos, each with its thumbnail
    const orphans = [
      "0f1e2d3c-0000-4000-8000-000000000001.jpg",
      "0f1e2d3c-0000-4000-8000-000000000001.thumb.jpg",
      "zz-left-behind.jpg",
    ];
    for (const key of orphans) await putOrphan(key);

    const lines: string[] = [];
    // Grace 0: everything is old enough; pages of 2 keys make the sweep follow continuation tokens.
    const report = await sweepOrphanPhotos({ graceMs: 0, pageSize: 2, log: (l) => lines.push(l) });
    expect(report.removed.sort()).toEqual([...orphans].sort());
    expect(report.looked).toBe(7);
    expect(await storedKeys()).toEqual([...kept].sort());
    for (const key of orphans) expect(lines.some((l) => l.includes(key))).toBe(true);

    // Every photo still shows, image and thumbnail.
    const detail = (await caster.agent.get(`/api/castings/${casting.id}`)).body;
    for (const p of detail.photos) {
      expect((await caster.agent.get(p.imageUrl)).status).toBe(200);
      expect((await caster.agent.get(p.thumbUrl)).status).toBe(200);
    }
  });

  it("leaves an object younger than the grace period: an upload another server is saving now", async () => {
    const key = "11111111-2222-4333-8444-555555555555.jpg";
    await putOrphan(key);
    const report = await sweepOrphanPhotos({ graceMs: 60 * 60_000, log: () => {} });
    expect(report.removed).toEqual([]);
    expect(report.keptInGrace).toBeGreaterThanOrEqual(1);
    expect(await storedKeys()).toContain(key);
    // An hour later (as the store's clock sees it) the same object is an orphan.
    const later = await sweepOrphanPhotos({
      graceMs: 60 * 60_000,
      now: new Date(Date.now() + 61 * 60_000),
      log: () => {},
    });
    expect(later.removed).toContain(key);
    expect(await storedKeys()).not.toContain(key);
  });

  it("runs by itself when a server starts listening", async () => {
    const key = "22222222-3333-4444-8555-666666666666.thumb.jpg";
    await putOrphan(key);
    const before = await storedKeys();
    expect(before).toContain(key);
    const server = await listen({ port: 0, host: "127.0.0.1" });
    try {
      await expect.poll(storedKeys, { timeout: 10_000 }).not.toContain(key);
      expect(await storedKeys()).toEqual(before.filter((k) => k !== key));
    } finally {
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
    }
  });
});
