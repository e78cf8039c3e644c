import { createHmac } from "node:crypto";
import { eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { session } from "../../db/schema";
import { getAuth } from "../../server/auth/auth";
import { db } from "../../server/db";
import { app, createShop, migrateOnce, ORIGIN, shopWithCrew, signUp, type Person } from "./helpers";

/**
 * The gate in front of every shop route (server/auth/shop-access.ts, one query in
 * session-member.ts): it keeps nothing between requests, so each change below counts on the very
 * next request, and anything unusual about a session is still judged by better-auth.
 */
beforeAll(migrateOnce);

const settings = (p: Person, body: object) =>
  p.agent.patch("/api/shops/current/settings").set("Origin", ORIGIN).send(body);
const sessionCookieName = async () => (await getAuth().$context).authCookies.sessionToken.name;
const tokenOf = async (p: Person) =>
  (await db.select({ token: session.token }).from(session).where(eq(session.userId, p.userId)))[0].token;
/** A session cookie as better-auth signs it (HMAC-SHA256 of the token), for a token of our choosing. */
const signedCookie = async (token: string, secret?: string) => {
  const ctx = await getAuth().$context;
  const signature = createHmac("sha256", secret ?? ctx.secret)
    .update(token)
    .digest("base64");
  return `${await sessionCookieName()}=${encodeURIComponent(`${token}.${signature}`)}`;
};

describe("the shop gate", () => {
  it("lets a member in with the role they hold now: a changed role counts on the next request", async () => {
    const { owner, caster } = await shopWithCrew("Gate Role Shop");
    expect((await settings(caster, { defaultTemperature: "F" })).status).toBe(403);
    const promoted = await owner.agent
      .patch(`/api/people/members/${caster.userId}`)
      .set("Origin", ORIGIN)
      .send({ role: "owner" });
    expect(promoted.status).toBe(200);
    expect((await settings(caster, { defaultTemperature: "F" })).status).toBe(200);
    const demoted = await owner.agent
      .patch(`/api/people/members/${caster.userId}`)
      .set("Origin", ORIGIN)
      .send({ role: "caster" });
    expect(demoted.status).toBe(200);
    expect((await settings(caster, { defaultTemperature: "C" })).status).toBe(403);
  });

  it("closes at once on sign-out, for the signed-out cookie sent again", async () => {
    const p = await signUp("gate-signout");
    await createShop(p, "Gate Signout Shop");
    const cookie = `${await sessionCookieName()}=${encodeURIComponent(await signedToken(p))}`;
    expect((await request(app).get("/api/melts").set("Cookie", cookie)).status).toBe(200);
    expect((await p.agent.post("/api/auth/sign-out").set("Origin", ORIGIN).send({})).status).toBe(200);
    expect((await request(app).get("/api/melts").set("Cookie", cookie)).status).toBe(401);
  });

  it("refuses a cookie whose signature is not the server's, or a well-signed token with no session", async () => {
    const p = await signUp("gate-forged");
    await createShop(p, "Gate Forged Shop");
    const token = await tokenOf(p);
    expect(
      (
        await request(app)
          .get("/api/melts")
          .set("Cookie", await signedCookie(token))
      ).status,
    ).toBe(200);
    for (const cookie of [
      await signedCookie(token, "not-the-secret-of-this-server-at-all"),
      `${await sessionCookieName()}=${token}`,
      `${await sessionCookieName()}=${token}.`,
      await signedCookie("no-such-session-token"),
    ]) {
      const res = await request(app).get("/api/melts").set("Cookie", cookie);
      expect(res.status, cookie).toBe(401);
      expect(res.body.error.message).toMatch(/sign in/i);
    }
  });

  it("leaves an expired session to better-auth: refused, and its row removed", async () => {
    const p = await signUp("gate-expired");
    await createShop(p, "Gate Expired Shop");
    await db
      .update(session)
      .set({ expiresAt: new Date(Date.now() - 60_000) })
      .where(eq(session.userId, p.userId));
    expect((await p.agent.get("/api/melts")).status).toBe(401);
    expect(await db.select().from(session).where(eq(session.userId, p.userId))).toHaveLength(0);
  });

  it("leaves a session due for renewal to better-auth, which renews it", async () => {
    const p = await signUp("gate-renewal");
    await createShop(p, "Gate Renewal Shop");
    // Six days left of seven: older than better-auth's default updateAge (a day), so due.
    const due = new Date(Date.now() + 6 * 24 * 3600_000 - 60_000);
    await db.update(session).set({ expiresAt: due }).where(eq(session.userId, p.userId));
    expect((await p.agent.get("/api/melts")).status).toBe(200);
    const [row] = await db.select().from(session).where(eq(session.userId, p.userId));
    expect(row.expiresAt.getTime()).toBeGreaterThan(due.getTime() + 12 * 3600_000);
  });

  it("uses the oldest membership when no shop is active, and refuses a person with none", async () => {
    const loner = await signUp("gate-loner");
    const res = await loner.agent.get("/api/melts");
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/do not belong to a shop/);

    const p = await signUp("gate-two-shops");
    const first = await createShop(p, "Gate First Shop");
    await createShop(p, "Gate Second Shop");
    await db.update(session).set({ activeOrganizationId: null }).where(eq(session.userId, p.userId));
    const current = await p.agent.get("/api/shops/current");
    expect(current.status).toBe(200);
    expect(current.body.id).toBe(first);
  });

  it("refuses an active shop the person no longer belongs to", async () => {
    const { owner, mentor, shopId } = await shopWithCrew("Gate Left Shop");
    expect((await mentor.agent.get("/api/melts")).status).toBe(200);
    expect((await mentor.agent.post("/api/people/leave").set("Origin", ORIGIN)).status).toBe(200);
    const [row] = await db.select().from(session).where(eq(session.userId, mentor.userId));
    // Whatever better-auth does with the active shop on leaving, the gate must not let the mentor in.
    if (row.activeOrganizationId !== shopId)
      await db.update(session).set({ activeOrganizationId: shopId }).where(eq(session.userId, mentor.userId));
    expect((await mentor.agent.get("/api/melts")).status).toBe(403);
    expect((await owner.agent.get("/api/melts")).status).toBe(200);
  });
});

/** The signed cookie value the agent holds, taken from the database's token and the server's secret. */
async function signedToken(p: Person) {
  const token = await tokenOf(p);
  const signature = createHmac("sha256", (await getAuth().$context).secret)
    .update(token)
    .digest("base64");
  return `${token}.${signature}`;
}
