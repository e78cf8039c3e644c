import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { markInput, markPatch } from "../../lib/notebook-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { expectedVersion, sendVersioned } from "../http/row-version";
import { idParam } from "../notebook/shared";
import { addMark, deleteMark, patchMark } from "./service";

export const marksRouter = Router();
const write = [requireShopMember, allow({ casebook: ["write"] })];

marksRouter.post("/castings/:id", ...write, async (req, res) => {
  const castingId = idParam(req.params.id, "No such casting");
  const input = parseOr400(markInput, req.body);
  res
    .status(201)
    .json((await addMark(currentMember(req), castingId, input)) satisfies Answer<"POST /marks/castings/:id">);
});

marksRouter.patch("/:id", ...write, async (req, res) => {
  const id = idParam(req.params.id, "No such mark");
  const mark = await patchMark(currentMember(req), id, parseOr400(markPatch, req.body), expectedVersion(req));
  sendVersioned(res, mark satisfies Answer<"PATCH /marks/:id">);
});

marksRouter.delete("/:id", ...write, async (req, res) => {
  (await deleteMark(currentMember(req), idParam(req.params.id, "No such mark"))) satisfies Answer<"DELETE /marks/:id">;
  res.status(204).end();
});
