import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { freePort } from "../../scripts/local-postgres";

// Production, with the mail server away: set before the app is loaded (it reads the environment once).
process.env.NODE_ENV = "production";
process.env.BETTER_AUTH_SECRET = "a-test-secret-that-is-long-enough-0123456789";
process.env.SMTP_URL = `smtp://127.0.0.1:${await freePort()}`;
process.env.MAIL_RETRY_MS = "20";

const { migrateOnce, ORIGIN, shopWithCrew, uniqueEmail } = await import("./helpers");
const { db } = await import("../../server/db");
const { invitation } = await import("../../db/schema");
const { mailSettled } = await import("../../server/mail/send");

const logged = vi.spyOn(console, "error").mockImplementation(() => {});
const warned = vi.spyOn(console, "warn").mockImplementation(() => {});
// Production turns on better-auth's sign-up rate limit: one crew for the whole file.
let crew: Awaited<ReturnType<typeof shopWithCrew>>;
beforeAll(async () => {
  await migrateOnce();
  crew = await shopWithCrew("Outage Shop");
});
afterAll(() => {
  logged.mockRestore();
  warned.mockRestore();
});

describe("when the mail server cannot be reached", () => {
  it("keeps the invitation, answers the owner, retries and logs; the owner can re-send later", async () => {
    const { owner } = crew;
    const email = uniqueEmail("unreached");
    const res = await owner.agent.post("/api/people/invitations").set("Origin", ORIGIN).send({ email, role: "caster" });
    expect(res.status).toBe(201);
    await mailSettled();
    expect(warned.mock.calls.filter((c) => String(c[0]).includes(email))).toHaveLength(3);
    expect(logged.mock.calls.some((c) => String(c[0]).match(/Gave up on .* after 4 attempts/))).toBe(true);
    const [row] = await db.select().from(invitation).where(eq(invitation.email, email));
    expect(row.status).toBe("pending");
    const again = await owner.agent.post(`/api/people/invitations/${row.id}/resend`).set("Origin", ORIGIN);
    expect(again.status).toBe(200);
    await mailSettled();
  });

  it("has no development inbox in production", async () => {
    const { owner } = crew;
    expect((await owner.agent.get("/api/people/dev/inbox")).status).toBe(404);
  });
});
