import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { fixInput, fixPatch, fixTickInput } from "../../lib/review-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { expectedVersion, sendVersioned } from "../http/row-version";
import { idParam } from "../notebook/shared";
import { addFix, followups, patchFix } from "./service";
import { setTick } from "./ticks";

/** Fixes tried and the next casting of the part: recorded by anyone who logs castings. */
export const followupsRouter = Router();
const read = [requireShopMember, allow({ casebook: ["read"] })];
const write = [requireShopMember, allow({ casebook: ["write"] })];

followupsRouter.get("/castings/:id", ...read, async (req, res) => {
  res.json(
    (await followups(
      currentMember(req).shopId,
      idParam(req.params.id, "No such casting"),
    )) satisfies Answer<"GET /followups/castings/:id">,
  );
});

followupsRouter.post("/castings/:id/fixes", ...write, async (req, res) => {
  const castingId = idParam(req.params.id, "No such casting");
  res
    .status(201)
    .json(
      (await addFix(
        currentMember(req),
        castingId,
        parseOr400(fixInput, req.body),
      )) satisfies Answer<"POST /followups/castings/:id/fixes">,
    );
});

followupsRouter.patch("/fixes/:id", ...write, async (req, res) => {
  const id = idParam(req.params.id, "No such fix");
  const fix = await patchFix(currentMember(req), id, parseOr400(fixPatch, req.body), expectedVersion(req));
  sendVersioned(res, fix satisfies Answer<"PATCH /followups/fixes/:id">);
});

/** A fix to try ticked on the likely causes; answers the casting's ticks as they are now. */
followupsRouter.put("/castings/:id/ticks", ...write, async (req, res) => {
  const castingId = idParam(req.params.id, "No such casting");
  const ticked = await setTick(currentMember(req), castingId, parseOr400(fixTickInput, req.body));
  res.json({ ticked } satisfies Answer<"PUT /followups/castings/:id/ticks">);
});
