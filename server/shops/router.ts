import { Router } from "express";
import { shopSettingsInput } from "../../lib/shop-settings";
import { allow, currentMember, requireShopMember, sessionOf } from "../auth/shop-access";
import { HttpError, notFound, parseOr400 } from "../http/errors";
import { membersOf, saveShopSettings, shopForMember, shopsOf } from "./service";

export const shopsRouter = Router();

/** The signed-in person, their shops, and the active one with their role in it. */
shopsRouter.get("/me", async (req, res) => {
  const session = await sessionOf(req.headers);
  if (!session) throw new HttpError(401, "Please sign in.");
  const shops = await shopsOf(session.user.id);
  const active = shops.find((s) => s.id === session.session.activeOrganizationId) ?? shops[0] ?? null;
  res.json({
    user: { id: session.user.id, name: session.user.name, email: session.user.email },
    shops,
    activeShop: active,
  });
});

shopsRouter.get("/current", requireShopMember, async (req, res) => {
  const m = currentMember(req);
  res.json(await shopForMember(m.shopId, m.userId));
});

shopsRouter.get("/current/members", requireShopMember, async (req, res) => {
  res.json({ members: await membersOf(currentMember(req).shopId) });
});

shopsRouter.patch("/current/settings", requireShopMember, allow({ shop: ["settings"] }), async (req, res) => {
  const m = currentMember(req);
  const input = parseOr400(shopSettingsInput, req.body);
  await saveShopSettings(m.shopId, m.userId, input);
  res.json(await shopForMember(m.shopId, m.userId));
});

/** Any shop by id answers only to its members; to everyone else it does not exist. */
shopsRouter.get("/:shopId", requireShopMember, async (req, res) => {
  const m = currentMember(req);
  const shop = await shopForMember(String(req.params.shopId), m.userId);
  if (!shop) throw notFound("No such shop");
  res.json(shop);
});
