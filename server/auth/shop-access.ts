import { fromNodeHeaders } from "better-auth/node";
import { and, asc, eq } from "drizzle-orm";
import type { RequestHandler } from "express";
import { db } from "../db";
import { member } from "../../db/schema";
import { roleCan, shopRole, type Permission, type ShopRole } from "../../lib/permissions";
import { HttpError } from "../http/errors";
import { getAuth } from "./auth";
import { sessionMember, type SessionMember } from "./session-member";

/** Who is asking, in which shop, with which role: set on every shop-scoped request. */
export type ShopMember = { userId: string; userName: string; shopId: string; role: ShopRole };

declare module "express-serve-static-core" {
  interface Request {
    member?: ShopMember;
  }
}

export async function sessionOf(headers: Parameters<typeof fromNodeHeaders>[0]) {
  return getAuth().api.getSession({ headers: fromNodeHeaders(headers) });
}

/**
 * The gate in front of every shop route: a signed-in person who belongs to the active shop.
 * Without an active shop the person's oldest membership is used. Role checks come after, in `allow`.
 * One query answers the usual request (session-member.ts); better-auth's getSession answers the rest.
 */
export const requireShopMember: RequestHandler = async (req, _res, next) => {
  const fast = await sessionMember(req.headers);
  if (fast === "unsigned") throw new HttpError(401, "Please sign in.");
  const found = fast === "ask-better-auth" ? await memberThroughBetterAuth(req.headers) : fast;
  if (!found) throw new HttpError(401, "Please sign in.");
  if (!found.shop)
    throw new HttpError(403, "You do not belong to a shop yet: create one or ask an owner to invite you.");
  req.member = { userId: found.userId, userName: found.userName, ...found.shop };
  next();
};

/** The same answer as sessionMember's, through getSession (which renews or ends the session) and a member query. */
async function memberThroughBetterAuth(headers: Parameters<typeof fromNodeHeaders>[0]): Promise<SessionMember | null> {
  const session = await sessionOf(headers);
  if (!session) return null;
  const userId = session.user.id;
  const activeShopId = session.session.activeOrganizationId ?? null;
  const rows = await db
    .select({ shopId: member.organizationId, role: member.role })
    .from(member)
    .where(
      activeShopId
        ? and(eq(member.userId, userId), eq(member.organizationId, activeShopId))
        : eq(member.userId, userId),
    )
    .orderBy(asc(member.createdAt))
    .limit(1);
  const row = rows[0];
  return {
    userId,
    userName: session.user.name,
    activeShopId,
    shop: row ? { shopId: row.shopId, role: shopRole(row.role) } : null,
  };
}

/** Role check, declared beside the route: `router.patch("/settings", allow({ shop: ["settings"] }), ...)`. */
export function allow(permission: Permission): RequestHandler {
  return (req, _res, next) => {
    const m = req.member;
    if (!m) throw new HttpError(401, "Please sign in.");
    if (!roleCan(m.role, permission)) {
      throw new HttpError(403, `A ${m.role} may not do this; ask a shop owner or mentor.`);
    }
    next();
  };
}

export function currentMember(req: { member?: ShopMember }): ShopMember {
  if (!req.member) throw new HttpError(401, "Please sign in.");
  return req.member;
}
