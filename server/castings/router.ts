import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { castingInput, castingListQuery, castingPatch } from "../../lib/notebook-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { expectedVersion, rowVersion, sendVersioned } from "../http/row-version";
import { idParam } from "../notebook/shared";
import { castingDetail } from "./detail";
import { archiveCasting, createCasting, listCastings, patchCasting, restoreCasting } from "./service";

export const castingsRouter = Router();
const read = [requireShopMember, allow({ casebook: ["read"] })];
const write = [requireShopMember, allow({ casebook: ["write"] })];

castingsRouter.post("/melts/:id", ...write, async (req, res) => {
  const meltId = idParam(req.params.id, "No such melt");
  const input = parseOr400(castingInput, req.body);
  res
    .status(201)
    .json((await createCasting(currentMember(req), meltId, input)) satisfies Answer<"POST /castings/melts/:id">);
});

castingsRouter.get("/", ...read, async (req, res) => {
  const m = currentMember(req);
  res.json(
    (await listCastings(m.shopId, parseOr400(castingListQuery, req.query), m.userId)) satisfies Answer<"GET /castings">,
  );
});

castingsRouter.get("/:id", ...read, async (req, res) => {
  const casting = await castingDetail(currentMember(req).shopId, idParam(req.params.id, "No such casting"));
  res.set("ETag", rowVersion(casting)).json(casting satisfies Answer<"GET /castings/:id">);
});

castingsRouter.patch("/:id", ...write, async (req, res) => {
  const id = idParam(req.params.id, "No such casting");
  const casting = await patchCasting(currentMember(req), id, parseOr400(castingPatch, req.body), expectedVersion(req));
  sendVersioned(res, casting satisfies Answer<"PATCH /castings/:id">);
});

/** Archive and restore: who may is decided in server/notebook/archive.ts (author, mentor, owner). */
castingsRouter.post("/:id/archive", ...write, async (req, res) => {
  res.json(
    (await archiveCasting(
      currentMember(req),
      idParam(req.params.id, "No such casting"),
    )) satisfies Answer<"POST /castings/:id/archive">,
  );
});

castingsRouter.post("/:id/restore", ...write, async (req, res) => {
  res.json(
    (await restoreCasting(
      currentMember(req),
      idParam(req.params.id, "No such casting"),
    )) satisfies Answer<"POST /castings/:id/restore">,
  );
});
