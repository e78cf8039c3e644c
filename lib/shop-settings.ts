import { z } from "zod";
import { PROCESSES } from "../rules/case";
import { requiredText } from "./fields";

/** What an owner may set for the shop; shared by the settings form and the API. */
export const shopSettingsInput = z
  .object({
    defaultAlloy: requiredText("choose an alloy", 40).nullable(),
    defaultProcess: z.enum(PROCESSES, { error: `process must be one of: ${PROCESSES.join(", ")}` }).nullable(),
    defaultTemperature: z.enum(["C", "F"], { error: "C or F" }).nullable(),
    defaultLength: z.enum(["mm", "in"], { error: "mm or in" }).nullable(),
    defaultMass: z.enum(["kg", "lb"], { error: "kg or lb" }).nullable(),
  })
  .partial()
  .strict();
export type ShopSettingsInput = z.infer<typeof shopSettingsInput>;
