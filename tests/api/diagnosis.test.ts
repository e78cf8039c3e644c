import { eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../db/client";
import { diagnosisSnapshots } from "../../db/schema";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { app, migrateOnce, shopWithCrew, signUp } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

/** A misrun poured at 660 °C in green sand: below the usual 700-760 °C window ([mem], foundry-facts.md). */
const coldGreenSand = {
  defects: [{ type: "misrun", location: "far-from-gate", severity: 2 }],
  alloy: "A356",
  process: "green-sand",
  pourTempC: 660,
  minSectionMm: 5,
};

describe("POST /api/diagnosis", () => {
  it("ranks a cold pour first for a cold misrun, for any member", async () => {
    const { caster } = await shopWithCrew("Diagnose Shop");
    const res = await caster.agent.post("/api/diagnosis").send(coldGreenSand);
    expect(res.status).toBe(200);
    expect(res.body.causes[0]).toMatchObject({ id: "cold-pour" });
    expect(res.body.facts.superheatC).toBe(45); // 660 - 615 (A356.0 liquidus [mem] ASM Vol. 2)
    expect(res.body).toHaveProperty("cautions");
  });

  it("answers 400 with the accepted values for unknown defect types, processes and alloys", async () => {
    const { caster, mentor } = await shopWithCrew("Diagnose Bad Shop");
    const bad = await caster.agent
      .post("/api/diagnosis")
      .send({ ...coldGreenSand, defects: [{ type: "spaghetti" }], process: "3d-print", humidityPct: 130 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields["defects.0.type"]).toMatch(/misrun/);
    expect(bad.body.error.fields.process).toMatch(/lost-foam/);
    expect(bad.body.error.fields.humidityPct).toBeDefined();
    await mentor.agent.post("/api/alloys").send({
      designation: "Shop Bronze 7",
      family: "copper-base",
      solidusC: 880,
      liquidusC: 1000,
      densityKgM3: 8700,
      shrinkAllowancePct: 1.56,
      sources: "shop experience",
    });
    const alloy = await caster.agent.post("/api/diagnosis").send({ ...coldGreenSand, alloy: "Unobtainium" });
    expect(alloy.status).toBe(400);
    expect(alloy.body.error.fields.alloy).toMatch(/A356\.0/);
    expect(alloy.body.error.fields.alloy).toMatch(/Shop Bronze 7/);
    // The shop's own alloy is read from the table: its liquidus makes the superheat.
    const own = await caster.agent
      .post("/api/diagnosis")
      .send({ ...coldGreenSand, alloy: "shop bronze 7", pourTempC: 1050 });
    expect(own.status).toBe(200);
    expect(own.body.facts.superheatC).toBe(50);
  });

  it("is for shop members only", async () => {
    expect((await request(app).post("/api/diagnosis").send(coldGreenSand)).status).toBe(401);
    const loner = await signUp("diagnose-loner");
    expect((await loner.agent.post("/api/diagnosis").send(coldGreenSand)).status).toBe(403);
  });
});

describe("POST /api/diagnosis/castings/:id", () => {
  it("diagnoses a stored cold lost-foam misrun, keeps the snapshot and shows it on the casting", async () => {
    const { caster, mentor } = await shopWithCrew("Snapshot Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id, {
      marks: [{ type: "misrun", location: "far-from-gate", severity: 3 }],
    });
    const res = await caster.agent.post(`/api/diagnosis/castings/${casting.id}`);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ruleSetVersion: BUILT_IN_RULE_SET.version, createdBy: { id: caster.userId } });
    // 700 °C is below the roughly 730-790 °C lost foam needs ([mem] foundry-facts.md): a cold pour.
    expect(res.body.result.causes[0].id).toBe("cold-pour");
    expect(res.body.result.causes[0].because.join(" ")).toMatch(/700 °C/);
    const later = await mentor.agent.get(`/api/castings/${casting.id}`);
    expect(later.body.diagnosis).toEqual(res.body);
  });

  it("asks for a mark first, hides other shops' castings, and stores nothing when refused", async () => {
    const a = await shopWithCrew("Snapshot Shop A");
    const b = await shopWithCrew("Snapshot Shop B");
    const bare = await newCasting(a.caster, (await newMelt(a.caster)).id);
    const none = await a.caster.agent.post(`/api/diagnosis/castings/${bare.id}`);
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/mark at least one defect first/i);
    const marked = await newCasting(b.caster, (await newMelt(b.caster)).id, {
      marks: [{ type: "misrun", location: "top", severity: 2 }],
    });
    expect((await a.owner.agent.post(`/api/diagnosis/castings/${marked.id}`)).status).toBe(404);
    expect((await request(app).post(`/api/diagnosis/castings/${marked.id}`)).status).toBe(401);
    const stored = await db.select().from(diagnosisSnapshots).where(eq(diagnosisSnapshots.shopId, a.shopId));
    expect(stored).toHaveLength(0);
  });
});
