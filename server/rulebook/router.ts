import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { switchInput, trialInput } from "../../lib/rulebook-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { createRule, publishRule, retireRule, switchBuiltIn, updateRule } from "./changes";
import { ruleDetail, rulebook, tryRule } from "./service";

/** The rulebook: everyone in the shop reads it; mentors and owners write, try, publish, retire and switch rules. */
export const rulebookRouter = Router();
const read = [requireShopMember, allow({ rule: ["read"] })];
const write = [requireShopMember, allow({ rule: ["write"] })];
const ruleId = (v: unknown) => String(v).slice(0, 100);

rulebookRouter.get("/", ...read, async (req, res) => {
  res.json((await rulebook(currentMember(req).shopId)) satisfies Answer<"GET /rulebook">);
});

rulebookRouter.get("/rules/:ruleId", ...read, async (req, res) => {
  res.json(
    (await ruleDetail(
      currentMember(req).shopId,
      ruleId(req.params.ruleId),
    )) satisfies Answer<"GET /rulebook/rules/:ruleId">,
  );
});

rulebookRouter.post("/rules", ...write, async (req, res) => {
  res.status(201).json((await createRule(currentMember(req), req.body)) satisfies Answer<"POST /rulebook/rules">);
});

rulebookRouter.put("/rules/:ruleId", ...write, async (req, res) => {
  res.json(
    (await updateRule(
      currentMember(req),
      ruleId(req.params.ruleId),
      req.body,
    )) satisfies Answer<"PUT /rulebook/rules/:ruleId">,
  );
});

rulebookRouter.post("/rules/:ruleId/publish", requireShopMember, allow({ rule: ["publish"] }), async (req, res) => {
  res.json(
    (await publishRule(
      currentMember(req),
      ruleId(req.params.ruleId),
    )) satisfies Answer<"POST /rulebook/rules/:ruleId/publish">,
  );
});

rulebookRouter.post("/rules/:ruleId/retire", requireShopMember, allow({ rule: ["retire"] }), async (req, res) => {
  res.json(
    (await retireRule(
      currentMember(req),
      ruleId(req.params.ruleId),
    )) satisfies Answer<"POST /rulebook/rules/:ruleId/retire">,
  );
});

/** Switching a built-in rule off for this shop takes it out of diagnoses as retiring does. */
rulebookRouter.put("/rules/:ruleId/switch", requireShopMember, allow({ rule: ["retire"] }), async (req, res) => {
  const { off } = parseOr400(switchInput, req.body);
  res.json(
    (await switchBuiltIn(
      currentMember(req),
      ruleId(req.params.ruleId),
      off,
    )) satisfies Answer<"PUT /rulebook/rules/:ruleId/switch">,
  );
});

rulebookRouter.post("/try", ...write, async (req, res) => {
  const body = parseOr400(trialInput, req.body);
  res.json((await tryRule(currentMember(req).shopId, body)) satisfies Answer<"POST /rulebook/try">);
});
