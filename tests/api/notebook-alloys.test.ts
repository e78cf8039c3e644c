import { and, eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { alloys } from "../../db/schema";
import { BUILT_IN_ALLOYS } from "../../rules/alloys";
import { app, migrateOnce, shopWithCrew } from "./helpers";
import { coldLostFoamMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

/** A zinc-aluminium alloy a shop might add. Figures [mem] (ZA-8 about 375-404 °C), for the test only. */
const za8 = {
  designation: "ZA-8",
  family: "al-zn",
  solidusC: 375,
  liquidusC: 404,
  densityKgM3: 6300,
  shrinkAllowancePct: 1.0,
  sources: "shop measurement; supplier sheet",
};

describe("the alloy table", () => {
  it("lists the built-in alloys from rules/alloys.ts with their sources", async () => {
    const { caster } = await shopWithCrew("Alloy List Shop");
    const res = await caster.agent.get("/api/alloys");
    expect(res.status).toBe(200);
    expect(res.body.alloys).toHaveLength(BUILT_IN_ALLOYS.length);
    // A356.0: solidus 555 °C, liquidus 615 °C [mem] ASM Handbook Vol. 2 (docs/foundry-facts.md).
    expect(res.body.alloys.find((a: { designation: string }) => a.designation === "A356.0")).toMatchObject({
      solidusC: 555,
      liquidusC: 615,
      builtIn: true,
      createdBy: null,
      sources: expect.stringContaining("ASM"),
    });
  });

  it("lets a mentor add a shop alloy that only that shop sees and can melt", async () => {
    const a = await shopWithCrew("Zinc Shop");
    const b = await shopWithCrew("Other Zinc Shop");
    const res = await a.mentor.agent.post("/api/alloys").send(za8);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ designation: "ZA-8", builtIn: false, createdBy: { id: a.mentor.userId } });
    expect(
      (await a.caster.agent.get("/api/alloys")).body.alloys.map((x: { designation: string }) => x.designation),
    ).toContain("ZA-8");
    expect(
      (await b.caster.agent.get("/api/alloys")).body.alloys.map((x: { designation: string }) => x.designation),
    ).not.toContain("ZA-8");
    // ZA-8 pours near 430 °C: fine for its own solidus, impossible for any built-in aluminium alloy.
    const melt = await a.caster.agent
      .post("/api/melts")
      .send({ ...coldLostFoamMelt, alloy: "za-8", pourTempC: 430, meltTempC: 450 });
    expect(melt.status).toBe(201);
    const elsewhere = await b.caster.agent
      .post("/api/melts")
      .send({ ...coldLostFoamMelt, alloy: "ZA-8", pourTempC: 430, meltTempC: 450 });
    expect(elsewhere.status).toBe(400);
    expect(elsewhere.body.error.fields.alloy).toBeDefined();
  });

  it("refuses a caster (403), bad figures (400) and a name already taken, storing nothing", async () => {
    const { shopId, caster, owner } = await shopWithCrew("Alloy Rules Shop");
    expect((await caster.agent.post("/api/alloys").send(za8)).status).toBe(403);
    const bad = await owner.agent
      .post("/api/alloys")
      .send({ ...za8, solidusC: 450, liquidusC: 404, densityKgM3: -1, family: "cheese", sources: "" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["densityKgM3", "family", "sources"]));
    const inverted = await owner.agent.post("/api/alloys").send({ ...za8, solidusC: 450 });
    expect(inverted.body.error.fields.solidusC).toMatch(/liquidus/);
    const taken = await owner.agent.post("/api/alloys").send({ ...za8, designation: "a356.0" });
    expect(taken.status).toBe(400);
    expect(taken.body.error.fields.designation).toMatch(/already/);
    expect(
      await db
        .select()
        .from(alloys)
        .where(and(eq(alloys.shopId, shopId))),
    ).toHaveLength(0);
    expect((await request(app).get("/api/alloys")).status).toBe(401);
  });
});

describe("a person's units", () => {
  it("starts in SI, saves a choice per person, and refuses anything else", async () => {
    const { caster, mentor } = await shopWithCrew("Units Shop");
    expect((await caster.agent.get("/api/people/me/units")).body).toEqual({
      temperature: "C",
      length: "mm",
      mass: "kg",
    });
    const put = await caster.agent.put("/api/people/me/units").send({ temperature: "F", length: "in", mass: "lb" });
    expect(put.status).toBe(200);
    expect((await caster.agent.get("/api/people/me/units")).body).toEqual({
      temperature: "F",
      length: "in",
      mass: "lb",
    });
    expect((await mentor.agent.get("/api/people/me/units")).body.temperature).toBe("C");
    const bad = await caster.agent.put("/api/people/me/units").send({ temperature: "K", length: "cubit" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["temperature", "length", "mass"]));
    expect((await caster.agent.get("/api/people/me/units")).body.temperature).toBe("F");
    expect(
      (await request(app).put("/api/people/me/units").send({ temperature: "F", length: "in", mass: "lb" })).status,
    ).toBe(401);
  });
});
