import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { alloyInput } from "../../lib/notebook-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { addAlloy, alloyRowsFor, toAlloy } from "./service";

export const alloysRouter = Router();

alloysRouter.get("/", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  const rows = await alloyRowsFor(currentMember(req).shopId);
  res.json({ alloys: rows.map(toAlloy) } satisfies Answer<"GET /alloys">);
});

/** Alloy figures feed every diagnosis, so adding one is a mentor's call, like writing a rule. */
alloysRouter.post("/", requireShopMember, allow({ rule: ["write"] }), async (req, res) => {
  const m = currentMember(req);
  const input = parseOr400(alloyInput, req.body);
  res.status(201).json((await addAlloy(m.shopId, m.userId, input)) satisfies Answer<"POST /alloys">);
});
