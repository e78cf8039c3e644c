import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { photos } from "../../db/schema";
import { db } from "../../server/db";
import { env } from "../../server/env";
import { movePhotosToObjectStore } from "../../server/photos/move-to-store";
import { migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";
import { storedKeys } from "./object-store";

const root = fileURLToPath(new URL("../..", import.meta.url));
beforeAll(migrateOnce);
afterAll(() => rmSync(env.UPLOAD_DIR, { recursive: true, force: true }));

/** A photo as the old server kept it: a row, and its two files in UPLOAD_DIR under the row's names. */
async function photoOnDisk(shop: Awaited<ReturnType<typeof shopWithCrew>>, castingId: number, shade: string) {
  const name = `old-${shade.slice(1)}-${castingId}`;
  const image = await sharp({ create: { width: 64, height: 48, channels: 3, background: shade } })
    .jpeg()
    .toBuffer();
  const thumb = await sharp(image).resize(32).jpeg().toBuffer();
  mkdirSync(env.UPLOAD_DIR, { recursive: true });
  writeFileSync(join(env.UPLOAD_DIR, `${name}.jpg`), image);
  writeFileSync(join(env.UPLOAD_DIR, `${name}.thumb.jpg`), thumb);
  const [row] = await db
    .insert(photos)
    .values({
      shopId: shop.shopId,
      castingId,
      fileName: `${name}.jpg`,
      thumbName: `${name}.thumb.jpg`,
      width: 64,
      height: 48,
      bytes: image.length,
      uploadedType: "image/jpeg",
      createdBy: shop.caster.userId,
    })
    .returning();
  return { row, image };
}

describe("npm run photos:to-object-store", () => {
  it("moves the old disk photos into the store, prints what it moved, and is safe to run again", async () => {
    const shop = await shopWithCrew("Old Disk Shop");
    const casting = await newCasting(shop.caster, (await newMelt(shop.caster)).id);
    const first = await photoOnDisk(shop, casting.id, "#a05030");
    const second = await photoOnDisk(shop, casting.id, "#3050a0");
    // Not yet moved: the row is there, the store does not have it.
    expect((await shop.caster.agent.get(`/api/photos/${first.row.id}/image`)).status).toBe(404);

    const run = spawnSync(join(root, "node_modules", ".bin", "tsx"), ["scripts/photos-to-object-store.ts"], {
      cwd: root,
      env: process.env, // this file's database, uploads folder and bucket
      encoding: "utf8",
      timeout: 60_000,
    });
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toContain(`moved   photo ${first.row.id}: ${first.row.fileName}`);
    expect(run.stdout).toContain(`moved   photo ${second.row.id}: ${second.row.thumbName}`);
    expect(run.stdout).toMatch(/4 file\(s\) moved into the store, 0 already there, 0 missing/);

    expect(existsSync(join(env.UPLOAD_DIR, first.row.fileName))).toBe(false);
    expect(await storedKeys()).toEqual(
      expect.arrayContaining([first.row.fileName, first.row.thumbName, second.row.fileName, second.row.thumbName]),
    );
    const served = await shop.caster.agent.get(`/api/photos/${first.row.id}/image`).buffer(true);
    expect(served.status).toBe(200);
    expect(Buffer.compare(served.body, first.image)).toBe(0);

    // Again: nothing to move. A file left on disk after an interrupted run (already stored) is removed.
    writeFileSync(join(env.UPLOAD_DIR, second.row.fileName), readFileSync(join(root, "package.json")));
    const again = await movePhotosToObjectStore();
    expect(again.moved).toEqual([]);
    expect(again.missing).toEqual([]);
    expect(again.alreadyInStore).toHaveLength(4);
    expect(existsSync(join(env.UPLOAD_DIR, second.row.fileName))).toBe(false);
    const still = await shop.caster.agent.get(`/api/photos/${second.row.id}/image`).buffer(true);
    expect(Buffer.compare(still.body, second.image)).toBe(0); // the stored object, not the stray file

    // A row whose file is on neither side is reported, not invented.
    await db.update(photos).set({ fileName: "lost.jpg" }).where(eq(photos.id, first.row.id));
    expect((await movePhotosToObjectStore()).missing).toEqual(["lost.jpg"]);
  });
});
