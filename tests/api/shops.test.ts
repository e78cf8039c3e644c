import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../db/client";
import { shopSettings } from "../../db/schema";
import { createShop, migrateOnce, ORIGIN, shopWithCrew, signUp } from "./helpers";

beforeAll(migrateOnce);

describe("shops and roles", () => {
  it("makes whoever creates a shop its owner", async () => {
    const p = await signUp("creator");
    const shopId = await createShop(p, "Creator Shop");
    const me = await p.agent.get("/api/shops/me");
    expect(me.body.activeShop).toMatchObject({ id: shopId, role: "owner" });
  });

  it("a signed-in person with no shop is told to start or join one", async () => {
    const p = await signUp("loner");
    const res = await p.agent.get("/api/shops/current");
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/shop/);
  });

  it("lets only the owner change shop settings", async () => {
    const { shopId, owner, mentor, caster } = await shopWithCrew("Settings Shop");
    for (const p of [caster, mentor]) {
      const res = await p.agent.patch("/api/shops/current/settings").send({ defaultProcess: "lost-foam" });
      expect(res.status).toBe(403);
    }
    expect(await db.select().from(shopSettings).where(eq(shopSettings.shopId, shopId))).toHaveLength(0);
    const ok = await owner.agent
      .patch("/api/shops/current/settings")
      .send({ defaultProcess: "lost-foam", defaultAlloy: "A356.0" });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ defaultProcess: "lost-foam", defaultAlloy: "A356.0" });
    const seen = await caster.agent.get("/api/shops/current");
    expect(seen.body.defaultProcess).toBe("lost-foam");
  });

  it("refuses bad settings field by field and keeps what was there", async () => {
    const { owner } = await shopWithCrew("Bad Settings Shop");
    await owner.agent.patch("/api/shops/current/settings").send({ defaultProcess: "investment" });
    const res = await owner.agent
      .patch("/api/shops/current/settings")
      .send({ defaultProcess: "sandcastle", colour: "red" });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).length).toBeGreaterThan(0);
    expect((await owner.agent.get("/api/shops/current")).body.defaultProcess).toBe("investment");
    const malformed = await owner.agent
      .patch("/api/shops/current/settings")
      .set("Content-Type", "application/json")
      .send("{oops");
    expect(malformed.status).toBe(400);
  });

  it("hides another shop: 404 to a stranger, 200 to a member", async () => {
    const a = await shopWithCrew("Shop A");
    const b = await shopWithCrew("Shop B");
    expect((await a.caster.agent.get(`/api/shops/${b.shopId}`)).status).toBe(404);
    expect((await a.owner.agent.get(`/api/shops/${b.shopId}`)).status).toBe(404);
    expect((await a.caster.agent.get(`/api/shops/${a.shopId}`)).status).toBe(200);
    const members = await a.caster.agent.get("/api/shops/current/members");
    const emails = members.body.members.map((m: { email: string }) => m.email);
    expect(emails).toContain(a.owner.email);
    expect(emails).not.toContain(b.owner.email);
  });

  it("cannot switch into a shop one does not belong to", async () => {
    const a = await shopWithCrew("Home Shop");
    const b = await shopWithCrew("Other Shop");
    const res = await a.caster.agent
      .post("/api/auth/organization/set-active")
      .set("Origin", ORIGIN)
      .send({ organizationId: b.shopId });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect((await a.caster.agent.get("/api/shops/current")).body.id).toBe(a.shopId);
  });

  it("a person in two shops works in the active one and switches", async () => {
    const a = await shopWithCrew("First Shop");
    const b = await shopWithCrew("Second Shop");
    const { joinShop } = await import("./helpers");
    await joinShop(a.caster, b.shopId, "mentor");
    const me = await a.caster.agent.get("/api/shops/me");
    expect(me.body.shops).toHaveLength(2);
    expect(me.body.activeShop).toMatchObject({ id: b.shopId, role: "mentor" });
    expect((await a.caster.agent.get("/api/shops/current")).body.id).toBe(b.shopId);
  });
});
