import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../db";
import { member, organization, shopSettings, user } from "../../db/schema";
import type { ShopRole } from "../../lib/permissions";
import type { ShopSettingsInput } from "../../lib/shop-settings";

// better-auth's member.role is a text column; the organization plugin only writes the roles of
// lib/permissions.ts into it (server/auth/auth.ts), so it is read as one of them.
const memberRole = sql<ShopRole>`${member.role}`;

export async function shopsOf(userId: string) {
  return db
    .select({ id: organization.id, name: organization.name, role: memberRole })
    .from(member)
    .innerJoin(organization, eq(member.organizationId, organization.id))
    .where(eq(member.userId, userId))
    .orderBy(asc(organization.name));
}

/** The shop as its member sees it; undefined when the person is not a member (the route says 404). */
export async function shopForMember(shopId: string, userId: string) {
  const [row] = await db
    .select({
      id: organization.id,
      name: organization.name,
      role: memberRole,
      defaultAlloy: shopSettings.defaultAlloy,
      defaultProcess: shopSettings.defaultProcess,
      defaultTemperature: shopSettings.defaultTemperature,
      defaultLength: shopSettings.defaultLength,
      defaultMass: shopSettings.defaultMass,
    })
    .from(organization)
    .innerJoin(member, and(eq(member.organizationId, organization.id), eq(member.userId, userId)))
    .leftJoin(shopSettings, eq(shopSettings.shopId, organization.id))
    .where(eq(organization.id, shopId));
  return row;
}

export async function membersOf(shopId: string) {
  return db
    .select({ userId: user.id, name: user.name, email: user.email, role: memberRole })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, shopId))
    .orderBy(asc(user.name));
}

export async function saveShopSettings(shopId: string, userId: string, input: ShopSettingsInput) {
  const values = { ...input, updatedAt: new Date(), updatedBy: userId };
  await db
    .insert(shopSettings)
    .values({ shopId, ...values })
    .onConflictDoUpdate({ target: shopSettings.shopId, set: values });
}
