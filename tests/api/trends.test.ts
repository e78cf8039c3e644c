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

  it("counts fixes tried by how the next casting came out, and each casting's newest confirmed cause once", async () => {
    const { caster, mentor } = await shopWithCrew("Trends Fix Shop");
    const other = await shopWithCrew("Trends Fix Other Shop");
    const march = await newMelt(caster, { pouredOn: "2026-03-10", process: "green-sand", pourTempC: 640 });
    const may = await newMelt(caster, { pouredOn: "2026-05-10", process: "green-sand", pourTempC: 700 });
    const [a, b, c] = [
      await newCasting(caster, march.id, { outcome: "scrap", marks: misrun }),
      await newCasting(caster, march.id, { outcome: "scrap", marks: misrun }),
      await newCasting(caster, may.id, { outcome: "rework", marks: misrun }),
    ];
    // Whether a fix worked is read off the next casting of the part, from a later melt.
    const june = await newMelt(caster, { pouredOn: "2026-06-10", process: "green-sand", pourTempC: 720 });
    const next = await newCasting(caster, june.id, { outcome: "good", marks: [] });
    const tryFix = async (castingId: number, fix: string, worked?: string) => {
      const f = await caster.agent
        .post(`/api/followups/castings/${castingId}/fixes`)
        .send(worked ? { fix, nextCastingId: next.id, worked } : { fix });
      expect(f.status).toBe(201);
    };
    await tryFix(a.id, "Pour hotter", "yes");
    await tryFix(b.id, "Pour hotter", "no");
    await tryFix(c.id, "Pour hotter");
    await tryFix(c.id, "Widen the ingates", "partly");
    const confirm = (castingId: number, body: object) =>
      mentor.agent.post(`/api/review/castings/${castingId}/confirmations`).send(body);
    expect((await confirm(a.id, { causeId: "cold-pour" })).status).toBe(201);
    await confirm(b.id, { causeText: "Ladle lip froze over" });
    await confirm(b.id, { causeId: "cold-pour" }); // the newest word on b replaces the first
    await confirm(c.id, { causeText: "Ladle lip froze over" });
    // Another shop's fix and confirmation must not enter the counts.
    const theirMelt = await newMelt(other.caster, { pouredOn: "2026-03-11", process: "green-sand", pourTempC: 640 });
    const theirs = await newCasting(other.caster, theirMelt.id, { outcome: "scrap", marks: misrun });
    await other.caster.agent.post(`/api/followups/castings/${theirs.id}/fixes`).send({ fix: "Pour hotter" });
    await other.mentor.agent.post(`/api/review/castings/${theirs.id}/confirmations`).send({ causeId: "cold-pour" });

    const all = (await caster.agent.get("/api/trends")).body;
    // Hand count: "Pour hotter" tried 3 times, worked 1, failed 1, 1 not judged; "Widen the ingates" once, partly.
    expect(all.fixes).toEqual([
      { fix: "Pour hotter", tried: 3, worked: 1, partly: 0, failed: 1, notJudged: 1 },
      { fix: "Widen the ingates", tried: 1, worked: 0, partly: 1, failed: 0, notJudged: 0 },
    ]);
    expect(all.confirmedCauses).toHaveLength(2);
    expect(all.confirmedCauses[0]).toMatchObject({ causeId: "cold-pour", castings: 2 });
    expect(all.confirmedCauses[0].title).toMatch(/cold/i);
    expect(all.confirmedCauses[1]).toEqual({ causeId: null, title: "Ladle lip froze over", castings: 1 });
    // The filters narrow these charts too: only May's casting.
    const mayOnly = (await caster.agent.get("/api/trends?from=2026-05-01")).body;
    expect(mayOnly.fixes.map((f: { fix: string; tried: number }) => [f.fix, f.tried])).toEqual([
      ["Pour hotter", 1],
      ["Widen the ingates", 1],
    ]);
    expect(mayOnly.confirmedCauses).toEqual([{ causeId: null, title: "Ladle lip froze over", castings: 1 }]);
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
