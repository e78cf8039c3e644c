import { integer, serial, text, timestamp } from "drizzle-orm/pg-core/columns";
import { index, uniqueIndex } from "drizzle-orm/pg-core/indexes";
import { pgTable } from "drizzle-orm/pg-core/table";
import { organization, user } from "./auth-schema";
import { castings } from "./notebook-schema";

/**
 * Each row brought in from an old pour log, by the fingerprint of its facts (server/import/rows.ts):
 * unique per shop, so importing the same file again adds nothing. The casting it became is kept to say so.
 */
export const importedRows = pgTable(
  "imported_rows",
  {
    id: serial("id").primaryKey(),
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    fingerprint: text("fingerprint").notNull(),
    castingId: integer("casting_id").references(() => castings.id, { onDelete: "set null" }),
    createdBy: text("created_by")
      .notNull()
      .references(() => user.id),
    createdAt: timestamp("created_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [
    uniqueIndex("imported_rows_shop_fingerprint_uq").on(t.shopId, t.fingerprint),
    index("imported_rows_casting_idx").on(t.castingId),
  ],
);
