import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { app, migrateOnce, ORIGIN, shopWithCrew } from "./helpers";
import { linkIn, mailTo, waitForMail } from "./mail";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

const misrun = [{ type: "misrun" as const, location: "far-from-gate" as const, severity: 3 }];
const settle = () => new Promise((r) => setTimeout(r, 500));

describe("e-mail notices of the review loop", () => {
  it("tells each mentor and owner once per request, and the caster once a cause is confirmed", async () => {
    const { caster, mentor, owner } = await shopWithCrew("Notice Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id, { marks: misrun });
    expect(
      (await caster.agent.post(`/api/review/castings/${casting.id}/requests`).send({ note: "Corner short" })).status,
    ).toBe(201);
    // Asking again while it waits sends nothing more.
    expect((await caster.agent.post(`/api/review/castings/${casting.id}/requests`).send({})).status).toBe(200);

    for (const p of [mentor, owner]) {
      const [message] = await waitForMail(p.email);
      expect(message.subject).toContain("Notice Shop");
      expect(message.text).toContain("Corner short");
      expect(linkIn(message).pathname).toBe(`/melts/${melt.id}/castings/${casting.id}`);
    }
    await settle();
    expect(await mailTo(mentor.email)).toHaveLength(1);
    expect(await mailTo(owner.email)).toHaveLength(1);
    expect(await mailTo(caster.email)).toHaveLength(0);

    const ok = await mentor.agent
      .post(`/api/review/castings/${casting.id}/confirmations`)
      .send({ causeId: "cold-pour" });
    expect(ok.status).toBe(201);
    const [answer] = await waitForMail(caster.email);
    expect(answer.subject).toContain("answered");
    expect(answer.text).toContain(ok.body.current.causeTitle);
    await settle();
    expect(await mailTo(caster.email)).toHaveLength(1);
    expect(await mailTo(mentor.email)).toHaveLength(1);
  });

  it("sends nothing of a kind a person turned off", async () => {
    const { caster, mentor, owner } = await shopWithCrew("Quiet Shop");
    const off = { reviewRequested: false, causeConfirmed: true };
    expect((await mentor.agent.put("/api/people/me/notices").set("Origin", ORIGIN).send(off)).body).toEqual(off);
    expect((await mentor.agent.get("/api/people/me/notices")).body).toEqual(off);
    await caster.agent
      .put("/api/people/me/notices")
      .set("Origin", ORIGIN)
      .send({ reviewRequested: true, causeConfirmed: false });
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id, { marks: misrun });
    await caster.agent.post(`/api/review/castings/${casting.id}/requests`).send({});
    await waitForMail(owner.email);
    await mentor.agent.post(`/api/review/castings/${casting.id}/confirmations`).send({ causeId: "cold-pour" });
    await settle();
    await settle();
    expect(await mailTo(mentor.email)).toEqual([]);
    expect(await mailTo(caster.email)).toEqual([]);
  });

  it("checks the notice settings: signed in only, both switches as booleans", async () => {
    const { caster } = await shopWithCrew("Settings Notice Shop");
    expect((await caster.agent.get("/api/people/me/notices")).body).toEqual({
      reviewRequested: true,
      causeConfirmed: true,
    });
    const bad = await caster.agent.put("/api/people/me/notices").set("Origin", ORIGIN).send({ reviewRequested: "no" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(["causeConfirmed", "reviewRequested"]);
    expect((await caster.agent.get("/api/people/me/notices")).body.reviewRequested).toBe(true);
    expect((await request(app).get("/api/people/me/notices")).status).toBe(401);
  });
});
