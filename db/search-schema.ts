import { bigint, bigserial, index, integer, pgTable, text, timestamp } from "drizzle-orm/pg-core";

/**
 * The casebook search keeps each shop's cases in memory (server/search/index-cache.ts). Triggers on
 * the notebook's tables (drizzle/*_search-triggers.sql) log here which casting a write touched and
 * in which transaction, so a search reads only what changed since it last looked: one indexed
 * lookup per search instead of counting every table. No foreign keys: deleting a shop cascades
 * deletes that log here too, and the rows age out (see index-cache.ts).
 */
export const searchChanges = pgTable(
  "search_changes",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    shopId: text("shop_id").notNull(),
    castingId: integer("casting_id").notNull(),
    /** pg_current_xact_id() of the writing transaction: readers compare it to their snapshot's xmin. */
    xid: bigint("xid", { mode: "number" }).notNull(),
    loggedAt: timestamp("logged_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index("search_changes_shop_xid_idx").on(t.shopId, t.xid), index("search_changes_logged_idx").on(t.loggedAt)],
);
