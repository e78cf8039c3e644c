import { eq } from "drizzle-orm";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { calculations } from "../../db/schema";
import { db } from "../../server/db";
import { app, migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

const countFor = async (shopId: string) => db.$count(calculations, eq(calculations.shopId, shopId));
// A356 green sand, 730 °C planned, 30 °C transfer loss: reach 760 °C (docs/calculator-facts.md "Metal" [calc]).
const pour = { alloy: "A356.0", process: "green-sand", plannedPourC: 730, transferLossC: 30 };

describe("calculator results kept on a melt or casting", () => {
  it("works the result out again on the server and lists it on the melt and the casting", async () => {
    const { caster, mentor } = await shopWithCrew("Calc Save Shop");
    const melt = await newMelt(caster);
    const casting = await newCasting(caster, melt.id);
    const onMelt = await caster.agent
      .post("/api/calculations")
      .send({ kind: "pour-temperature", meltId: melt.id, input: pour });
    expect(onMelt.status).toBe(201);
    const reach = onMelt.body.result.lines.find((l: { label: string }) => l.label.startsWith("Melt temperature"));
    expect(reach.si).toBe(760);
    expect(onMelt.body).toMatchObject({ meltId: melt.id, castingId: null, createdBy: { id: caster.userId } });
    // Riser of Groover's plate: modulus 0.701 cm, riser D = H = 6 · 1.2 · 0.701 = 5.05 cm [calc] (docs/calculator-facts.md "Chvorinov").
    const onCasting = await mentor.agent.post("/api/calculations").send({
      kind: "riser",
      castingId: casting.id,
      input: { shape: "plate", lengthMm: 125, widthMm: 75, thicknessMm: 20 },
    });
    expect(onCasting.status).toBe(201);
    expect(onCasting.body).toMatchObject({ meltId: melt.id, castingId: casting.id });
    const meltList = await caster.agent.get(`/api/calculations?meltId=${melt.id}`);
    expect(meltList.body.items.map((c: { kind: string }) => c.kind)).toEqual(["riser", "pour-temperature"]);
    const castingList = await caster.agent.get(`/api/calculations?castingId=${casting.id}`);
    expect(castingList.body.items).toHaveLength(1);
    expect(castingList.body.items[0].result.summary).toMatch(/riser D = H = 50 mm/);
    // The gating needs no alloy: 1:2:4 on the Groover sprue gives 0.40 m/s ([calc] docs/gating-and-copper-facts.md "Filling").
    const gating = await caster.agent.post("/api/calculations").send({
      kind: "gating",
      castingId: casting.id,
      input: { sprueHeightMm: 200, chokeAreaCm2: 2.5, ingateFrom: "ratio", gatingRatio: "1:2:4", position: "bottom" },
    });
    expect(gating.status).toBe(201);
    expect(gating.body.result.summary).toMatch(/Ingates 0\.4 m\/s, within/);
  });

  it("refuses impossible input field by field and keeps nothing", async () => {
    const { shopId, caster } = await shopWithCrew("Calc Bad Shop");
    const melt = await newMelt(caster);
    const save = (body: object) => caster.agent.post("/api/calculations").send(body);
    // Below A356.0's solidus (555 °C in the alloy table): no pour there.
    const solid = await save({ kind: "pour-temperature", meltId: melt.id, input: { ...pour, plannedPourC: 500 } });
    expect(solid.status).toBe(400);
    expect(solid.body.error.fields.plannedPourC).toMatch(/solidus/);
    const negative = await save({
      kind: "riser",
      meltId: melt.id,
      input: { shape: "typed", volumeCm3: -5, areaCm2: 10 },
    });
    expect(negative.status).toBe(400);
    expect(negative.body.error.fields.volumeCm3).toMatch(/more than 0/);
    const unknownKind = await save({ kind: "crystal-ball", meltId: melt.id, input: {} });
    expect(unknownKind.body.error.fields.kind).toBeDefined();
    const both = await save({ kind: "riser", input: { shape: "plate" } });
    expect(both.body.error.fields.meltId).toMatch(/one of them/);
    const alloy = await save({ kind: "hydrogen", meltId: melt.id, input: { alloy: "Unobtainium", meltTempC: 700 } });
    expect(alloy.body.error.fields.alloy).toMatch(/A356\.0/);
    const copper = await save({ kind: "hydrogen", meltId: melt.id, input: { alloy: "C83600", meltTempC: 1150 } });
    expect(copper.body.error.fields.alloy).toMatch(/aluminium/);
    const noRatio = await save({
      kind: "gating",
      meltId: melt.id,
      input: { sprueHeightMm: 200, chokeAreaCm2: 2.5, ingateFrom: "ratio", position: "bottom" },
    });
    expect(noRatio.body.error.fields.gatingRatio).toMatch(/ratio/);
    for (const r of [negative, unknownKind, both, alloy, copper, noRatio]) expect(r.status).toBe(400);
    expect((await caster.agent.get("/api/calculations?meltId=abc")).status).toBe(400);
    expect(await countFor(shopId)).toBe(0);
  });

  it("another shop's melt or casting is not found, and a stranger is not let in", async () => {
    const a = await shopWithCrew("Calc Shop A");
    const b = await shopWithCrew("Calc Shop B");
    const melt = await newMelt(a.caster);
    const casting = await newCasting(a.caster, melt.id);
    await a.caster.agent.post("/api/calculations").send({ kind: "pour-temperature", meltId: melt.id, input: pour });
    const theirs = await b.owner.agent
      .post("/api/calculations")
      .send({ kind: "pour-temperature", meltId: melt.id, input: pour });
    expect(theirs.status).toBe(404);
    const theirCasting = await b.owner.agent
      .post("/api/calculations")
      .send({ kind: "pattern", castingId: casting.id, input: { alloy: "A356.0", lengthMm: 100 } });
    expect(theirCasting.status).toBe(404);
    const list = await b.owner.agent.get(`/api/calculations?meltId=${melt.id}`);
    expect(list.status).toBe(200);
    expect(list.body.items).toEqual([]);
    expect((await request(app).get(`/api/calculations?meltId=${melt.id}`)).status).toBe(401);
    expect(await countFor(b.shopId)).toBe(0);
    expect(await countFor(a.shopId)).toBe(1);
  });
});
