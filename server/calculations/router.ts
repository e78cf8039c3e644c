import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { calculationListQuery, saveCalculationInput } from "../../lib/calculator-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { listCalculations, saveCalculation } from "./service";

/** Calculator results kept on a melt or a casting (docs/notebook-api.md, "Calculations"). */
export const calculationsRouter = Router();
const read = [requireShopMember, allow({ casebook: ["read"] })];
const write = [requireShopMember, allow({ casebook: ["write"] })];

calculationsRouter.get("/", ...read, async (req, res) => {
  const q = parseOr400(calculationListQuery, req.query);
  res.json({ items: await listCalculations(currentMember(req).shopId, q) } satisfies Answer<"GET /calculations">);
});

calculationsRouter.post("/", ...write, async (req, res) => {
  res
    .status(201)
    .json(
      (await saveCalculation(
        currentMember(req),
        parseOr400(saveCalculationInput, req.body),
      )) satisfies Answer<"POST /calculations">,
    );
});
