import { eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { invitation, memberChanges } from "../../db/schema";
import { app, createShop, migrateOnce, ORIGIN, shopWithCrew, signUp, uniqueEmail, type Person } from "./helpers";
import { linkIn, mailTo, waitForMail } from "./mail";

beforeAll(migrateOnce);

async function invite(owner: Person, email: string, role: string) {
  return owner.agent.post("/api/people/invitations").set("Origin", ORIGIN).send({ email, role });
}

/** The invitation id from the link in the message that reached `email` through SMTP. */
async function invitationIdFromMail(email: string, count = 1) {
  const messages = await waitForMail(email, count);
  const link = linkIn(messages[count - 1]);
  expect(link.origin).toBe("http://127.0.0.1:8080");
  expect(link.pathname).toMatch(/^\/invitation\/[\w-]+$/);
  return link.pathname.split("/").pop()!;
}

async function accept(p: Person, invitationId: string) {
  return p.agent.post("/api/auth/organization/accept-invitation").set("Origin", ORIGIN).send({ invitationId });
}

/** A new person signs up with the invited e-mail, as the accept page does, and accepts. */
async function signUpInvited(email: string, name = "New Caster") {
  const agent = request.agent(app);
  const res = await agent
    .post("/api/auth/sign-up/email")
    .set("Origin", ORIGIN)
    .send({ name, email, password: "correct-horse-9" });
  expect(res.status).toBe(200);
  const signIn = await agent
    .post("/api/auth/sign-in/email")
    .set("Origin", ORIGIN)
    .send({ email, password: "correct-horse-9" });
  expect(signIn.status).toBe(200);
  return { agent, userId: signIn.body.user.id, email, password: "correct-horse-9" } as Person;
}

describe("invitations by e-mail", () => {
  it("sends a message through SMTP; a new person signs up from it and joins with the role, e-mail verified", async () => {
    const { owner, shopId } = await shopWithCrew("Invite Shop");
    const email = uniqueEmail("newcomer");
    const res = await invite(owner, email, "mentor");
    expect(res.status).toBe(201);

    const [message] = await waitForMail(email);
    expect(message.subject).toContain("Invite Shop");
    expect(message.text).toContain("Invite Shop");
    expect(message.text).toContain("mentor");
    expect(message.html).toContain("<a href=");
    const id = await invitationIdFromMail(email);

    const open = await request(app).get(`/api/people/invitations/${id}/open`);
    expect(open.status).toBe(200);
    expect(open.body).toMatchObject({ state: "pending", email, role: "mentor", shopName: "Invite Shop" });

    const newcomer = await signUpInvited(email);
    expect((await accept(newcomer, id)).status).toBe(200);
    const me = await newcomer.agent.get("/api/shops/me");
    expect(me.body.activeShop).toMatchObject({ id: shopId, role: "mentor" });
    const session = await newcomer.agent.get("/api/auth/get-session");
    expect(session.body.user.emailVerified).toBe(true);

    // Used once: the link now says so, and a second accept is refused.
    expect((await request(app).get(`/api/people/invitations/${id}/open`)).body.state).toBe("accepted");
    expect((await accept(newcomer, id)).status).toBe(400);

    const changes = await owner.agent.get("/api/people/changes");
    expect(changes.body.changes.map((c: { action: string }) => c.action)).toEqual(["joined", "invited"]);
    expect(changes.body.changes[1]).toMatchObject({ subjectEmail: email, detail: "mentor" });
  });

  it("lets a person who already has an account (and another shop) accept and join", async () => {
    const { owner, shopId } = await shopWithCrew("Second Shop");
    const existing = await signUp("old-hand");
    await createShop(existing, "Own Bench");
    await invite(owner, existing.email, "caster");
    const id = await invitationIdFromMail(existing.email);
    expect((await accept(existing, id)).status).toBe(200);
    const me = await existing.agent.get("/api/shops/me");
    expect(me.body.shops.map((s: { name: string }) => s.name).sort()).toEqual(["Own Bench", "Second Shop"]);
    expect(me.body.activeShop).toMatchObject({ id: shopId, role: "caster" });
  });

  it("refuses the link to any other signed-in account and leaves the invitation pending", async () => {
    const { owner } = await shopWithCrew("Wrong Account Shop");
    const email = uniqueEmail("rightful");
    await invite(owner, email, "caster");
    const id = await invitationIdFromMail(email);
    const stranger = await signUp("stranger");
    const res = await accept(stranger, id);
    expect(res.status).toBe(403);
    expect((await request(app).get(`/api/people/invitations/${id}/open`)).body.state).toBe("pending");
    expect((await stranger.agent.get("/api/shops/me")).body.shops).toEqual([]);
  });

  it("shows an expired link as expired, refuses it, and a re-send revives it with a new message", async () => {
    const { owner } = await shopWithCrew("Expiry Shop");
    const email = uniqueEmail("late");
    await invite(owner, email, "caster");
    const id = await invitationIdFromMail(email);
    await db
      .update(invitation)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitation.id, id));
    expect((await request(app).get(`/api/people/invitations/${id}/open`)).body.state).toBe("expired");
    const late = await signUpInvited(email);
    expect((await accept(late, id)).status).toBe(400);

    const list = await owner.agent.get("/api/people/invitations");
    expect(list.body.invitations).toMatchObject([{ id, email, expired: true }]);
    expect((await owner.agent.post(`/api/people/invitations/${id}/resend`).set("Origin", ORIGIN)).status).toBe(200);
    expect(await invitationIdFromMail(email, 2)).toBe(id);
    expect((await request(app).get(`/api/people/invitations/${id}/open`)).body.state).toBe("pending");
    expect((await accept(late, id)).status).toBe(200);
  });

  it("cancels: the link then says cancelled and cannot be used; only pending ones can be cancelled", async () => {
    const { owner } = await shopWithCrew("Cancel Shop");
    const email = uniqueEmail("unwanted");
    await invite(owner, email, "mentor");
    const id = await invitationIdFromMail(email);
    expect((await owner.agent.post(`/api/people/invitations/${id}/cancel`).set("Origin", ORIGIN)).status).toBe(200);
    expect((await request(app).get(`/api/people/invitations/${id}/open`)).body.state).toBe("cancelled");
    const person = await signUpInvited(email);
    expect((await accept(person, id)).status).toBe(400);
    expect((await owner.agent.post(`/api/people/invitations/${id}/cancel`).set("Origin", ORIGIN)).status).toBe(409);
    expect((await owner.agent.post(`/api/people/invitations/${id}/resend`).set("Origin", ORIGIN)).status).toBe(409);
    expect((await owner.agent.get("/api/people/invitations")).body.invitations).toEqual([]);
  });

  it("answers an unknown link with 404 and a clear message", async () => {
    const res = await request(app).get("/api/people/invitations/no-such-invitation/open");
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/not known/);
  });
});

describe("who may invite, and what is refused", () => {
  it("lets only owners invite, list, re-send and cancel (403), and sends nothing for a refused request", async () => {
    const { owner, mentor, caster, shopId } = await shopWithCrew("Role Shop");
    const email = uniqueEmail("pending");
    await invite(owner, email, "caster");
    const id = await invitationIdFromMail(email);
    for (const p of [mentor, caster]) {
      const target = uniqueEmail("never-sent");
      expect((await invite(p, target, "caster")).status).toBe(403);
      expect((await p.agent.get("/api/people/invitations")).status).toBe(403);
      expect((await p.agent.post(`/api/people/invitations/${id}/resend`).set("Origin", ORIGIN)).status).toBe(403);
      expect((await p.agent.post(`/api/people/invitations/${id}/cancel`).set("Origin", ORIGIN)).status).toBe(403);
      expect((await p.agent.get("/api/people/changes")).status).toBe(403);
      // Straight to better-auth's own endpoint: the same roles apply there.
      const direct = await p.agent
        .post("/api/auth/organization/invite-member")
        .set("Origin", ORIGIN)
        .send({ email: target, role: "caster", organizationId: shopId });
      expect(direct.status).toBe(403);
      await new Promise((r) => setTimeout(r, 300));
      expect(await mailTo(target)).toEqual([]);
    }
    expect(await db.select().from(invitation).where(eq(invitation.organizationId, shopId))).toHaveLength(1);
    expect((await request(app).get("/api/people/invitations")).status).toBe(401);
  });

  it("refuses bad input field by field and stores nothing", async () => {
    const { owner, shopId } = await shopWithCrew("Bad Invite Shop");
    const res = await invite(owner, "not-an-email", "boss");
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["email", "role"]);
    expect((await owner.agent.post("/api/people/invitations").set("Origin", ORIGIN).send({})).status).toBe(400);
    const malformed = await owner.agent
      .post("/api/people/invitations")
      .set("Origin", ORIGIN)
      .set("Content-Type", "application/json")
      .send("{oops");
    expect(malformed.status).toBe(400);
    expect(await db.select().from(invitation).where(eq(invitation.organizationId, shopId))).toHaveLength(0);
    expect(await db.select().from(memberChanges).where(eq(memberChanges.shopId, shopId))).toHaveLength(0);
  });

  it("refuses an invitation to someone already in the shop, or already invited, with a message and no mail", async () => {
    const { owner, caster } = await shopWithCrew("Member Shop");
    const res = await invite(owner, caster.email.toUpperCase(), "mentor");
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe("That person is already a member of this shop.");
    const email = uniqueEmail("twice");
    expect((await invite(owner, email, "caster")).status).toBe(201);
    const again = await invite(owner, email, "caster");
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/re-send/);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailTo(caster.email)).toEqual([]);
    expect(await mailTo(email)).toHaveLength(1);
  });

  it("keeps each shop's invitations to itself: another owner gets 404", async () => {
    const a = await shopWithCrew("Shop Alpha");
    const b = await shopWithCrew("Shop Beta");
    const email = uniqueEmail("alpha-guest");
    await invite(a.owner, email, "caster");
    const id = await invitationIdFromMail(email);
    expect((await b.owner.agent.post(`/api/people/invitations/${id}/cancel`).set("Origin", ORIGIN)).status).toBe(404);
    expect((await b.owner.agent.post(`/api/people/invitations/${id}/resend`).set("Origin", ORIGIN)).status).toBe(404);
    expect((await b.owner.agent.get("/api/people/invitations")).body.invitations).toEqual([]);
    expect((await request(app).get(`/api/people/invitations/${id}/open`)).body.state).toBe("pending");
  });
});

describe("the development inbox", () => {
  it("lists caught messages with their links for an owner; 403 for others, 401 signed out", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Inbox Shop");
    const email = uniqueEmail("inbox-guest");
    await invite(owner, email, "caster");
    const id = await invitationIdFromMail(email);
    const inbox = await owner.agent.get("/api/people/dev/inbox");
    expect(inbox.status).toBe(200);
    const message = inbox.body.messages.find((m: { to: string[] }) => m.to.includes(email));
    expect(message.subject).toContain("Inbox Shop");
    expect(message.links).toContain(`http://127.0.0.1:8080/invitation/${id}`);
    const one = await owner.agent.get(`/api/people/dev/inbox/${message.id}`);
    expect(one.body.text).toContain("Inbox Shop");
    expect((await owner.agent.get("/api/people/dev/inbox/..%2F..%2Fetc%2Fpasswd")).status).toBe(404);
    for (const p of [mentor, caster]) expect((await p.agent.get("/api/people/dev/inbox")).status).toBe(403);
    expect((await request(app).get("/api/people/dev/inbox")).status).toBe(401);
  });
});

describe("shop default units", () => {
  it("a new member starts with the shop's units; someone who chose their own keeps them", async () => {
    const { owner } = await shopWithCrew("Imperial Shop");
    const set = await owner.agent
      .patch("/api/shops/current/settings")
      .send({ defaultTemperature: "F", defaultLength: "in", defaultMass: "lb" });
    expect(set.status).toBe(200);
    expect(set.body).toMatchObject({ defaultTemperature: "F", defaultLength: "in", defaultMass: "lb" });
    expect((await owner.agent.patch("/api/shops/current/settings").send({ defaultMass: "stone" })).status).toBe(400);

    const email = uniqueEmail("imperial-newcomer");
    await invite(owner, email, "caster");
    const newcomer = await signUpInvited(email);
    expect((await accept(newcomer, await invitationIdFromMail(email))).status).toBe(200);
    expect((await newcomer.agent.get("/api/people/me/units")).body).toEqual({
      temperature: "F",
      length: "in",
      mass: "lb",
    });
    // Theirs to change afterwards.
    await newcomer.agent.put("/api/people/me/units").send({ temperature: "C", length: "in", mass: "lb" });
    expect((await newcomer.agent.get("/api/people/me/units")).body.temperature).toBe("C");

    const metric = await signUp("metric-hand");
    await metric.agent.put("/api/people/me/units").send({ temperature: "C", length: "mm", mass: "kg" });
    await invite(owner, metric.email, "caster");
    expect((await accept(metric, await invitationIdFromMail(metric.email))).status).toBe(200);
    expect((await metric.agent.get("/api/people/me/units")).body).toEqual({
      temperature: "C",
      length: "mm",
      mass: "kg",
    });
  });
});
