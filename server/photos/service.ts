import { randomUUID } from "node:crypto";
import { and, asc, eq } from "drizzle-orm";
import { fileTypeFromBuffer } from "file-type";
import pLimit from "p-limit";
import sharp from "sharp";
import { db } from "../db";
import { defectMarks, photos, user } from "../../db/schema";
import type { Photo } from "../../lib/notebook-schemas";
import type { ShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";
import { HttpError, notFound } from "../http/errors";
import { iso, personRef } from "../notebook/shared";
import { deleteObjects, putObject } from "./object-store";
import { photoUrls } from "./urls";

export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;
/**
 * A picture decodes to about 4 bytes a pixel: 40 megapixels is about 160 MB, more than any phone camera
 * takes (common practice for upload limits). Larger ones are refused from their header, before decoding.
 */
export const MAX_PHOTO_PIXELS = 40_000_000;
/** Photos are decoded two at a time per server, so eight large uploads at once cannot take gigabytes. */
const decodeTwoAtATime = pLimit(2);
/** Judged by content (file-type), never by the name or the browser's claim. */
const ACCEPTED = new Set(["image/jpeg", "image/png", "image/webp", "image/heic", "image/heif"]);
const LONG_EDGE_PX = 4096; // plenty to see a pinhole; keeps a 48-megapixel phone shot from filling the disk
const THUMB_PX = 320;

type PhotoRow = typeof photos.$inferSelect;

export const toPhoto = (p: PhotoRow, byName: string): Photo => ({
  id: p.id,
  castingId: p.castingId,
  width: p.width,
  height: p.height,
  ...photoUrls(p.id),
  createdBy: personRef(p.createdBy, byName),
  createdAt: iso(p.createdAt),
});

export async function photosOf(castingId: number): Promise<Photo[]> {
  const rows = await db
    .select({ p: photos, byName: user.name })
    .from(photos)
    .innerJoin(user, eq(user.id, photos.createdBy))
    .where(eq(photos.castingId, castingId))
    .orderBy(asc(photos.id));
  return rows.map(({ p, byName }) => toPhoto(p, byName));
}

/**
 * Upright (EXIF orientation applied), re-encoded as JPEG. sharp writes no metadata unless asked,
 * so GPS position, camera serial and the rest stay behind.
 */
async function encode(input: Buffer) {
  const upright = sharp(input, { failOn: "error", limitInputPixels: MAX_PHOTO_PIXELS }).rotate();
  const image = await upright
    .clone()
    .resize({ width: LONG_EDGE_PX, height: LONG_EDGE_PX, fit: "inside", withoutEnlargement: true })
    .jpeg({ quality: 85, mozjpeg: true })
    .toBuffer({ resolveWithObject: true });
  const thumb = await upright
    .clone()
    .resize({ width: THUMB_PX, height: THUMB_PX, fit: "inside", withoutEnlargement: true })
    .jpeg({ quality: 75 })
    .toBuffer();
  return { image: image.data, width: image.info.width, height: image.info.height, thumb };
}

async function readableImage(buffer: Buffer) {
  const kind = await fileTypeFromBuffer(buffer);
  if (!kind || !ACCEPTED.has(kind.mime)) {
    throw new HttpError(415, "That file is not a JPEG, PNG, WebP or HEIC photo.", {
      photo: "choose a photo (JPEG, PNG, WebP or HEIC)",
    });
  }
  // The header says how big the decoded picture would be; a small file can hold a huge one.
  const { width = 0, height = 0 } = await sharp(buffer)
    .metadata()
    .catch(() => ({ width: 0, height: 0 }));
  if (width * height > MAX_PHOTO_PIXELS) {
    const message = `The photo is ${Math.round((width * height) / 1e6)} megapixels; the most is ${MAX_PHOTO_PIXELS / 1e6}. Make it smaller and try again.`;
    throw new HttpError(413, message, { photo: message });
  }
  try {
    return { mime: kind.mime, ...(await decodeTwoAtATime(() => encode(buffer))) };
  } catch {
    const heic = kind.mime === "image/heic" || kind.mime === "image/heif";
    const message = heic
      ? "This server cannot convert HEIC photos. Set the camera to 'Most Compatible' (JPEG) or export the photo as JPEG."
      : "The photo could not be read; it may be damaged.";
    throw new HttpError(415, message, { photo: message });
  }
}

/**
 * Both objects go to the store under fresh random keys before the row exists (nobody can reach them
 * yet); the row is then written in its transaction. A failure of either removes both objects and
 * leaves no row, so the store never holds a photo nobody can reach and no row points at nothing.
 */
export async function storePhoto(
  m: ShopMember,
  castingId: number,
  upload: Buffer,
  clientGone = () => false,
): Promise<Photo> {
  const img = await readableImage(upload);
  const base = randomUUID();
  const fileName = `${base}.jpg`;
  const thumbName = `${base}.thumb.jpg`;
  try {
    await Promise.all([putObject(fileName, img.image, "image/jpeg"), putObject(thumbName, img.thumb, "image/jpeg")]);
    const row = await db.transaction(async (tx) => {
      await castingInShop(m.shopId, castingId, tx);
      const [inserted] = await tx
        .insert(photos)
        .values({
          shopId: m.shopId,
          castingId,
          fileName,
          thumbName,
          width: img.width,
          height: img.height,
          bytes: img.image.length,
          uploadedType: img.mime,
          createdBy: m.userId,
        })
        .returning();
      // Cut off while we were encoding: nobody will see this answer, so keep nothing (the phone retries).
      if (clientGone()) throw new HttpError(400, "The upload was cut off.");
      return inserted;
    });
    return toPhoto(row, m.userName);
  } catch (err) {
    await deleteObjects([fileName, thumbName]);
    throw err;
  }
}

export async function photoInShop(shopId: string, id: number) {
  const [row] = await db
    .select()
    .from(photos)
    .where(and(eq(photos.shopId, shopId), eq(photos.id, id)));
  if (!row) throw notFound("No such photo");
  return row;
}

/**
 * Its marks stay on the casting, without a position; the objects go after the row is gone (an object
 * the store fails to remove is logged and unreachable, which is the harmless side to fail on).
 */
export async function deletePhoto(m: ShopMember, id: number) {
  const row = await photoInShop(m.shopId, id);
  await db.transaction(async (tx) => {
    await tx
      .update(defectMarks)
      .set({ photoId: null, x: null, y: null, updatedAt: new Date() })
      .where(eq(defectMarks.photoId, id));
    await tx.delete(photos).where(eq(photos.id, id));
  });
  await deleteObjects([row.fileName, row.thumbName]);
}
