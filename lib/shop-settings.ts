import { z } from "zod";
import { shopSettings, user } from "../db/schema";
import { PROCESSES } from "../rules/case";
import { requiredText } from "./fields";
import type { ShopRole } from "./permissions";
import { tableInput } from "./table-schemas";

/**
 * What an owner may set for the shop; shared by the settings form and the API. The fields are the
 * table's columns (lib/table-schemas.ts): every one is nullable, so each may be left out or cleared
 * with null; an unknown field is refused.
 */
export const shopSettingsInput = tableInput(shopSettings, {
  defaultAlloy: requiredText("choose an alloy", 40),
  defaultProcess: z.enum(PROCESSES, { error: `process must be one of: ${PROCESSES.join(", ")}` }),
  defaultTemperature: z.enum(["C", "F"], { error: "C or F" }),
  defaultLength: z.enum(["mm", "in"], { error: "mm or in" }),
  defaultMass: z.enum(["kg", "lb"], { error: "kg or lb" }),
}).strict();
export type ShopSettingsInput = z.infer<typeof shopSettingsInput>;

// ---- Answers of server/shops (JSON) ----
type ShopSettingsRow = typeof shopSettings.$inferSelect;
type UserRow = typeof user.$inferSelect;

/** A shop the person belongs to, with their role in it (the member row's role, one of SHOP_ROLES). */
export type MyShop = { id: string; name: string; role: ShopRole };
/** GET /shops/me: the signed-in person, their shops and the active one. */
export type Me = { user: Pick<UserRow, "id" | "name" | "email">; shops: MyShop[]; activeShop: MyShop | null };
/** The shop as its member sees it: the shop_settings row's defaults, each null until an owner sets it. */
export type Shop = MyShop & Pick<ShopSettingsRow, keyof ShopSettingsInput>;
export type ShopMemberRow = { userId: string; role: ShopRole } & Pick<UserRow, "name" | "email">;
