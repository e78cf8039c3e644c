import { eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { account, session, user } from "../../db/schema";
import { app, migrateOnce, ORIGIN, signUp, uniqueEmail } from "./helpers";
import { linkIn, mailTo, waitForMail } from "./mail";

/**
 * Issue 9, item 13: sign-up must not tell anyone which addresses have an account. A taken address
 * gets the answer a new one gets, no account, no session, and its owner a notice by mail (SMTP).
 */
beforeAll(migrateOnce);

const signUpBody = (email: string, password = "pattern-shop-42", name = "Someone") =>
  request(app).post("/api/auth/sign-up/email").set("Origin", ORIGIN).send({ name, email, password });

/** The shape of an answer: its keys and the kinds of their values, all the way down. */
function shapeOf(value: unknown): unknown {
  if (value === null) return "null";
  if (Array.isArray(value)) return value.map(shapeOf);
  if (typeof value === "object") {
    return Object.fromEntries(
      Object.entries(value as object)
        .sort(([a], [b]) => a.localeCompare(b))
        .map(([k, v]) => [k, shapeOf(v)]),
    );
  }
  return typeof value;
}

const cookiesOf = (res: request.Response) => [res.headers["set-cookie"] ?? []].flat() as string[];

describe("sign-up for an address that already has an account", () => {
  it("answers exactly like a new sign-up, and neither makes a session", async () => {
    const owner = await signUp("taken-owner");
    const fresh = await signUpBody(uniqueEmail("fresh"));
    const taken = await signUpBody(owner.email);
    expect(taken.status).toBe(200);
    expect(taken.status).toBe(fresh.status);
    expect(shapeOf(taken.body)).toEqual(shapeOf(fresh.body));
    expect(taken.body.token).toBeNull();
    expect(taken.body.user.email).toBe(owner.email);
    // The answer names no one: not the real account's id or name.
    expect(taken.body.user.id).not.toBe(owner.userId);
    expect(taken.body.user.name).toBe("Someone");
    // No session cookie either way (the app signs in after sign-up).
    for (const res of [fresh, taken]) expect(cookiesOf(res).some((c) => /session_token=[^;]/.test(c))).toBe(false);
  });

  it("makes no account, changes nothing of the real one, and mails its owner a notice", async () => {
    const owner = await signUp("notice-owner");
    const before = {
      users: await db.select().from(user).where(eq(user.email, owner.email)),
      accounts: await db.select().from(account).where(eq(account.userId, owner.userId)),
      sessions: (await db.select().from(session).where(eq(session.userId, owner.userId))).length,
    };
    const res = await signUpBody(owner.email, "other-password-77", "Not The Owner");
    expect(res.status).toBe(200);

    const [notice] = await waitForMail(owner.email);
    expect(notice.subject).toMatch(/tried to make a Shakeout Casebook account with your address/);
    expect(notice.text).toContain("If it was you, sign in");
    expect(notice.text).toMatch(/Forgot your password/);
    expect(linkIn(notice).href).toBe("http://127.0.0.1:8080/sign-in");

    expect(await db.select().from(user).where(eq(user.email, owner.email))).toEqual(before.users);
    expect(await db.select().from(account).where(eq(account.userId, owner.userId))).toEqual(before.accounts);
    expect((await db.select().from(session).where(eq(session.userId, owner.userId))).length).toBe(before.sessions);
    // The password tried is not the account's: it does not sign in; the owner's still does.
    const tried = await request(app)
      .post("/api/auth/sign-in/email")
      .set("Origin", ORIGIN)
      .send({ email: owner.email, password: "other-password-77" });
    expect(tried.status).toBe(401);
    const real = await request(app)
      .post("/api/auth/sign-in/email")
      .set("Origin", ORIGIN)
      .send({ email: owner.email, password: owner.password });
    expect(real.status).toBe(200);
  });

  it("a new address gets an account it can sign in with, and no notice", async () => {
    const email = uniqueEmail("brand-new");
    const res = await signUpBody(email, "new-caster-pass-5", "New Caster");
    expect(res.status).toBe(200);
    expect(await db.select().from(user).where(eq(user.email, email))).toHaveLength(1);
    const agent = request.agent(app);
    const signIn = await agent
      .post("/api/auth/sign-in/email")
      .set("Origin", ORIGIN)
      .send({ email, password: "new-caster-pass-5" });
    expect(signIn.status).toBe(200);
    expect((await agent.get("/api/shops/me")).body.user.email).toBe(email);
    // Give a stray notice time to arrive before saying there is none.
    await new Promise((r) => setTimeout(r, 500));
    expect(await mailTo(email)).toEqual([]);
  });

  it("answers the same with different letter case of a taken address, and mails its owner", async () => {
    const owner = await signUp("case-owner");
    const res = await signUpBody(owner.email.toUpperCase());
    expect(res.status).toBe(200);
    expect(await db.select().from(user).where(eq(user.email, owner.email))).toHaveLength(1);
    await waitForMail(owner.email);
  });
});
