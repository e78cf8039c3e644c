import { and, eq, isNull, sql, type SQL } from "drizzle-orm";
import { meltCastingCounts, melts } from "../../db/schema";
import type { MELT_SORTS } from "../../lib/notebook-schemas";
import { db } from "../db";
import { afterKeys, decodeCursor, orderBy, pageOf, type KeyValue, type OrderKey } from "../notebook/keyset";

export type MeltSort = (typeof MELT_SORTS)[number];
type Query = { sort: MeltSort; pageSize: number; after?: string };
type Keyed = { id: number; keys: KeyValue[] };

const byDay = (dir: "asc" | "desc"): OrderKey[] => [
  { expr: sql`${melts.pouredOn}`, dir, kind: "day" },
  { expr: sql`${melts.id}`, dir, kind: "id" },
];
const k = meltCastingCounts;
const BY_CASTINGS: OrderKey[] = [
  { expr: sql`${k.castings}`, dir: "desc", kind: "count", nullsLast: true },
  { expr: sql`${k.pouredOn}`, dir: "desc", kind: "day", nullsLast: true },
  { expr: sql`${k.meltId}`, dir: "desc", kind: "id", nullsLast: true },
];

/**
 * The ids of one page of the shop's melts in use, in order, and the cursor of the page after. Each
 * order reads an index (db/): melts_shop_poured_idx forwards or backwards for the dates,
 * melt_casting_counts_order_idx for "most castings" (counts kept by triggers), and for the alloy
 * order melts_shop_alloy_poured_idx once per alloy (alloy by alloy in name order, each alloy's melts
 * newest first), so no page sorts or counts the whole shop.
 */
export async function meltPageIds(shopId: string, q: Query): Promise<{ ids: number[]; next: string | null }> {
  const rows = q.sort === "alloy" ? await byAlloy(shopId, q) : await ordered(shopId, q);
  const page = pageOf(rows, q.pageSize, `melts:${q.sort}`, (r) => r.keys);
  return { ids: page.items.map((r) => r.id), next: page.next };
}

async function ordered(shopId: string, q: Query): Promise<Keyed[]> {
  const inUse = and(eq(melts.shopId, shopId), isNull(melts.archivedAt));
  if (q.sort === "castings") {
    const after = q.after
      ? afterKeys(BY_CASTINGS, decodeCursor(q.after, `melts:${q.sort}`, ["count", "day", "id"]))
      : undefined;
    const rows = await db
      .select({ id: k.meltId, castings: k.castings, day: k.pouredOn })
      .from(k)
      .innerJoin(melts, eq(melts.id, k.meltId))
      .where(and(eq(k.shopId, shopId), isNull(melts.archivedAt), after))
      .orderBy(orderBy(BY_CASTINGS))
      .limit(q.pageSize + 1);
    return rows.map((r) => ({ id: r.id, keys: [r.castings, r.day, r.id] }));
  }
  const order = byDay(q.sort === "date-asc" ? "asc" : "desc");
  const after = q.after ? afterKeys(order, decodeCursor(q.after, `melts:${q.sort}`, ["day", "id"])) : undefined;
  const rows = await db
    .select({ id: melts.id, day: melts.pouredOn })
    .from(melts)
    .where(and(inUse, after))
    .orderBy(orderBy(order))
    .limit(q.pageSize + 1);
  return rows.map((r) => ({ id: r.id, keys: [r.day, r.id] }));
}

/** Alloys by designation (then id, for two of one name), each alloy's melts newest first. */
async function byAlloy(shopId: string, q: Query): Promise<Keyed[]> {
  let from: SQL = sql`true`;
  let within: SQL = sql`true`;
  if (q.after) {
    const [designation, alloyId, day, id] = decodeCursor(q.after, `melts:${q.sort}`, ["text", "id", "day", "id"]);
    from = sql`(a.designation, a.id) >= (${designation}::text, ${alloyId}::int)`;
    within = sql`((a.designation, a.id) > (${designation}::text, ${alloyId}::int) OR (m.poured_on, m.id) < (${day}::date, ${id}::int))`;
  }
  const n = q.pageSize + 1;
  const { rows } = await db.execute<{ id: number; designation: string; alloy_id: number; day: string }>(sql`
    SELECT m.id, a.designation, a.id AS alloy_id, m.poured_on::text AS day
    FROM alloys a CROSS JOIN LATERAL (
      SELECT m.id, m.poured_on FROM melts m
      WHERE m.shop_id = ${shopId} AND m.alloy_id = a.id AND m.archived_at IS NULL AND ${within}
      ORDER BY m.poured_on DESC NULLS LAST, m.id DESC NULLS LAST LIMIT ${n}
    ) m
    WHERE (a.shop_id = ${shopId} OR a.shop_id IS NULL) AND ${from}
    ORDER BY a.designation, a.id, m.poured_on DESC, m.id DESC LIMIT ${n}`);
  return rows.map((r) => ({ id: r.id, keys: [r.designation, r.alloy_id, r.day, r.id] }));
}
