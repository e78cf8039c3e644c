import { Router } from "express";
import type { Answer } from "../../lib/api-routes";
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
  } satisfies Answer<"GET /shops/me">);
});

/** The member gate has just found the person in the shop, so the shop is there unless it went meanwhile. */
async function memberShop(shopId: string, userId: string) {
  const shop = await shopForMember(shopId, userId);
  if (!shop) throw notFound("No such shop");
  return shop;
}

shopsRouter.get("/current", requireShopMember, async (req, res) => {
  const m = currentMember(req);
  res.json((await memberShop(m.shopId, m.userId)) satisfies Answer<"GET /shops/current">);
});

shopsRouter.get("/current/members", requireShopMember, async (req, res) => {
  res.json({ members: await membersOf(currentMember(req).shopId) } satisfies Answer<"GET /shops/current/members">);
});

shopsRouter.patch("/current/settings", requireShopMember, allow({ shop: ["settings"] }), async (req, res) => {
  const m = currentMember(req);
  const input = parseOr400(shopSettingsInput, req.body);
  await saveShopSettings(m.shopId, m.userId, input);
  res.json((await memberShop(m.shopId, m.userId)) satisfies Answer<"PATCH /shops/current/settings">);
});

/** Any shop by id answers only to its members; to everyone else it does not exist. */
shopsRouter.get("/:shopId", requireShopMember, async (req, res) => {
  const m = currentMember(req);
  res.json((await memberShop(String(req.params.shopId), m.userId)) satisfies Answer<"GET /shops/:shopId">);
});
