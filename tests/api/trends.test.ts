import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { app, migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

const misrun = [{ type: "misrun", location: "thin-section", severity: 2 }];

describe("trends", () => {
  it("counts the shop's castings by superheat band, process, alloy and month, as counted by hand here", async () => {
    const { caster, mentor } = await shopWithCrew("Trends Shop");
    const other = await shopWithCrew("Trends Other Shop");
    // A356.0 liquidus 615 °C (alloy table): 640 °C is 25 °C of superheat, 700 °C is 85 °C.
    const cold = await newMelt(caster, {
      pouredOn: "2026-03-10",
      process: "green-sand",
      pourTempC: 640,
      meltTempC: 660,
    });
    const warm = await newMelt(caster, { pouredOn: "2026-04-02", process: "lost-foam", pourTempC: 700 });
    await newCasting(caster, cold.id, { outcome: "scrap", marks: misrun });
    await newCasting(caster, cold.id, { outcome: "good", marks: [] });
    await newCasting(caster, cold.id, { outcome: "rework", marks: misrun });
    await newCasting(caster, warm.id, { outcome: "good", marks: [] });
    // Another shop's defective casting must not enter any count.
    const theirs = await newMelt(other.caster, { pouredOn: "2026-03-11", process: "green-sand", pourTempC: 640 });
    await newCasting(other.caster, theirs.id, { outcome: "scrap", marks: misrun });

    const res = await mentor.agent.get("/api/trends");
    expect(res.status).toBe(200);
    expect(res.body.castings).toBe(4);
    // Hand count: under 40 °C, 2 of 3 defective; 60-100 °C, 0 of 1.
    expect(res.body.defectBySuperheat).toEqual([
      { key: "60-100 °C", castings: 1, count: 0 },
      { key: "under 40 °C", castings: 3, count: 2 },
    ]);
    expect(res.body.defectByProcess).toEqual([
      { key: "green-sand", castings: 3, count: 2 },
      { key: "lost-foam", castings: 1, count: 0 },
    ]);
    expect(res.body.defectByAlloy).toEqual([{ key: "A356.0", castings: 4, count: 2 }]);
    expect(res.body.scrapByMonth).toEqual([
      { key: "2026-03", castings: 3, count: 1 },
      { key: "2026-04", castings: 1, count: 0 },
    ]);
    expect(res.body.reworkByMonth[0]).toEqual({ key: "2026-03", castings: 3, count: 1 });

    const april = await caster.agent.get("/api/trends?from=2026-04-01&to=2026-04-30");
    expect(april.body.castings).toBe(1);
    const foam = await caster.agent.get("/api/trends?process=lost-foam&alloy=a356.0");
    expect(foam.body.defectByProcess).toEqual([{ key: "lost-foam", castings: 1, count: 0 }]);

    const theirView = await other.owner.agent.get("/api/trends");
    expect(theirView.body.castings).toBe(1);
  });

  it("refuses bad filters with a message per field, and strangers", async () => {
    const { caster } = await shopWithCrew("Trends Bad Shop");
    const bad = await caster.agent.get("/api/trends?from=2026-13-40&process=sandcastle&colour=blue");
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["from", "process"]));
    const backwards = await caster.agent.get("/api/trends?from=2026-05-01&to=2026-04-01");
    expect(backwards.body.error.fields.from).toMatch(/on or before/);
    expect((await request(app).get("/api/trends")).status).toBe(401);
  });
});
