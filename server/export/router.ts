import { Router } from "express";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "../db";
import { shopSettings } from "../../db/schema";
import { DEFAULT_UNITS, type Units } from "../../lib/notebook-schemas";
import { allow, currentMember, requireShopMember, type ShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { unitsOf } from "../people/service";
import { castingsCsv } from "./service";

export const exportRouter = Router();

/** SI unless asked: scripts and spreadsheets of other shops read SI; a person may ask for theirs or the shop's. */
const exportQuery = z.object({
  units: z.enum(["si", "mine", "shop"], { error: "units must be si, mine or shop" }).default("si"),
});

async function unitsFor(m: ShopMember, choice: "si" | "mine" | "shop"): Promise<Units> {
  if (choice === "mine") return unitsOf(m.userId);
  if (choice === "si") return DEFAULT_UNITS;
  const [s] = await db.select().from(shopSettings).where(eq(shopSettings.shopId, m.shopId));
  return {
    temperature: s?.defaultTemperature ?? DEFAULT_UNITS.temperature,
    length: s?.defaultLength ?? DEFAULT_UNITS.length,
    mass: s?.defaultMass ?? DEFAULT_UNITS.mass,
  };
}

/** The whole shop's record leaves the building here, so only an owner may take it. */
exportRouter.get("/castings.csv", requireShopMember, allow({ shop: ["export"] }), async (req, res) => {
  const m = currentMember(req);
  const { units } = parseOr400(exportQuery, req.query);
  const csv = await castingsCsv(m.shopId, await unitsFor(m, units));
  const day = new Date().toISOString().slice(0, 10);
  res.set({
    "Content-Type": "text/csv; charset=utf-8",
    "Content-Disposition": `attachment; filename="castings-${day}.csv"`,
    "Cache-Control": "private, no-store",
  });
  res.send(csv);
});
