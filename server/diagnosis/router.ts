import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { idParam } from "../notebook/shared";
import { diagnosisFreshness } from "./freshness";
import { diagnoseCase, diagnoseCasting } from "./service";

export const diagnosisRouter = Router();

/** A case typed or pasted in; nothing is stored. */
diagnosisRouter.post("/", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  res.json((await diagnoseCase(currentMember(req).shopId, req.body)) satisfies Answer<"POST /diagnosis">);
});

diagnosisRouter.post("/castings/:id", requireShopMember, allow({ casebook: ["write"] }), async (req, res) => {
  const castingId = idParam(req.params.id, "No such casting");
  res
    .status(201)
    .json((await diagnoseCasting(currentMember(req), castingId)) satisfies Answer<"POST /diagnosis/castings/:id">);
});

/** Whether the marks or conditions changed since the latest diagnosis (anyone in the shop reads it). */
diagnosisRouter.get("/castings/:id/freshness", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  const castingId = idParam(req.params.id, "No such casting");
  res.json(
    (await diagnosisFreshness(
      currentMember(req).shopId,
      castingId,
    )) satisfies Answer<"GET /diagnosis/castings/:id/freshness">,
  );
});
