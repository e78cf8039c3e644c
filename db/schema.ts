import { pgTable, text, timestamp } from "drizzle-orm/pg-core";
import { organization, user } from "./auth-schema";

// better-auth's own tables (generated; see DEVELOPERS.md). A "shop" is a better-auth organization.
export * from "./auth-schema";

/** A shop's own settings, set by its owner. One row per shop, made when first saved. */
export const shopSettings = pgTable("shop_settings", {
  shopId: text("shop_id")
    .primaryKey()
    .references(() => organization.id, { onDelete: "cascade" }),
  defaultAlloy: text("default_alloy"),
  defaultProcess: text("default_process"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).defaultNow().notNull(),
  updatedBy: text("updated_by").references(() => user.id, { onDelete: "set null" }),
});
export * from "./notebook-schema";
export * from "./mentor-schema";
export * from "./search-schema";
export * from "./calculator-schema";
