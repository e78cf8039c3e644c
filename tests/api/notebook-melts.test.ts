import { beforeAll, describe, expect, it } from "vitest";
import { app, migrateOnce, shopWithCrew, signUp } from "./helpers";
import request from "supertest";
import { coldLostFoamMelt, newCasting, newMelt, shopCounts } from "./notebook-fixtures";

beforeAll(migrateOnce);

describe("melts", () => {
  it("logs a melt in SI and reads it back with its author", async () => {
    const { caster } = await shopWithCrew("Melt Log Shop");
    const res = await caster.agent.post("/api/melts").send(coldLostFoamMelt);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ...coldLostFoamMelt, createdBy: { id: caster.userId } });
    expect(res.body).not.toHaveProperty("shopId");
    const got = await caster.agent.get(`/api/melts/${res.body.id}`);
    expect(got.status).toBe(200);
    expect(got.body).toMatchObject({ pourTempC: 700, castings: [] });
  });

  it("accepts the alloy as people write it (A356 for A356.0)", async () => {
    const { caster } = await shopWithCrew("Alloy Name Shop");
    const res = await caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, alloy: "a356" });
    expect(res.status).toBe(201);
    expect(res.body.alloy).toBe("A356.0");
  });

  it("refuses impossible values field by field and stores nothing", async () => {
    const { shopId, caster } = await shopWithCrew("Bad Melt Shop");
    const bad = await caster.agent.post("/api/melts").send({
      ...coldLostFoamMelt,
      pourTempC: 1750, // beyond the 1,700 °C scale (iron pours up to about 1,450 °C)
      humidityPct: 120,
      degasMinutes: -3,
      sandMoisturePct: -1,
      process: "sandcastle",
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(
      expect.arrayContaining(["pourTempC", "humidityPct", "degasMinutes", "sandMoisturePct", "process"]),
    );
    // The limit in SI words, and as a template the app says in a person's units.
    expect(bad.body.error.fields.pourTempC).toBe("above 1,700 °C");
    expect(bad.body.error.fieldTemplates).toEqual({ pourTempC: "above {1700 °C}" });
    // Below A356.0's solidus (555 °C [mem] ASM Vol. 2): the metal would be solid.
    const solid = await caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, pourTempC: 540, meltTempC: 560 });
    expect(solid.status).toBe(400);
    expect(solid.body.error.fields.pourTempC).toMatch(/solidus/);
    expect(solid.body.error.fieldTemplates.pourTempC).toMatch(/solidus \(\{\d+(\.\d+)? °C\}\)/);
    const unknown = await caster.agent.post("/api/melts").send({ ...coldLostFoamMelt, alloy: "Unobtainium" });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields.alloy).toMatch(/A356\.0/);
    const missing = await caster.agent.post("/api/melts").send({ notes: "forgot everything" });
    expect(Object.keys(missing.body.error.fields)).toEqual(expect.arrayContaining(["pouredOn", "alloy", "process"]));
    expect((await shopCounts(shopId)).melts).toBe(0);
  });

  it("refuses a melt with nothing recorded beyond what the form fills in, and one emptied by a patch", async () => {
    const { caster, shopId } = await shopWithCrew("Empty Melt Shop");
    // The new-melt form fills in the date, alloy, process and furnace by itself: those alone are not a melt.
    const filledIn = { pouredOn: "2026-01-14", alloy: "A356.0", process: "green-sand" as const, furnace: "Pot #1" };
    for (const body of [filledIn, { ...filledIn, notes: "   " }, { ...filledIn, charge: null, pourTempC: null }]) {
      const res = await caster.agent.post("/api/melts").send(body);
      expect(res.status).toBe(400);
      expect(res.body.error.message).toMatch(/Nothing about this melt was recorded/);
      expect(res.body.error.fields._).toMatch(/temperature, the charge/);
    }
    expect((await shopCounts(shopId)).melts).toBe(0);
    // Any one observation keeps it: a pour temperature, a "no" to fluxing, a note.
    for (const extra of [{ pourTempC: 745 }, { fluxed: false }, { notes: "test pour" }])
      expect((await caster.agent.post("/api/melts").send({ ...filledIn, ...extra })).status).toBe(201);
    const only = await newMelt(caster, {
      ...Object.fromEntries(Object.keys(coldLostFoamMelt).map((k) => [k, null])),
      ...filledIn,
      pourTempC: 745,
    });
    const emptied = await caster.agent.patch(`/api/melts/${only.id}`).send({ pourTempC: null });
    expect(emptied.status).toBe(400);
    expect(emptied.body.error.message).toMatch(/Nothing about this melt was recorded/);
    expect((await caster.agent.get(`/api/melts/${only.id}`)).body.pourTempC).toBe(745);
  });

  it("patches a melt, checking the whole melt it makes", async () => {
    const { caster } = await shopWithCrew("Patch Melt Shop");
    const melt = await newMelt(caster);
    const ok = await caster.agent.patch(`/api/melts/${melt.id}`).send({ pourTempC: 760, meltTempC: 780, notes: null });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ pourTempC: 760, notes: null, furnace: "Propane pot #2" });
    // C83600's solidus is 854 °C: the stored 760 °C pour is now impossible, so the switch is refused.
    const bad = await caster.agent.patch(`/api/melts/${melt.id}`).send({ alloy: "C83600" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.pourTempC).toMatch(/solidus/);
    expect((await caster.agent.get(`/api/melts/${melt.id}`)).body).toMatchObject({ alloy: "A356.0", pourTempC: 760 });
  });

  it("lists a shop's melts a page at a time, sorted as asked", async () => {
    const { caster, mentor } = await shopWithCrew("List Melt Shop");
    for (const day of ["2026-01-03", "2026-01-01", "2026-01-02"]) await newMelt(caster, { pouredOn: day });
    const busy = await newMelt(mentor, { pouredOn: "2025-12-30", alloy: "319.0", furnace: "Electric kiln" });
    await newCasting(caster, busy.id);
    await newCasting(caster, busy.id, { outcome: "good" });
    const first = await caster.agent.get("/api/melts?pageSize=2");
    expect(first.body).toMatchObject({ pageSize: 2, next: expect.any(String) });
    expect(first.body.items.map((m: { pouredOn: string }) => m.pouredOn)).toEqual(["2026-01-03", "2026-01-02"]);
    const second = await caster.agent.get(`/api/melts?pageSize=2&after=${first.body.next}`);
    expect(second.body.items.map((m: { pouredOn: string }) => m.pouredOn)).toEqual(["2026-01-01", "2025-12-30"]);
    expect(second.body.next).toBeNull();
    const byCastings = await caster.agent.get("/api/melts?sort=castings");
    expect(byCastings.body.items[0]).toMatchObject({ id: busy.id, castingCount: 2, scrapCount: 1, alloy: "319.0" });
    const asc = await caster.agent.get("/api/melts?sort=date-asc");
    expect(asc.body.items[0].pouredOn).toBe("2025-12-30");
    const bad = await caster.agent.get("/api/melts?pageSize=500&sort=colour");
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["pageSize", "sort"]));
  });

  it("pre-fills a new melt from the shop's defaults and the last melt", async () => {
    const { owner, caster } = await shopWithCrew("Defaults Shop");
    await owner.agent
      .patch("/api/shops/current/settings")
      .send({ defaultAlloy: "319.0", defaultProcess: "green-sand" });
    expect((await caster.agent.get("/api/melts/defaults")).body).toEqual({ alloy: "319.0", process: "green-sand" });
    await newMelt(caster, { alloy: "A356.0", furnace: "Crucible B" });
    expect((await caster.agent.get("/api/melts/defaults")).body).toEqual({
      alloy: "A356.0",
      process: "green-sand",
      furnace: "Crucible B",
    });
  });

  it("hides another shop's melts and refuses strangers", async () => {
    const a = await shopWithCrew("Melt Shop A");
    const b = await shopWithCrew("Melt Shop B");
    const melt = await newMelt(b.caster);
    expect((await a.owner.agent.get(`/api/melts/${melt.id}`)).status).toBe(404);
    expect((await a.owner.agent.patch(`/api/melts/${melt.id}`).send({ notes: "mine now" })).status).toBe(404);
    expect((await a.caster.agent.get("/api/melts")).body.items).toEqual([]);
    expect((await a.caster.agent.get("/api/melts/abc")).status).toBe(404);
    const loner = await signUp("no-shop");
    expect((await loner.agent.post("/api/melts").send(coldLostFoamMelt)).status).toBe(403);
    expect((await request(app).get("/api/melts")).status).toBe(401);
    expect((await shopCounts(a.shopId)).melts).toBe(0);
  });
});
