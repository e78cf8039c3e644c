import { count } from "drizzle-orm";
import { getAuth } from "../auth/auth";
import { env } from "../env";
import { db } from "../db";
import { DEMO_PEOPLE, DEMO_SHOP } from "./demo-people";
import { seedDemoNotebook } from "./seed-notebook";
import { shopSettings, user } from "../../db/schema";

/**
 * Fills an empty database with the demo shop and its notebook. People are created through better-auth so their
 * passwords are hashed as any sign-up's. Returns false (and does nothing) on a database that
 * already has people, and always in production.
 */
export async function seedDemoShop(): Promise<boolean> {
  if (env.NODE_ENV === "production") return false;
  const [{ n }] = await db.select({ n: count() }).from(user);
  if (n > 0) return false;

  const ids: Record<string, string> = {};
  const crew = {} as Parameters<typeof seedDemoNotebook>[1];
  for (const p of DEMO_PEOPLE) {
    const res = await getAuth().api.signUpEmail({ body: { name: p.name, email: p.email, password: p.password } });
    ids[p.role] = res.user.id;
    crew[p.role] = { id: res.user.id, name: p.name };
  }
  const shop = await getAuth().api.createOrganization({ body: { ...DEMO_SHOP, userId: ids.owner } });
  if (!shop) throw new Error("Could not create the demo shop");
  for (const role of ["mentor", "caster"] as const) {
    await getAuth().api.addMember({ body: { userId: ids[role], role, organizationId: shop.id } });
  }
  await db.insert(shopSettings).values({ shopId: shop.id, defaultAlloy: "A356.0", defaultProcess: "green-sand" });
  // Melts, castings, illustrated photos, marks and a few diagnoses (server/seed/demo-notebook.ts).
  await seedDemoNotebook(shop.id, crew);
  return true;
}
