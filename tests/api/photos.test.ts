import http from "node:http";
import type { AddressInfo } from "node:net";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { photos } from "../../db/schema";
import { storePhoto } from "../../server/photos/service";
import { app, migrateOnce, ORIGIN, shopWithCrew, signUp, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";
import { removeObject, storedKeys } from "./object-store";

beforeAll(migrateOnce);

const objectsInStore = storedKeys;
const photoRows = (castingId: number) => db.select().from(photos).where(eq(photos.castingId, castingId));

/** A 600 × 400 JPEG whose EXIF says "rotate 90°" and carries a GPS position, as a phone writes it. */
async function phoneJpeg() {
  return sharp({ create: { width: 600, height: 400, channels: 3, background: "#8a8d91" } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExifMerge({ IFD0: { Make: "TestPhone" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1" } })
    .toBuffer();
}

/** EXIF points to its GPS block with TIFF tag 34853 (0x8825), in either byte order. */
const hasGpsBlock = (exif: Buffer | undefined) =>
  !!exif && (exif.includes(Buffer.from([0x88, 0x25])) || exif.includes(Buffer.from([0x25, 0x88])));

async function castingOf(p: Person) {
  return newCasting(p, (await newMelt(p)).id);
}

describe("photo uploads", () => {
  it("strips location and other metadata, turns the photo upright, and makes a thumbnail", async () => {
    const { caster, mentor } = await shopWithCrew("Photo Shop");
    const casting = await castingOf(caster);
    const original = await phoneJpeg();
    const before = await sharp(original).metadata();
    expect(before.orientation).toBe(6);
    expect(hasGpsBlock(before.exif)).toBe(true);
    const res = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", original, "IMG_0042.jpg");
    expect(res.status).toBe(201);
    // EXIF orientation 6 means the camera was turned: stored upright, 400 wide and 600 high.
    expect(res.body).toMatchObject({
      castingId: casting.id,
      width: 400,
      height: 600,
      imageUrl: `/api/photos/${res.body.id}/image`,
    });
    const image = await mentor.agent.get(res.body.imageUrl).buffer(true);
    expect(image.status).toBe(200);
    expect(image.headers["content-type"]).toBe("image/jpeg");
    expect(image.headers["cache-control"]).toMatch(/private/);
    const meta = await sharp(image.body).metadata();
    expect(meta.exif).toBeUndefined();
    expect(hasGpsBlock(meta.exif)).toBe(false);
    expect(meta.orientation).toBeUndefined();
    expect([meta.width, meta.height]).toEqual([400, 600]);
    expect(image.body.includes(Buffer.from("TestPhone"))).toBe(false);
    const thumb = await caster.agent.get(res.body.thumbUrl).buffer(true);
    const thumbMeta = await sharp(thumb.body).metadata();
    expect(Math.max(thumbMeta.width!, thumbMeta.height!)).toBe(320);
    expect(thumbMeta.exif).toBeUndefined();
    // Stored under a random name, never the uploaded one.
    expect((await objectsInStore()).some((f) => f.includes("IMG_0042"))).toBe(false);
  });

  it("accepts PNG and WebP by their content and re-encodes them as JPEG", async () => {
    const { caster } = await shopWithCrew("Png Shop");
    const casting = await castingOf(caster);
    const png = await sharp({ create: { width: 50, height: 40, channels: 4, background: "#c33" } })
      .png()
      .toBuffer();
    const webp = await sharp({ create: { width: 50, height: 40, channels: 3, background: "#3c3" } })
      .webp()
      .toBuffer();
    for (const [buf, name] of [
      [png, "scan.dat"],
      [webp, "shot.webp"],
    ] as const) {
      const res = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", buf, name);
      expect(res.status).toBe(201);
      const img = await caster.agent.get(res.body.imageUrl).buffer(true);
      expect((await sharp(img.body).metadata()).format).toBe("jpeg");
    }
    const list = await caster.agent.get("/api/castings?pageSize=5");
    expect(list.body.items[0]).toMatchObject({ photoCount: 2, thumbUrl: expect.stringMatching(/\/thumb$/) });
  });

  it("refuses a decompression bomb by its header (413) before decoding it, and stores nothing", async () => {
    const { caster } = await shopWithCrew("Bomb Photo Shop");
    const casting = await castingOf(caster);
    const before = await objectsInStore();
    // 16,000 × 16,000 of one grey compresses to well under a megabyte but would decode to about 1 GB.
    const bomb = await sharp({
      create: { width: 16000, height: 16000, channels: 3, background: { r: 128, g: 128, b: 128 } },
      limitInputPixels: false,
    })
      .png({ compressionLevel: 9 })
      .toBuffer();
    expect(bomb.length).toBeLessThan(2 * 1024 * 1024);
    const res = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", bomb, "bomb.png");
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/256 megapixels; the most is 40/);
    expect(await photoRows(casting.id)).toEqual([]);
    expect(await objectsInStore()).toEqual(before);
  }, 60_000);

  it("refuses a text file named .jpg (415) and stores no row and no file", async () => {
    const { caster } = await shopWithCrew("Text Photo Shop");
    const casting = await castingOf(caster);
    const before = await objectsInStore();
    const res = await caster.agent
      .post(`/api/photos/castings/${casting.id}`)
      .attach("photo", Buffer.from("pour log: 14 Jan, 700 C, misrun\n".repeat(50)), {
        filename: "casting.jpg",
        contentType: "image/jpeg",
      });
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/JPEG/);
    // A damaged JPEG (right magic bytes, nothing after) is refused the same way.
    const broken = await caster.agent
      .post(`/api/photos/castings/${casting.id}`)
      .attach("photo", Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0]), "broken.jpg");
    expect(broken.status).toBe(415);
    // HEIC is accepted by content, but sharp's prebuilt libvips has no HEVC decoder: 415 saying so.
    const box = (type: string, body: Buffer) =>
      Buffer.concat([Buffer.from([0, 0, 0, 8 + body.length]), Buffer.from(type, "latin1"), body]);
    const heic = Buffer.concat([
      box("ftyp", Buffer.from("heic\0\0\0\0mif1heic", "latin1")),
      box("meta", Buffer.alloc(64)),
      Buffer.alloc(256, 1),
    ]);
    const heicRes = await caster.agent
      .post(`/api/photos/castings/${casting.id}`)
      .attach("photo", heic, "IMG_0001.HEIC");
    expect(heicRes.status).toBe(415);
    expect(heicRes.body.error.message).toMatch(/HEIC/);
    const none = await caster.agent.post(`/api/photos/castings/${casting.id}`).field("note", "no file");
    expect(none.status).toBe(400);
    expect(none.body.error.fields.photo).toBeDefined();
    expect(await photoRows(casting.id)).toHaveLength(0);
    expect(await objectsInStore()).toEqual(before);
  });

  it("refuses a photo over 15 MB with 413 and stores nothing", async () => {
    const { caster } = await shopWithCrew("Big Photo Shop");
    const casting = await castingOf(caster);
    const before = await objectsInStore();
    const big = Buffer.concat([await phoneJpeg(), Buffer.alloc(15 * 1024 * 1024 + 10)]);
    const res = await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", big, "huge.jpg");
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/15 MB/);
    expect(await photoRows(casting.id)).toHaveLength(0);
    expect(await objectsInStore()).toEqual(before);
  });

  it("leaves nothing behind when the upload is cut off midway", async () => {
    const { caster } = await shopWithCrew("Aborted Photo Shop");
    const casting = await castingOf(caster);
    const signIn = await request(app)
      .post("/api/auth/sign-in/email")
      .set("Origin", ORIGIN)
      .send({ email: caster.email, password: caster.password });
    const cookie = (signIn.headers["set-cookie"] as unknown as string[]).map((c) => c.split(";")[0]).join("; ");
    const before = await objectsInStore();
    const server = http.createServer(app).listen(0, "127.0.0.1");
    await new Promise((r) => server.once("listening", r));
    const { port } = server.address() as AddressInfo;
    const boundary = "----casebook-abort";
    const head = `--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`;
    const closed = new Promise<void>((resolve) => {
      const req = http.request({
        host: "127.0.0.1",
        port,
        method: "POST",
        path: `/api/photos/castings/${casting.id}`,
        headers: { cookie, "content-type": `multipart/form-data; boundary=${boundary}`, "content-length": 5_000_000 },
      });
      req.on("error", () => resolve());
      req.on("close", () => resolve());
      req.write(head);
      req.write(Buffer.alloc(64 * 1024, 0xab));
      setTimeout(() => req.destroy(), 300);
    });
    await closed;
    await new Promise((r) => setTimeout(r, 500)); // let the server notice and clean up
    await new Promise((r) => server.close(r));
    expect(await photoRows(casting.id)).toHaveLength(0);
    expect(await objectsInStore()).toEqual(before);
  });

  it("keeps nothing when the client goes away while the photo is being stored", async () => {
    const { shopId, caster } = await shopWithCrew("Gone Photo Shop");
    const casting = await castingOf(caster);
    const before = await objectsInStore();
    const member = { shopId, userId: caster.userId, userName: "Gone caster", role: "caster" as const };
    await expect(storePhoto(member, casting.id, await phoneJpeg(), () => true)).rejects.toThrow(/cut off/);
    expect(await photoRows(casting.id)).toHaveLength(0);
    expect(await objectsInStore()).toEqual(before);
  });
});

describe("photos belong to their shop", () => {
  it("serves, pins and deletes only within the shop; marks outlive their photo", async () => {
    const a = await shopWithCrew("Pin Shop A");
    const b = await shopWithCrew("Pin Shop B");
    const casting = await castingOf(a.caster);
    const other = await castingOf(a.caster);
    const photo = (
      await a.caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await phoneJpeg(), "p.jpg")
    ).body;
    const pin = await a.caster.agent
      .post(`/api/marks/castings/${casting.id}`)
      .send({ type: "misrun", location: "corner", severity: 3, photoId: photo.id, x: 0.8, y: 0.1 });
    expect(pin.status).toBe(201);
    await a.caster.agent
      .post(`/api/marks/castings/${casting.id}`)
      .send({ type: "cold-shut", location: "side", severity: 1, photoId: photo.id, x: 0.2, y: 0.5 });
    const moved = await a.caster.agent.patch(`/api/marks/${pin.body.id}`).send({ x: 0.75, y: 0.15 });
    expect(moved.body).toMatchObject({ x: 0.75, y: 0.15, photoId: photo.id });
    const wrongPhoto = await a.caster.agent
      .post(`/api/marks/castings/${other.id}`)
      .send({ type: "misrun", location: "top", severity: 2, photoId: photo.id, x: 0.5, y: 0.5 });
    expect(wrongPhoto.status).toBe(400);
    const outside = await a.caster.agent.patch(`/api/marks/${pin.body.id}`).send({ x: 1.4 });
    expect(outside.body.error.fields.x).toBeDefined();

    expect((await b.owner.agent.get(photo.imageUrl)).status).toBe(404);
    expect((await b.owner.agent.get(photo.thumbUrl)).status).toBe(404);
    expect((await request(app).get(photo.imageUrl)).status).toBe(401);
    expect(
      (await b.caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await phoneJpeg(), "x.jpg"))
        .status,
    ).toBe(404);
    expect((await b.owner.agent.delete(`/api/photos/${photo.id}`)).status).toBe(404);
    const loner = await signUp("photo-loner");
    expect(
      (await loner.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await phoneJpeg(), "x.jpg")).status,
    ).toBe(403);

    const [row] = await photoRows(casting.id);
    expect(await objectsInStore()).toEqual(expect.arrayContaining([row.fileName, row.thumbName]));
    expect((await a.caster.agent.delete(`/api/photos/${photo.id}`)).status).toBe(204);
    expect(await objectsInStore()).not.toContain(row.fileName);
    expect(await objectsInStore()).not.toContain(row.thumbName);
    const detail = await a.caster.agent.get(`/api/castings/${casting.id}`);
    expect(detail.body.photos).toHaveLength(0);
    expect(detail.body.marks.map((m: { photoId: number | null; x: number | null }) => [m.photoId, m.x])).toEqual([
      [null, null],
      [null, null],
    ]);
    expect((await a.caster.agent.get(photo.imageUrl)).status).toBe(404);
  });
});

describe("photos in the object store", () => {
  it("serves one byte range (206), ignores a malformed one, and refuses one past the end (416)", async () => {
    const { caster } = await shopWithCrew("Range Shop");
    const casting = await castingOf(caster);
    const photo = (
      await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await phoneJpeg(), "r.jpg")
    ).body;
    const whole = await caster.agent.get(photo.imageUrl).buffer(true);
    expect(whole.status).toBe(200);
    expect(whole.headers["accept-ranges"]).toBe("bytes");
    expect(Number(whole.headers["content-length"])).toBe(whole.body.length);
    const total = whole.body.length;

    const part = await caster.agent.get(photo.imageUrl).set("Range", "bytes=0-99").buffer(true);
    expect(part.status).toBe(206);
    expect(part.headers["content-range"]).toBe(`bytes 0-99/${total}`);
    expect(Buffer.compare(part.body, whole.body.subarray(0, 100))).toBe(0);
    const rest = await caster.agent
      .get(photo.imageUrl)
      .set("Range", `bytes=${total - 10}-`)
      .buffer(true);
    expect(rest.status).toBe(206);
    expect(Buffer.compare(rest.body, whole.body.subarray(total - 10))).toBe(0);

    // Several ranges, a suffix, another unit, junk, an end before the start: the whole photo (RFC 9110 allows it).
    for (const range of ["bytes=0-1,5-9", "bytes=-10", "lines=1-2", "bytes=abc", "bytes=50-10", "bytes=-0"]) {
      const res = await caster.agent.get(photo.imageUrl).set("Range", range).buffer(true);
      expect(res.status, range).toBe(200);
      expect(res.body.length, range).toBe(total);
    }
    const beyond = await caster.agent.get(photo.imageUrl).set("Range", `bytes=${total + 10}-`);
    expect(beyond.status).toBe(416);
    expect(beyond.body.error.message).toMatch(/beyond the end/);
  });

  it("answers 404 with a plain message when the row's object is missing from the store", async () => {
    const { caster } = await shopWithCrew("Missing Object Shop");
    const casting = await castingOf(caster);
    const photo = (
      await caster.agent.post(`/api/photos/castings/${casting.id}`).attach("photo", await phoneJpeg(), "m.jpg")
    ).body;
    const [row] = await photoRows(casting.id);
    await removeObject(row.fileName);
    const res = await caster.agent.get(photo.imageUrl);
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/missing from the photo store/);
    expect((await caster.agent.get(photo.thumbUrl)).status).toBe(200);
  });

  it("removes both objects when the row cannot be written", async () => {
    const { shopId, caster } = await shopWithCrew("No Row Shop");
    const before = await objectsInStore();
    const member = { shopId, userId: caster.userId, userName: "No-row caster", role: "caster" as const };
    // No such casting: the objects are already in the store when the transaction refuses the row.
    await expect(storePhoto(member, 2_000_000_000, await phoneJpeg())).rejects.toMatchObject({ status: 404 });
    expect(await objectsInStore()).toEqual(before);
  });
});
