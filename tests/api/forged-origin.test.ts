import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { dbFingerprint } from "./db-fingerprint";
import { migrateOnce, ORIGIN, shopWithCrew } from "./helpers";
import { coldLostFoamMelt, newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

const EVIL = "http://casting-tips.example";
const jpeg = () =>
  sharp({ create: { width: 64, height: 48, channels: 3, background: "#777" } })
    .jpeg()
    .toBuffer();

describe("state-changing requests from another site", () => {
  it("refuses a multipart photo upload whose Origin or Referer is another site, storing nothing", async () => {
    const { caster } = await shopWithCrew("Forged Upload Shop");
    const casting = await newCasting(caster, (await newMelt(caster)).id);
    const photo = await jpeg();
    const before = await dbFingerprint();
    const byOrigin = await caster.agent
      .post(`/api/photos/castings/${casting.id}`)
      .set("Origin", EVIL)
      .attach("photo", photo, "a.jpg");
    expect(byOrigin.status).toBe(403);
    expect(byOrigin.body.error.message).toMatch(/another web site/);
    const byReferer = await caster.agent
      .post(`/api/photos/castings/${casting.id}`)
      .set("Referer", `${EVIL}/page.html`)
      .attach("photo", photo, "a.jpg");
    expect(byReferer.status).toBe(403);
    // A sandboxed frame or a data: page sends Origin: null.
    const opaque = await caster.agent
      .post(`/api/photos/castings/${casting.id}`)
      .set("Origin", "null")
      .attach("photo", photo, "a.jpg");
    expect(opaque.status).toBe(403);
    expect(await dbFingerprint()).toEqual(before);
    // The product's own page is let through.
    const own = await caster.agent
      .post(`/api/photos/castings/${casting.id}`)
      .set("Origin", ORIGIN)
      .attach("photo", photo, "a.jpg");
    expect(own.status).toBe(201);
  });

  it("refuses forged JSON writes and deletes on every method, and lets reads through", async () => {
    const { caster } = await shopWithCrew("Forged Json Shop");
    const melt = await newMelt(caster);
    const before = await dbFingerprint();
    for (const res of [
      await caster.agent.post("/api/melts").set("Origin", EVIL).send(coldLostFoamMelt),
      await caster.agent.patch(`/api/melts/${melt.id}`).set("Origin", EVIL).send({ notes: "forged" }),
      await caster.agent
        .put("/api/people/me/units")
        .set("Origin", `${EVIL}:443`)
        .send({ temperature: "F", length: "in", mass: "lb" }),
      await caster.agent.post("/api/melts").set("Origin", "http://127.0.0.1:9999").send(coldLostFoamMelt),
      await caster.agent.post("/api/auth/sign-out").set("Origin", EVIL),
    ])
      expect(res.status).toBe(403);
    expect(await dbFingerprint()).toEqual(before);
    expect((await caster.agent.get("/api/melts").set("Origin", EVIL)).status).toBe(200);
    expect(
      (await caster.agent.post("/api/melts").set("Referer", `${ORIGIN}/melts/new`).send(coldLostFoamMelt)).status,
    ).toBe(201);
  });
});
