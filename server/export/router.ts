import { Router } from "express";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { castingsCsv } from "./service";

export const exportRouter = Router();

/** The whole shop's record leaves the building here, so only an owner may take it. */
exportRouter.get("/castings.csv", requireShopMember, allow({ shop: ["export"] }), async (req, res) => {
  const csv = await castingsCsv(currentMember(req).shopId);
  const day = new Date().toISOString().slice(0, 10);
  res.set({
    "Content-Type": "text/csv; charset=utf-8",
    "Content-Disposition": `attachment; filename="castings-${day}.csv"`,
    "Cache-Control": "private, no-store",
  });
  res.send(csv);
});
