import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
import { commentInput } from "../../lib/notebook-schemas";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { idParam } from "../notebook/shared";
import { addComment } from "./service";

export const commentsRouter = Router();

commentsRouter.post("/castings/:id", requireShopMember, allow({ casebook: ["comment"] }), async (req, res) => {
  const castingId = idParam(req.params.id, "No such casting");
  const { body } = parseOr400(commentInput, req.body);
  res
    .status(201)
    .json((await addComment(currentMember(req), castingId, body)) satisfies Answer<"POST /comments/castings/:id">);
});
