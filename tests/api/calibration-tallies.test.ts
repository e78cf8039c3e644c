import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { confirmations, defectMarks, melts } from "../../db/schema";
import { db } from "../../server/db";
import { refreshCalibration } from "../../server/rulebook/calibration";
import { shopLearning, shopRules } from "../../server/rulebook/context";
import { confirm, expectSameAsRecomputed } from "./calibration-check";
import { migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

describe("the calibration kept case by case", () => {
  it("equals a full recomputation after confirmations, corrections, edits and confirmations taken back", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Tally Shop");
    const cold = await newMelt(caster); // 85 °C superheat into lost foam: the cold-pour misrun rules fire
    const hot = await newMelt(caster, { pourTempC: 780, meltTempC: 800 });
    const misrun = [{ type: "misrun", location: "far-from-gate", severity: 3 }];
    const gas = [{ type: "gas-porosity", location: "throughout", severity: 2 }];
    const c = [
      await newCasting(caster, cold.id, { marks: misrun }),
      await newCasting(caster, cold.id, { marks: misrun }),
      await newCasting(caster, hot.id, { marks: misrun }),
      await newCasting(caster, hot.id, { marks: gas }),
      await newCasting(caster, cold.id, { marks: [] }), // confirmed without marks: counts nothing
    ].map((x) => x.id);

    await expectSameAsRecomputed(shopId, "no confirmations");
    await confirm(mentor, c[0], { causeId: "cold-pour" });
    await confirm(mentor, c[1], { causeId: "cold-pour" });
    await confirm(mentor, c[2], { causeId: "turbulent-fill" });
    await confirm(mentor, c[3], { causeId: "hydrogen-pickup" });
    await confirm(mentor, c[4], { causeId: "cold-pour" });
    const first = await expectSameAsRecomputed(shopId, "four confirmed with marks");
    expect(first.confirmedCases).toBe(4);
    expect(first.ruleRecords.size).toBeGreaterThan(0);
    expect(first.causeRecords.get("cold-pour")?.right).toBeGreaterThan(0);

    // The confirmation's own request worked its case out: nothing is left for the next diagnosis.
    const rules = await shopRules(shopId);
    expect((await refreshCalibration(shopId, rules)).rows).toBe(0);

    await confirm(mentor, c[1], { causeId: "turbulent-fill" }); // a correction: the newest counts
    await expectSameAsRecomputed(shopId, "a correction");
    await confirm(mentor, c[2], { causeText: "Ladle lip froze over" }); // words: neither hit nor miss
    expect((await expectSameAsRecomputed(shopId, "words")).confirmedCases).toBe(3);

    // Writes outside the review routes: each marks only its castings' rows, worked out at the next diagnosis.
    await db.update(melts).set({ pourTempC: 790, meltTempC: 810 }).where(eq(melts.id, cold.id));
    expect((await refreshCalibration(shopId, rules)).rows).toBe(3); // c0, c1 and c4 were poured from that melt
    await expectSameAsRecomputed(shopId, "a melt made hotter");
    await db.insert(defectMarks).values({
      shopId,
      castingId: c[4],
      type: "misrun",
      location: "edge",
      severity: 2,
      createdBy: caster.userId,
    });
    await expectSameAsRecomputed(shopId, "marks on the unmarked one");
    await db.delete(confirmations).where(and(eq(confirmations.shopId, shopId), eq(confirmations.castingId, c[0])));
    const back = await expectSameAsRecomputed(shopId, "a confirmation taken back");
    await db.insert(confirmations).values({ shopId, castingId: c[0], causeId: "cold-pour", createdBy: mentor.userId });
    expect((await refreshCalibration(shopId, rules)).rows).toBe(1);
    expect((await expectSameAsRecomputed(shopId, "confirmed again")).confirmedCases).toBe(back.confirmedCases + 1);

    // A new shop cause changes the rule set: every row is worked out again, once.
    await confirm(mentor, c[3], { causeText: "Wet ladle", makeShopCause: true, newCauseFix: "Dry the ladle" });
    await expectSameAsRecomputed(shopId, "a new shop cause");
    expect((await refreshCalibration(shopId, await shopRules(shopId))).rows).toBe(0);
  });

  it("keeps each shop's tallies to itself", async () => {
    const a = await shopWithCrew("Tally A");
    const b = await shopWithCrew("Tally B");
    const cast = await newCasting(a.caster, (await newMelt(a.caster)).id, {
      marks: [{ type: "misrun", location: "top", severity: 3 }],
    });
    await confirm(a.mentor, cast.id, { causeId: "cold-pour" });
    expect((await shopLearning(a.shopId)).confirmedCases).toBe(1);
    expect((await shopLearning(b.shopId)).confirmedCases).toBe(0);
    const other = await b.mentor.agent
      .post(`/api/review/castings/${cast.id}/confirmations`)
      .send({ causeId: "cold-pour" });
    expect(other.status).toBe(404);
    expect((await shopLearning(a.shopId)).confirmedCases).toBe(1);
  });
});
