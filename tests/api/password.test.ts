import { eq, like } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { user, verification } from "../../db/schema";
import { app, createShop, migrateOnce, ORIGIN, signUp, uniqueEmail, type Person } from "./helpers";
import { linkIn, mailTo, waitForMail } from "./mail";

beforeAll(migrateOnce);

const askReset = (email: string) =>
  request(app).post("/api/auth/request-password-reset").set("Origin", ORIGIN).send({ email });
const reset = (token: string, newPassword: string) =>
  request(app).post("/api/auth/reset-password").set("Origin", ORIGIN).send({ token, newPassword });
const signIn = (email: string, password: string) =>
  request.agent(app).post("/api/auth/sign-in/email").set("Origin", ORIGIN).send({ email, password });

async function signedInAgain(p: Person) {
  const agent = request.agent(app);
  const res = await agent
    .post("/api/auth/sign-in/email")
    .set("Origin", ORIGIN)
    .send({ email: p.email, password: p.password });
  expect(res.status).toBe(200);
  return agent;
}

async function tokenFromMail(email: string, count = 1) {
  const messages = await waitForMail(email, count);
  const link = linkIn(messages[count - 1]);
  expect(link.origin + link.pathname).toBe("http://127.0.0.1:8080/reset-password");
  return link.searchParams.get("token")!;
}

describe("password reset by e-mail", () => {
  it("answers the same whether or not the e-mail has an account, and mails only a real one", async () => {
    const p = await signUp("forgetful");
    const nobody = uniqueEmail("nobody");
    const known = await askReset(p.email);
    const unknown = await askReset(nobody);
    expect(known.status).toBe(unknown.status);
    expect(known.body).toEqual(unknown.body);
    await waitForMail(p.email);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailTo(nobody)).toEqual([]);
  });

  it("sets a new password once; the old password and every session end", async () => {
    const p = await signUp("resetter");
    await createShop(p, "Reset Shop");
    const other = await signedInAgain(p);
    // Both sessions pass the shop gate (server/auth/shop-access.ts) before the reset...
    for (const agent of [p.agent, other]) expect((await agent.get("/api/shops/current")).status).toBe(200);
    await askReset(p.email);
    const [message] = await waitForMail(p.email);
    expect(message.text).toContain("Reset Shop");
    expect(message.html).toContain("<a href=");
    const token = await tokenFromMail(p.email);

    expect((await reset(token, "short")).status).toBe(400);
    expect((await reset(token, "brand-new-pass-7")).status).toBe(200);
    expect((await reset(token, "another-pass-8")).status).toBe(400);

    for (const agent of [p.agent, other]) {
      // ...and neither does after it (asked first: get-session would clear the cookie).
      expect((await agent.get("/api/shops/current")).status).toBe(401);
      const session = await agent.get("/api/auth/get-session");
      expect(session.body).toBeNull();
    }
    expect((await signIn(p.email, p.password)).status).toBe(401);
    expect((await signIn(p.email, "brand-new-pass-7")).status).toBe(200);
    expect((await signIn(p.email, "another-pass-8")).status).toBe(401);
  });

  it("refuses a link older than an hour", async () => {
    const p = await signUp("slow-reader");
    await askReset(p.email);
    const token = await tokenFromMail(p.email);
    const rows = await db
      .select()
      .from(verification)
      .where(like(verification.identifier, `%${token}%`));
    expect(rows).toHaveLength(1);
    // Its lifetime is one hour from when it was made (a few seconds ago).
    expect(rows[0].expiresAt.getTime() - Date.now()).toBeGreaterThan(59 * 60_000);
    expect(rows[0].expiresAt.getTime() - Date.now()).toBeLessThanOrEqual(60 * 60_000);
    await db
      .update(verification)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(verification.id, rows[0].id));
    expect((await reset(token, "too-late-pass-1")).status).toBe(400);
    expect((await signIn(p.email, p.password)).status).toBe(200);
  });

  it("refuses a made-up token", async () => {
    expect((await reset("not-a-real-token", "whatever-pass-1")).status).toBe(400);
  });
});

describe("your own account: name and password", () => {
  it("changes the display name, 1 to 80 characters, trimmed", async () => {
    const p = await signUp("renamer");
    for (const name of ["", "   ", "x".repeat(81)]) {
      const res = await p.agent.patch("/api/people/me").set("Origin", ORIGIN).send({ name });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.name).toBeTruthy();
    }
    expect((await p.agent.patch("/api/people/me").set("Origin", ORIGIN).send({})).status).toBe(400);
    const ok = await p.agent.patch("/api/people/me").set("Origin", ORIGIN).send({ name: "  Ada Pourwell  " });
    expect(ok.status).toBe(200);
    const [row] = await db.select().from(user).where(eq(user.id, p.userId));
    expect(row.name).toBe("Ada Pourwell");
    expect((await request(app).patch("/api/people/me").send({ name: "Ghost" })).status).toBe(401);
  });

  it("changes the password with the current one; other sessions end, this one stays", async () => {
    const p = await signUp("changer");
    const other = await signedInAgain(p);
    const wrong = await p.agent
      .post("/api/people/me/password")
      .set("Origin", ORIGIN)
      .send({ currentPassword: "not-my-password", newPassword: "fresh-password-2" });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.currentPassword).toMatch(/not right/);
    const short = await p.agent
      .post("/api/people/me/password")
      .set("Origin", ORIGIN)
      .send({ currentPassword: p.password, newPassword: "short" });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.newPassword).toBeTruthy();
    expect((await signIn(p.email, p.password)).status).toBe(200);

    const ok = await p.agent
      .post("/api/people/me/password")
      .set("Origin", ORIGIN)
      .send({ currentPassword: p.password, newPassword: "fresh-password-2" });
    expect(ok.status).toBe(200);
    expect((await other.get("/api/auth/get-session")).body).toBeNull();
    expect((await p.agent.get("/api/auth/get-session")).body.user.id).toBe(p.userId);
    expect((await signIn(p.email, p.password)).status).toBe(401);
    expect((await signIn(p.email, "fresh-password-2")).status).toBe(200);
    expect((await request(app).post("/api/people/me/password").send({})).status).toBe(401);
  });
});
