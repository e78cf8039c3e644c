import { integer, jsonb, serial, text, timestamp } from "drizzle-orm/pg-core/columns";
import { index } from "drizzle-orm/pg-core/indexes";
import { pgTable } from "drizzle-orm/pg-core/table";
import type { CalcResult } from "../rules/calculators";
import { organization, user } from "./auth-schema";
import { castings, melts } from "./notebook-schema";

/**
 * A calculator's result kept on the melt (or the casting, and so its melt) it was worked out for:
 * the inputs as typed (SI) and the result the server worked out again from them with the same rules.
 */
export const calculations = pgTable(
  "calculations",
  {
    id: serial("id").primaryKey(),
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    meltId: integer("melt_id")
      .notNull()
      .references(() => melts.id, { onDelete: "cascade" }),
    castingId: integer("casting_id").references(() => castings.id, { onDelete: "cascade" }),
    kind: text("kind").notNull(),
    input: jsonb("input").$type<Record<string, unknown>>().notNull(),
    result: jsonb("result").$type<CalcResult>().notNull(),
    createdBy: text("created_by")
      .notNull()
      .references(() => user.id),
    createdAt: timestamp("created_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index("calculations_melt_idx").on(t.shopId, t.meltId), index("calculations_casting_idx").on(t.castingId)],
);
