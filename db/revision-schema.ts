import { bigint, text } from "drizzle-orm/pg-core/columns";
import { pgTable } from "drizzle-orm/pg-core/table";

/**
 * A counter per shop that every write a diagnosis depends on raises, in the writing transaction
 * (triggers in drizzle/*_shop-revision-triggers.sql): the shop's rules, causes and switches, its
 * confirmations, and the castings, melts, marks and alloys of confirmed cases. A server caches the
 * shop's rule set and calibration by (shop, revision), so one indexed read says whether they still
 * hold, on every server. No row yet means revision 0.
 * No foreign key on purpose: deleting a shop cascades into the tables whose triggers write here, and a
 * row for a shop being deleted must not fail that delete. A deleted shop's row is a few bytes, unused.
 */
export const shopRevisions = pgTable("shop_revisions", {
  shopId: text("shop_id").primaryKey(),
  revision: bigint("revision", { mode: "number" }).notNull().default(0),
});
