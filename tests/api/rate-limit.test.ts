import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { AUTH_RATE_LIMITS } from "../../server/auth/rate-limits";

// This file alone runs with the limits on (tests/api/setup.ts turns them off for the others, whose
// people all sign in from one address). The environment is read on first use, after this line.
process.env.RATE_LIMIT = "on";
const { app, migrateOnce, shopWithCrew } = await import("./helpers");
const { db } = await import("../../server/db");
const { rateLimit } = await import("../../db/schema");

beforeAll(migrateOnce);
const ORIGIN = "http://127.0.0.1:8080";
const signIn = (email: string, forwardedFor: string) =>
  request(app)
    .post("/api/auth/sign-in/email")
    .set("Origin", ORIGIN)
    .set("X-Forwarded-For", forwardedFor)
    .set("X-Casebook-Client-Address", forwardedFor)
    .send({ email, password: "not-the-password-1" });

describe("sign-in limits", () => {
  it("stop a guesser after a few tries, however X-Forwarded-For or our own address header is changed", async () => {
    const { caster } = await shopWithCrew("Rate Limit Shop");
    // The crew signed in after signing up, from this same address: those are not the guesser's tries.
    await db.delete(rateLimit);
    const max = AUTH_RATE_LIMITS["/sign-in/email"].max;
    const statuses: number[] = [];
    // With TRUST_PROXY unset no forwarded address is believed: every try comes from this socket.
    for (let i = 0; i < max + 2; i++) statuses.push((await signIn(caster.email, `203.0.113.${i}`)).status);
    expect(statuses.slice(0, max).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(max)).toEqual([429, 429]);
    const blocked = await signIn(caster.email, "198.51.100.7");
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers["x-retry-after"])).toBeGreaterThan(0);
  });
});
