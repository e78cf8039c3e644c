import { text, timestamp } from "drizzle-orm/pg-core/columns";
import { pgTable } from "drizzle-orm/pg-core/table";
import { organization, user } from "./auth-schema";
import { lengthUnitEnum, massUnitEnum, processEnum, temperatureUnitEnum } from "./enums";

// better-auth's own tables (generated; see DEVELOPERS.md). A "shop" is a better-auth organization.
export * from "./auth-schema";

/** A shop's own settings, set by its owner. One row per shop, made when first saved. */
export const shopSettings = pgTable("shop_settings", {
  shopId: text("shop_id")
    .primaryKey()
    .references(() => organization.id, { onDelete: "cascade" }),
  defaultAlloy: text("default_alloy"),
  defaultProcess: processEnum("default_process"),
  /** Units a new member starts with (C/F, mm/in, kg/lb); each person can change their own after. */
  defaultTemperature: temperatureUnitEnum("default_temperature"),
  defaultLength: lengthUnitEnum("default_length"),
  defaultMass: massUnitEnum("default_mass"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).defaultNow().notNull(),
  updatedBy: text("updated_by").references(() => user.id, { onDelete: "set null" }),
});
export * from "./enums";
export * from "./notebook-schema";
export * from "./mentor-schema";
export * from "./search-schema";
export * from "./people-schema";
export * from "./calculator-schema";
export * from "./revision-schema";
export * from "./import-schema";
export * from "./calibration-schema";
export * from "./list-schema";
