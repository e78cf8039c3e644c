import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { trendsQuery } from "../../lib/trends-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { shopTrends } from "./service";

/** GET /api/trends?from&to&process&alloy: the shop's defect, scrap and rework rates. */
export const trendsRouter = Router();

trendsRouter.get("/", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  res.json(
    (await shopTrends(currentMember(req).shopId, parseOr400(trendsQuery, req.query))) satisfies Answer<"GET /trends">,
  );
});
