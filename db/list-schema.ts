import { sql } from "drizzle-orm";
import { check } from "drizzle-orm/pg-core/checks";
import { date, integer, text } from "drizzle-orm/pg-core/columns";
import { index } from "drizzle-orm/pg-core/indexes";
import { pgTable } from "drizzle-orm/pg-core/table";
import { organization } from "./auth-schema";
import { melts } from "./notebook-schema";

/**
 * How many castings in use each melt has, kept by triggers (drizzle/*_list_keys_triggers.sql) so the
 * pour log's "most castings" order pages on an index instead of counting every melt of the shop on
 * every page. A table of its own rather than a column of melts: a new casting changes the count, and
 * must not look like an edit of the melt to the search and diagnosis triggers on melts.
 */
export const meltCastingCounts = pgTable(
  "melt_casting_counts",
  {
    meltId: integer("melt_id")
      .primaryKey()
      .references(() => melts.id, { onDelete: "cascade" }),
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    /** The melt's pour day, the order's second key (kept with it by the same triggers). */
    pouredOn: date("poured_on", { mode: "string" }).notNull(),
    /** Castings of the melt that are not archived. */
    castings: integer("castings").default(0).notNull(),
  },
  (t) => [
    index("melt_casting_counts_order_idx").on(t.shopId, t.castings.desc(), t.pouredOn.desc(), t.meltId.desc()),
    check("melt_casting_counts_castings_ck", sql`${t.castings} >= 0`),
  ],
);
