import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "../db";
import { defectMarks, photos, user } from "../../db/schema";
import { markInput, type Mark, type MarkInput } from "../../lib/notebook-schemas";
import type { ShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";
import { HttpError, notFound, parseOr400 } from "../http/errors";
import { requireFresh, StaleRowError, type expectedVersion } from "../http/row-version";
import { changedOnly, iso, personRef, withoutNulls } from "../notebook/shared";

type MarkRow = typeof defectMarks.$inferSelect;
type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

export function toMark(r: MarkRow, byName: string): Mark {
  return {
    id: r.id,
    castingId: r.castingId,
    photoId: r.photoId,
    x: r.x,
    y: r.y,
    type: r.type,
    location: r.location,
    severity: r.severity,
    note: r.note,
    createdBy: personRef(r.createdBy, byName),
    createdAt: iso(r.createdAt),
    version: r.version,
  };
}

/** Marks of some castings, in the order they were placed (the pins' numbers). */
export async function marksOf(castingIds: number[]): Promise<Mark[]> {
  if (!castingIds.length) return [];
  const rows = await db
    .select({ r: defectMarks, byName: user.name })
    .from(defectMarks)
    .innerJoin(user, eq(user.id, defectMarks.createdBy))
    .where(inArray(defectMarks.castingId, castingIds))
    .orderBy(asc(defectMarks.id));
  return rows.map(({ r, byName }) => toMark(r, byName));
}

const markValues = (input: MarkInput) => ({
  type: input.type,
  location: input.location,
  severity: input.severity,
  photoId: input.photoId ?? null,
  x: input.x ?? null,
  y: input.y ?? null,
  note: input.note ?? null,
});

/** A pin may only sit on a photo of the same casting. */
async function checkPhoto(tx: Tx | typeof db, castingId: number, photoId: number | null | undefined) {
  if (photoId == null) return;
  const [p] = await tx
    .select({ id: photos.id })
    .from(photos)
    .where(and(eq(photos.id, photoId), eq(photos.castingId, castingId)));
  if (!p) throw new HttpError(400, "Some values need fixing.", { photoId: "not a photo of this casting" });
}

/** Inside the caller's transaction, so a casting and its marks are stored together or not at all. */
export async function insertMarks(tx: Tx, m: ShopMember, castingId: number, inputs: MarkInput[]) {
  if (!inputs.length) return [];
  return tx
    .insert(defectMarks)
    .values(inputs.map((i) => ({ ...markValues(i), shopId: m.shopId, castingId, createdBy: m.userId })))
    .returning();
}

export async function addMark(m: ShopMember, castingId: number, input: MarkInput): Promise<Mark> {
  return db.transaction(async (tx) => {
    await castingInShop(m.shopId, castingId, tx);
    await checkPhoto(tx, castingId, input.photoId);
    const [row] = await insertMarks(tx, m, castingId, [input]);
    return toMark(row, m.userName);
  });
}

async function markInShop(shopId: string, id: number) {
  const [row] = await db
    .select()
    .from(defectMarks)
    .where(and(eq(defectMarks.shopId, shopId), eq(defectMarks.id, id)));
  if (!row) throw notFound("No such mark");
  return row;
}

/** Moving a pin sends x and y; taking it off the photo sends photoId null. */
export async function patchMark(
  m: ShopMember,
  id: number,
  patch: Partial<MarkInput>,
  expected?: ReturnType<typeof expectedVersion>,
): Promise<Mark> {
  const current = await markInShop(m.shopId, id);
  requireFresh(expected, await markWithName(current));
  const base: Record<string, unknown> = withoutNulls(current);
  if (patch.photoId === null) {
    // Off the photo: the position goes with it.
    delete base.x;
    delete base.y;
  }
  const merged = parseOr400(markInput, { ...base, ...patch });
  await checkPhoto(db, current.castingId, merged.photoId);
  const fresh = expected === undefined ? undefined : eq(defectMarks.version, current.version);
  const [row] = await db
    .update(defectMarks)
    .set({
      ...changedOnly(markValues(merged), patch, { photoId: ["x", "y"] }),
      updatedAt: new Date(),
      version: sql`${defectMarks.version} + 1`,
    })
    // The version in the WHERE makes check and write one step (see server/http/row-version.ts).
    .where(and(eq(defectMarks.shopId, m.shopId), eq(defectMarks.id, id), fresh))
    .returning();
  if (!row) throw new StaleRowError(await markWithName(await markInShop(m.shopId, id)));
  const [who] = await db.select({ name: user.name }).from(user).where(eq(user.id, row.createdBy));
  return toMark(row, who.name);
}

async function markWithName(row: MarkRow): Promise<Mark> {
  const [who] = await db.select({ name: user.name }).from(user).where(eq(user.id, row.createdBy));
  return toMark(row, who.name);
}

export async function deleteMark(m: ShopMember, id: number) {
  await markInShop(m.shopId, id);
  await db.delete(defectMarks).where(and(eq(defectMarks.shopId, m.shopId), eq(defectMarks.id, id)));
}
