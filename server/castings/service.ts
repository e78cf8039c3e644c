import { and, asc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db } from "../db";
import { hasNewAnswerFor } from "./new-answers";
import { alloys, castings, melts, user } from "../../db/schema";
import {
  castingFields,
  castingInput,
  type Casting,
  type CastingInput,
  type CastingSummary,
  type Page,
} from "../../lib/notebook-schemas";
import type { ShopMember } from "../auth/shop-access";
import { notFound, parseOr400 } from "../http/errors";
import { requireFresh, StaleRowError, type expectedVersion } from "../http/row-version";
import { insertMarks } from "../marks/service";
import { checkMayArchive, checkMayRestore } from "../notebook/archive";
import { changedOnly, iso, personRef, withoutNulls } from "../notebook/shared";
import { photoUrls } from "../photos/urls";
import { castingPageIds, type CastingSort } from "./list-order";
import { castingInShop, toCasting } from "./lookup";

const CASTING_COLUMNS = Object.keys(castingFields.shape) as (keyof typeof castingFields.shape)[];
const castingValues = (input: CastingInput) =>
  Object.fromEntries(CASTING_COLUMNS.map((k) => [k, input[k] ?? null])) as unknown as Omit<
    typeof castings.$inferInsert,
    "shopId" | "meltId" | "createdBy"
  >;

/**
 * The casting and the marks it came with are stored in one transaction: both or neither. A save sent
 * again with the same idempotency key answers with the casting the first one made, and adds no marks.
 */
export async function createCasting(m: ShopMember, meltId: number, input: CastingInput): Promise<Casting> {
  return db.transaction(async (tx) => {
    const [melt] = await tx
      .select({ id: melts.id })
      .from(melts)
      .where(and(eq(melts.shopId, m.shopId), eq(melts.id, meltId)));
    if (!melt) throw notFound("No such melt");
    const key = input.idempotencyKey ?? null;
    const [row] = await tx
      .insert(castings)
      .values({ ...castingValues(input), shopId: m.shopId, meltId, createdBy: m.userId, idempotencyKey: key })
      .onConflictDoNothing({ target: [castings.shopId, castings.idempotencyKey] })
      .returning();
    if (!row) {
      const [first] = await tx
        .select()
        .from(castings)
        .where(and(eq(castings.shopId, m.shopId), eq(castings.idempotencyKey, key!)));
      const [who] = await tx.select({ name: user.name }).from(user).where(eq(user.id, first.createdBy));
      return toCasting(first, who.name);
    }
    await insertMarks(
      tx,
      m,
      row.id,
      (input.marks ?? []).map((mk) => ({ ...mk, photoId: null, x: null, y: null })),
    );
    return toCasting(row, m.userName);
  });
}

export async function patchCasting(
  m: ShopMember,
  id: number,
  patch: Partial<CastingInput>,
  expected?: ReturnType<typeof expectedVersion>,
): Promise<Casting> {
  const current = await castingInShop(m.shopId, id);
  requireFresh(expected, await versionedCasting(current));
  const merged = parseOr400(castingInput, { ...withoutNulls(current), ...patch });
  // The version in the WHERE makes check and write one step (see server/http/row-version.ts).
  const fresh = expected === undefined ? undefined : eq(castings.version, current.version);
  const [row] = await db
    .update(castings)
    .set({ ...changedOnly(castingValues(merged), patch), updatedAt: new Date(), version: sql`${castings.version} + 1` })
    .where(and(eq(castings.shopId, m.shopId), eq(castings.id, id), fresh))
    .returning();
  if (!row) throw new StaleRowError(await versionedCasting(await castingInShop(m.shopId, id)));
  const [who] = await db.select({ name: user.name }).from(user).where(eq(user.id, row.createdBy));
  return toCasting(row, who.name);
}

async function versionedCasting(row: Awaited<ReturnType<typeof castingInShop>>): Promise<Casting> {
  const [who] = await db.select({ name: user.name }).from(user).where(eq(user.id, row.createdBy));
  return toCasting(row, who.name);
}

/** Hides the casting from the lists; nothing is deleted. */
export async function archiveCasting(m: ShopMember, id: number): Promise<Casting> {
  checkMayArchive(m, await castingInShop(m.shopId, id), "casting");
  const [row] = await db
    .update(castings)
    .set({ archivedAt: new Date(), archivedBy: m.userId })
    .where(and(eq(castings.shopId, m.shopId), eq(castings.id, id)))
    .returning();
  return toCasting(row, (await nameOf(row.createdBy)) ?? "", m.userName);
}

export async function restoreCasting(m: ShopMember, id: number): Promise<Casting> {
  checkMayRestore(m, await castingInShop(m.shopId, id), "casting");
  const [row] = await db
    .update(castings)
    .set({ archivedAt: null, archivedBy: null })
    .where(and(eq(castings.shopId, m.shopId), eq(castings.id, id)))
    .returning();
  return toCasting(row, (await nameOf(row.createdBy)) ?? "");
}

const nameOf = async (userId: string) =>
  (await db.select({ name: user.name }).from(user).where(eq(user.id, userId)))[0]?.name;

/** Cards and table rows: the casting with its melt's date, alloy and process, its marks' defect types and a thumbnail. */
/**
 * What a list row shows of its casting's marks and photos, as columns of the list's own statement
 * (correlated look-ups on marks_casting_idx and photos_casting_idx): one round trip for a page
 * instead of four (bench:load, castings list).
 */
const markTypes = sql<string[]>`(select coalesce(array_agg(m.type::text order by m.id), '{}')
  from defect_marks m where m.casting_id = ${castings.id})`;
const photoCount = sql<number>`(select count(*)::int from photos p where p.casting_id = ${castings.id})`;
const firstPhotoId = sql<number | null>`(select min(p.id) from photos p where p.casting_id = ${castings.id})`;

export async function castingSummaries(
  shopId: string,
  opts: { meltId: number; viewer?: string } | { ids: number[]; viewer?: string },
) {
  // Archived castings are hidden everywhere; an archived melt's castings are hidden from the shop-wide
  // list (castingPageIds) but still shown on that melt's own page, where an owner may restore it.
  const which = "meltId" in opts ? eq(castings.meltId, opts.meltId) : inArray(castings.id, opts.ids);
  if ("ids" in opts && !opts.ids.length) return [];
  const found = await db
    .select({
      c: castings,
      pouredOn: melts.pouredOn,
      process: melts.process,
      alloy: alloys.designation,
      byName: user.name,
      markTypes,
      photoCount,
      firstPhotoId,
      newAnswer: opts.viewer ? hasNewAnswerFor(opts.viewer) : sql<boolean>`false`,
    })
    .from(castings)
    .innerJoin(melts, eq(melts.id, castings.meltId))
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .innerJoin(user, eq(user.id, castings.createdBy))
    .where(and(eq(castings.shopId, shopId), isNull(castings.archivedAt), which))
    .orderBy(asc(melts.pouredOn), asc(castings.id));
  // A page's rows in the page's order (castings/list-order.ts decided it).
  const place = "ids" in opts ? new Map(opts.ids.map((id, i) => [id, i])) : null;
  const rows = place ? found.sort((a, b) => place.get(a.c.id)! - place.get(b.c.id)!) : found;
  return rows.map((r): CastingSummary => {
    const { c } = r;
    return {
      id: c.id,
      meltId: c.meltId,
      partName: c.partName,
      pattern: c.pattern,
      outcome: c.outcome as CastingSummary["outcome"],
      castingWeightKg: c.castingWeightKg,
      pouredWeightKg: c.pouredWeightKg,
      pouredOn: r.pouredOn,
      alloy: r.alloy,
      process: r.process,
      markCount: r.markTypes.length,
      photoCount: r.photoCount,
      defectTypes: [...new Set(r.markTypes)] as CastingSummary["defectTypes"],
      thumbUrl: r.firstPhotoId === null ? null : photoUrls(r.firstPhotoId).thumbUrl,
      newAnswer: Boolean(r.newAnswer),
      createdBy: personRef(c.createdBy, r.byName),
      createdAt: iso(c.createdAt),
    };
  });
}

/** GET /api/castings: one page in the order asked, by keyset (castings/list-order.ts). */
export async function listCastings(
  shopId: string,
  q: { after?: string; pageSize: number; sort: CastingSort },
  viewer?: string,
): Promise<Page<CastingSummary>> {
  const { ids, next } = await castingPageIds(shopId, q);
  return { items: await castingSummaries(shopId, { ids, viewer }), pageSize: q.pageSize, next };
}
