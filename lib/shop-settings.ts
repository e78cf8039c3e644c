import { z } from "zod";
import { shopSettings } from "../db/schema";
import { PROCESSES } from "../rules/case";
import { requiredText } from "./fields";
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
