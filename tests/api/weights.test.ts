import { eq } from "drizzle-orm";
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { castings, melts } from "../../db/schema";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt, shopCounts } from "./notebook-fixtures";

beforeAll(migrateOnce);

/** A CSV body as rows of named cells (papaparse, the package the import reads with). */
const csvRows = (text: string) =>
  Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true }).data;

const LB = 0.45359237; // kg per lb, the 1959 international pound (lib/units.ts)

describe("weights and yield", () => {
  it("keeps the charge and each mould's weights in kg and hands them to the melt's page", async () => {
    const { caster } = await shopWithCrew("Weights Shop");
    const melt = await newMelt(caster, { chargeWeightKg: 8 });
    // docs/calculator-facts.md "Casting yield": 1.8 of 3.0 kg and 2.4 of 3.6 kg, 63.6 % together.
    const a = await newCasting(caster, melt.id, { castingWeightKg: 1.8, pouredWeightKg: 3.0 });
    await newCasting(caster, melt.id, { partName: "Bracket", castingWeightKg: 2.4, pouredWeightKg: 3.6 });
    const [stored] = await db.select().from(melts).where(eq(melts.id, melt.id));
    expect(stored.chargeWeightKg).toBe(8);
    const page = await caster.agent.get(`/api/melts/${melt.id}`);
    expect(page.body.chargeWeightKg).toBe(8);
    expect(
      page.body.castings.map((c: { castingWeightKg: number; pouredWeightKg: number }) => [
        c.castingWeightKg,
        c.pouredWeightKg,
      ]),
    ).toEqual(
      expect.arrayContaining([
        [1.8, 3.0],
        [2.4, 3.6],
      ]),
    );
    const one = await caster.agent.get(`/api/castings/${a.id}`);
    expect(one.body).toMatchObject({ castingWeightKg: 1.8, pouredWeightKg: 3.0 });
  });

  it("refuses a casting heavier than the metal poured for it, saying why, and stores nothing", async () => {
    const { shopId, caster } = await shopWithCrew("Heavy Casting Shop");
    const melt = await newMelt(caster);
    const before = await shopCounts(shopId);
    const res = await caster.agent
      .post(`/api/castings/melts/${melt.id}`)
      .send({ partName: "Plaque", castingWeightKg: 3.2, pouredWeightKg: 2.5 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.castingWeightKg).toMatch(/weighs more than the metal poured/);
    expect(await shopCounts(shopId)).toEqual(before);

    // A change that makes the stored pair impossible is refused too, whichever weight it changes.
    const c = await newCasting(caster, melt.id, { castingWeightKg: 1.5, pouredWeightKg: 2.5 });
    const patch = await caster.agent.patch(`/api/castings/${c.id}`).send({ pouredWeightKg: 1 });
    expect(patch.status).toBe(400);
    expect(patch.body.error.fields.castingWeightKg).toMatch(/weighs more/);
    const [row] = await db.select().from(castings).where(eq(castings.id, c.id));
    expect([row.castingWeightKg, row.pouredWeightKg]).toEqual([1.5, 2.5]);
  });

  it("refuses weights of nothing, below nothing, absurdly large or not numbers, with the limit in words", async () => {
    const { shopId, caster } = await shopWithCrew("Bad Weights Shop");
    const melt = await newMelt(caster);
    const before = await shopCounts(shopId);
    for (const [field, value, says] of [
      ["castingWeightKg", 0, /above 0 kg/],
      ["pouredWeightKg", -2, /above 0 kg/],
      ["pouredWeightKg", 1e9, /above 10,000 kg/],
      ["castingWeightKg", "heavy", /./],
    ] as const) {
      const res = await caster.agent
        .post(`/api/castings/melts/${melt.id}`)
        .send({ partName: "Plaque", [field]: value });
      expect(res.status, `${field}=${value}`).toBe(400);
      expect(res.body.error.fields[field]).toMatch(says);
    }
    const charge = await caster.agent.patch(`/api/melts/${melt.id}`).send({ chargeWeightKg: 0 });
    expect(charge.status).toBe(400);
    expect(charge.body.error.fields.chargeWeightKg).toMatch(/above 0 kg/);
    expect(await shopCounts(shopId)).toEqual(before);
  });

  it("a charge weight alone is something recorded: the melt is not empty", async () => {
    const { caster } = await shopWithCrew("Charge Only Shop");
    const res = await caster.agent
      .post("/api/melts")
      .send({ pouredOn: "2026-02-01", alloy: "A356.0", process: "green-sand", chargeWeightKg: 4 });
    expect(res.status).toBe(201);
  });

  it("another shop neither reads nor changes the weights", async () => {
    const { caster } = await shopWithCrew("Weights Home Shop");
    const other = await shopWithCrew("Weights Other Shop");
    const melt = await newMelt(caster, { chargeWeightKg: 5 });
    const c = await newCasting(caster, melt.id, { castingWeightKg: 1, pouredWeightKg: 2 });
    expect((await other.caster.agent.get(`/api/castings/${c.id}`)).status).toBe(404);
    expect((await other.caster.agent.patch(`/api/castings/${c.id}`).send({ castingWeightKg: 1.9 })).status).toBe(404);
    expect((await other.caster.agent.patch(`/api/melts/${melt.id}`).send({ chargeWeightKg: 9 })).status).toBe(404);
    const [row] = await db.select().from(castings).where(eq(castings.id, c.id));
    expect(row.castingWeightKg).toBe(1);
  });

  it("exports the weights in the units asked for, and the yield, which no unit changes", async () => {
    const { owner } = await shopWithCrew("Weights Export Shop");
    const melt = await newMelt(owner, { chargeWeightKg: 8 });
    await newCasting(owner, melt.id, { castingWeightKg: 1.8, pouredWeightKg: 3.0 });
    const si = csvRows((await owner.agent.get("/api/export/castings.csv")).text)[0];
    expect(si).toMatchObject({
      charge_weight_kg: "8",
      casting_weight_kg: "1.8",
      poured_weight_kg: "3",
      yield_pct: "60",
    });
    await owner.agent.put("/api/people/me/units").send({ temperature: "C", length: "mm", mass: "lb" });
    const lb = csvRows((await owner.agent.get("/api/export/castings.csv?units=mine")).text)[0];
    // 8 kg = 17.637 lb, 1.8 kg = 3.968 lb, 3.0 kg = 6.614 lb (1 lb = 0.45359237 kg), to a hundredth as the forms keep.
    expect(lb).toMatchObject({
      charge_weight_lb: "17.64",
      casting_weight_lb: "3.97",
      poured_weight_lb: "6.61",
      yield_pct: "60",
    });
    expect(Number(lb.charge_weight_lb) * LB).toBeCloseTo(8, 2);
  });
});

describe("weights in an imported pour log", () => {
  it("reads weights in pounds, stores kilograms, and refuses a row whose casting outweighs its pour", async () => {
    const { owner, shopId } = await shopWithCrew("Weights Import Shop");
    const log = [
      "Date,Alloy,Process,Part,Charge weight (lb),Casting weight (lb),Poured weight (lb)",
      "2025-04-01,A356.0,green sand,Plaque,20,4,6.6",
      "2025-04-01,A356.0,green sand,Handle,20,9,3",
    ].join("\r\n");
    const mapping = [
      { column: 0, field: "pouredOn" },
      { column: 1, field: "alloy" },
      { column: 2, field: "process" },
      { column: 3, field: "partName" },
      { column: 4, field: "chargeWeight", unit: "lb" },
      { column: 5, field: "castingWeight", unit: "lb" },
      { column: 6, field: "pouredWeight", unit: "lb" },
    ];
    const res = await importLog(owner, log, mapping);
    expect(res.status).toBe(201);
    expect(res.body.imported).toBe(1);
    expect(JSON.stringify(res.body.refused)).toMatch(/weighs more than the metal poured/);
    const [c] = await db.select().from(castings).where(eq(castings.shopId, shopId));
    expect(c.castingWeightKg).toBeCloseTo(4 * LB, 9);
    expect(c.pouredWeightKg).toBeCloseTo(6.6 * LB, 9);
    const [m] = await db.select().from(melts).where(eq(melts.shopId, shopId));
    expect(m.chargeWeightKg).toBeCloseTo(20 * LB, 9);
  });
});

const importLog = (p: Person, file: string, mapping: unknown) =>
  p.agent
    .post("/api/import")
    .attach("file", Buffer.from(file), "pour-log.csv")
    .field("mapping", JSON.stringify(mapping));
