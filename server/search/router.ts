import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { searchQuery } from "../../lib/search-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { idParam } from "../notebook/shared";
import { searchCases } from "./service";
import { similarTo } from "./similar";

/** The casebook: search the active shop's cases, and the cases most like one casting. */
export const searchRouter = Router();
const read = [requireShopMember, allow({ casebook: ["read"] })];

searchRouter.get("/", ...read, async (req, res) => {
  res.json(
    (await searchCases(currentMember(req).shopId, parseOr400(searchQuery, req.query))) satisfies Answer<"GET /search">,
  );
});

searchRouter.get("/castings/:id/similar", ...read, async (req, res) => {
  res.json(
    (await similarTo(
      currentMember(req).shopId,
      idParam(req.params.id, "No such casting"),
    )) satisfies Answer<"GET /search/castings/:id/similar">,
  );
});
