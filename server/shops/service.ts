import { and, asc, eq } from "drizzle-orm";
import { db } from "../db";
import { member, organization, shopSettings, user } from "../../db/schema";
import { shopRole } from "../../lib/permissions";
import type { ShopSettingsInput } from "../../lib/shop-settings";

export async function shopsOf(userId: string) {
  const rows = await db
    .select({ id: organization.id, name: organization.name, role: member.role })
    .from(member)
    .innerJoin(organization, eq(member.organizationId, organization.id))
    .where(eq(member.userId, userId))
    .orderBy(asc(organization.name));
  return rows.map((r) => ({ ...r, role: shopRole(r.role) }));
}

/** The shop as its member sees it; undefined when the person is not a member (the route says 404). */
export async function shopForMember(shopId: string, userId: string) {
  const [row] = await db
    .select({
      id: organization.id,
      name: organization.name,
      role: member.role,
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
  return row && { ...row, role: shopRole(row.role) };
}

export async function membersOf(shopId: string) {
  const rows = await db
    .select({ userId: user.id, name: user.name, email: user.email, role: member.role })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, shopId))
    .orderBy(asc(user.name));
  return rows.map((r) => ({ ...r, role: shopRole(r.role) }));
}

export async function saveShopSettings(shopId: string, userId: string, input: ShopSettingsInput) {
  const values = { ...input, updatedAt: new Date(), updatedBy: userId };
  await db
    .insert(shopSettings)
    .values({ shopId, ...values })
    .onConflictDoUpdate({ target: shopSettings.shopId, set: values });
}
