import { randomUUID } from "node:crypto";
import request from "supertest";
import { createApp } from "../../server/app";
import { getAuth } from "../../server/auth/auth";
import { db } from "../../server/db";
import { applyMigrations } from "../../db/migrate";
import type { ShopRole } from "../../lib/permissions";

export const app = createApp();
/** better-auth refuses cookie-carrying POSTs without a trusted Origin, as a browser would send. */
export const ORIGIN = "http://127.0.0.1:8080";

let migrated: Promise<void> | undefined;
export function migrateOnce() {
  migrated ??= applyMigrations(db);
  return migrated;
}

export const uniqueEmail = (who: string) =>
  `${who.toLowerCase().replace(/[^a-z0-9]+/g, "-")}-${randomUUID().slice(0, 8)}@test.example`;

export type Person = { agent: ReturnType<typeof request.agent>; userId: string; email: string; password: string };

/**
 * Signs up and then in through the real HTTP routes, as the app does (sign-up makes no session, so
 * that a taken address is answered like a new one); the agent keeps the session cookie.
 */
export async function signUp(who: string): Promise<Person> {
  const agent = request.agent(app);
  const email = uniqueEmail(who);
  const password = "correct-horse-9";
  const res = await agent.post("/api/auth/sign-up/email").set("Origin", ORIGIN).send({ name: who, email, password });
  if (res.status !== 200) throw new Error(`sign-up failed: ${res.status} ${res.text}`);
  const signIn = await agent.post("/api/auth/sign-in/email").set("Origin", ORIGIN).send({ email, password });
  if (signIn.status !== 200) throw new Error(`sign-in after sign-up failed: ${signIn.status} ${signIn.text}`);
  return { agent, userId: signIn.body.user.id, email, password };
}

/** Creates a shop over HTTP as `owner` (who becomes its owner) and makes it active. */
export async function createShop(owner: Person, name: string): Promise<string> {
  const slug = `${name.toLowerCase().replace(/\W+/g, "-")}-${randomUUID().slice(0, 6)}`;
  const res = await owner.agent.post("/api/auth/organization/create").set("Origin", ORIGIN).send({ name, slug });
  if (res.status !== 200) throw new Error(`shop create failed: ${res.status} ${res.text}`);
  return res.body.id;
}

/** Adds a member directly (invitations are a later feature) and makes that shop their active one. */
export async function joinShop(person: Person, shopId: string, role: ShopRole) {
  await getAuth().api.addMember({ body: { userId: person.userId, role, organizationId: shopId } });
  const res = await person.agent
    .post("/api/auth/organization/set-active")
    .set("Origin", ORIGIN)
    .send({ organizationId: shopId });
  if (res.status !== 200) throw new Error(`set-active failed: ${res.status} ${res.text}`);
}

/** A shop with an owner, a mentor and a caster, each signed in with that shop active. */
export async function shopWithCrew(name: string) {
  const owner = await signUp(`${name}-owner`);
  const shopId = await createShop(owner, name);
  const mentor = await signUp(`${name}-mentor`);
  const caster = await signUp(`${name}-caster`);
  await joinShop(mentor, shopId, "mentor");
  await joinShop(caster, shopId, "caster");
  return { shopId, owner, mentor, caster };
}
