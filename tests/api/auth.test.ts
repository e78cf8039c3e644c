import { eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { user } from "../../db/schema";
import { app, migrateOnce, ORIGIN, signUp, uniqueEmail } from "./helpers";

beforeAll(migrateOnce);

const post = (path: string, body: object) => request(app).post(path).set("Origin", ORIGIN).send(body);
const usersWithEmail = (email: string) => db.select().from(user).where(eq(user.email, email));

describe("health", () => {
  it("says the database answers", async () => {
    const res = await request(app).get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, database: "up" });
  });
});

describe("sign-up with bad input", () => {
  it("refuses a malformed e-mail and stores nothing", async () => {
    const res = await post("/api/auth/sign-up/email", { name: "A", email: "not-an-email", password: "long-enough-1" });
    expect(res.status).toBe(400);
    expect(await usersWithEmail("not-an-email")).toHaveLength(0);
  });

  it("refuses a short password and stores nothing", async () => {
    const email = uniqueEmail("short");
    const res = await post("/api/auth/sign-up/email", { name: "A", email, password: "short" });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/short/i);
    expect(await usersWithEmail(email)).toHaveLength(0);
  });
});

describe("new passwords", () => {
  it("refuses the most common passwords and nine characters, accepts a few unrelated words", async () => {
    for (const password of ["12345678", "password1", "1234567890", "qwertyuiop", "iloveyou12", "shortpass"]) {
      const email = uniqueEmail("weak");
      const res = await post("/api/auth/sign-up/email", { name: "Weak", email, password });
      expect(res.status, password).toBe(400);
      expect(res.body.message, password).toMatch(/common|short/);
      expect(await usersWithEmail(email)).toHaveLength(0);
    }
    const email = uniqueEmail("strong");
    expect(
      (await post("/api/auth/sign-up/email", { name: "Strong", email, password: "ladle-crucible-77" })).status,
    ).toBe(200);
  });
});

describe("sign-in", () => {
  it("signs in with the right password and the session reaches /api/shops/me", async () => {
    const p = await signUp("signin");
    const agent = request.agent(app);
    const res = await agent
      .post("/api/auth/sign-in/email")
      .set("Origin", ORIGIN)
      .send({ email: p.email, password: p.password });
    expect(res.status).toBe(200);
    const me = await agent.get("/api/shops/me");
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(p.email);
  });

  it("answers a wrong password and an unknown e-mail alike", async () => {
    const p = await signUp("wrongpw");
    const wrong = await post("/api/auth/sign-in/email", { email: p.email, password: "not-the-password" });
    const unknown = await post("/api/auth/sign-in/email", {
      email: uniqueEmail("nobody"),
      password: "not-the-password",
    });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(wrong.status);
    expect(unknown.body.message).toBe(wrong.body.message);
  });

  it("signs out: the session no longer reaches the API", async () => {
    const p = await signUp("signout");
    expect((await p.agent.get("/api/shops/me")).status).toBe(200);
    const out = await p.agent.post("/api/auth/sign-out").set("Origin", ORIGIN).send({});
    expect(out.status).toBe(200);
    expect((await p.agent.get("/api/shops/me")).status).toBe(401);
  });

  it("keeps shop routes closed to strangers", async () => {
    for (const path of ["/api/shops/me", "/api/shops/current", "/api/shops/current/members"]) {
      const res = await request(app).get(path);
      expect(res.status).toBe(401);
      expect(res.body.error.message).toMatch(/sign in/i);
    }
  });
});

describe("unknown API paths", () => {
  it("answer 404 in the one error shape", async () => {
    const res = await request(app).get("/api/no-such-thing");
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBeTruthy();
  });
});
