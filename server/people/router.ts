import { Router, type Request } from "express";
import { unitsInput } from "../../lib/notebook-schemas";
import { sessionOf } from "../auth/shop-access";
import { HttpError, parseOr400 } from "../http/errors";
import { saveUnits, unitsOf } from "./service";

export const peopleRouter = Router();

/** Units belong to the person, not a shop: signed in is enough. */
async function signedInUserId(req: Request) {
  const session = await sessionOf(req.headers);
  if (!session) throw new HttpError(401, "Please sign in.");
  return session.user.id;
}

peopleRouter.get("/me/units", async (req, res) => {
  res.json(await unitsOf(await signedInUserId(req)));
});

peopleRouter.put("/me/units", async (req, res) => {
  const userId = await signedInUserId(req);
  res.json(await saveUnits(userId, parseOr400(unitsInput, req.body)));
});
