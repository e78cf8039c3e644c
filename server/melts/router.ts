import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { meltInput, meltListQuery, meltPatch } from "../../lib/notebook-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { expectedVersion, rowVersion, sendVersioned } from "../http/row-version";
import { castingSummaries } from "../castings/service";
import { idParam } from "../notebook/shared";
import { archiveMelt, createMelt, getMelt, listMelts, meltDefaults, patchMelt, restoreMelt } from "./service";

export const meltsRouter = Router();
const read = [requireShopMember, allow({ casebook: ["read"] })];
const write = [requireShopMember, allow({ casebook: ["write"] })];

meltsRouter.get("/", ...read, async (req, res) => {
  res.json(
    (await listMelts(currentMember(req).shopId, parseOr400(meltListQuery, req.query))) satisfies Answer<"GET /melts">,
  );
});

// Declared before /melts/:id so "defaults" is not read as an id.
meltsRouter.get("/defaults", ...read, async (req, res) => {
  res.json((await meltDefaults(currentMember(req).shopId)) satisfies Answer<"GET /melts/defaults">);
});

meltsRouter.post("/", ...write, async (req, res) => {
  res
    .status(201)
    .json((await createMelt(currentMember(req), parseOr400(meltInput, req.body))) satisfies Answer<"POST /melts">);
});

/** A melt's page: the melt and its castings in the order they were poured. */
meltsRouter.get("/:id", ...read, async (req, res) => {
  const { shopId, userId } = currentMember(req);
  const melt = await getMelt(shopId, idParam(req.params.id, "No such melt"));
  const castings = await castingSummaries(shopId, { meltId: melt.id, viewer: userId });
  res.set("ETag", rowVersion(melt)).json({ ...melt, castings } satisfies Answer<"GET /melts/:id">);
});

meltsRouter.patch("/:id", ...write, async (req, res) => {
  const id = idParam(req.params.id, "No such melt");
  const melt = await patchMelt(currentMember(req), id, parseOr400(meltPatch, req.body), expectedVersion(req));
  sendVersioned(res, melt satisfies Answer<"PATCH /melts/:id">);
});

/** Archive and restore: who may is decided in server/notebook/archive.ts (author, mentor, owner). */
meltsRouter.post("/:id/archive", ...write, async (req, res) => {
  res.json(
    (await archiveMelt(
      currentMember(req),
      idParam(req.params.id, "No such melt"),
    )) satisfies Answer<"POST /melts/:id/archive">,
  );
});

meltsRouter.post("/:id/restore", ...write, async (req, res) => {
  res.json(
    (await restoreMelt(
      currentMember(req),
      idParam(req.params.id, "No such melt"),
    )) satisfies Answer<"POST /melts/:id/restore">,
  );
});
