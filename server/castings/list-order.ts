import { and, eq, isNull, sql } from "drizzle-orm";
import { castings, melts, outcomeRank } from "../../db/schema";
import type { CASTING_SORTS } from "../../lib/notebook-schemas";
import { db } from "../db";
import { afterKeys, decodeCursor, orderBy, pageOf, type KeyKind, type OrderKey } from "../notebook/keyset";

export type CastingSort = (typeof CASTING_SORTS)[number];

const day = castings.pouredOn;
const part = sql`lower(${castings.partName})`;
const rank = outcomeRank(castings.outcome);
const id = castings.id;

/**
 * Each order of GET /api/castings and the index in db/notebook-schema.ts that holds it (in-use rows):
 * castings_shop_poured_idx (read forwards or backwards), castings_shop_part_lower_idx,
 * castings_shop_outcome_idx. The day is the casting's copy of its melt's (kept by triggers).
 */
const ORDERS: Record<CastingSort, OrderKey[]> = {
  "date-desc": [
    { expr: sql`${day}`, dir: "desc", kind: "day" },
    { expr: sql`${id}`, dir: "desc", kind: "id" },
  ],
  "date-asc": [
    { expr: sql`${day}`, dir: "asc", kind: "day" },
    { expr: sql`${id}`, dir: "asc", kind: "id" },
  ],
  part: [
    { expr: part, dir: "asc", kind: "text" },
    { expr: sql`${id}`, dir: "desc", kind: "id", nullsLast: true },
  ],
  outcome: [
    { expr: rank, dir: "asc", kind: "count" },
    { expr: sql`${day}`, dir: "desc", kind: "day", nullsLast: true },
    { expr: sql`${id}`, dir: "desc", kind: "id", nullsLast: true },
  ],
};

/**
 * The ids of one page of the shop's castings in use, in order, and the cursor of the page after.
 * Castings of an archived melt are hidden too (a primary-key look-up per row read, and archived
 * melts are few).
 */
export async function castingPageIds(shopId: string, q: { sort: CastingSort; pageSize: number; after?: string }) {
  const order = ORDERS[q.sort];
  const kinds: KeyKind[] = order.map((k) => k.kind);
  const after = q.after ? afterKeys(order, decodeCursor(q.after, `castings:${q.sort}`, kinds)) : undefined;
  const rows = await db
    .select({ id: castings.id, day, part, rank })
    .from(castings)
    .innerJoin(melts, eq(melts.id, castings.meltId))
    .where(and(eq(castings.shopId, shopId), isNull(castings.archivedAt), isNull(melts.archivedAt), after))
    .orderBy(orderBy(order))
    .limit(q.pageSize + 1);
  const keysOf = (r: (typeof rows)[number]) =>
    q.sort === "part" ? [String(r.part), r.id] : q.sort === "outcome" ? [Number(r.rank), r.day, r.id] : [r.day, r.id];
  const page = pageOf(rows, q.pageSize, `castings:${q.sort}`, keysOf);
  return { ids: page.items.map((r) => r.id), next: page.next };
}
