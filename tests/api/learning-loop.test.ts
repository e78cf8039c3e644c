import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { confirmations, shopCauses } from "../../db/schema";
import type { DiagnosisFreshness, DiagnosisSnapshot } from "../../lib/notebook-schemas";
import type { CaseReview, CastingCauses } from "../../lib/review-schemas";
import type { Rulebook } from "../../lib/rulebook-schemas";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

const misrun = [{ type: "misrun" as const, location: "far-from-gate" as const, severity: 3 }];
const builtIn = (id: string) => BUILT_IN_RULE_SET.causes.find((c) => c.id === id)!;
const confirm = (p: Person, castingId: number, body: object) =>
  p.agent.post(`/api/review/castings/${castingId}/confirmations`).send(body);
const freshness = async (p: Person, castingId: number) =>
  (await p.agent.get(`/api/diagnosis/castings/${castingId}/freshness`)).body as DiagnosisFreshness;
const recordOf = async (p: Person, ruleId: string) =>
  ((await p.agent.get("/api/rulebook")).body as Rulebook).rules.find((r) => r.id === ruleId)?.record ?? null;

describe("confirming any cause of the rulebook", () => {
  it("lists every built-in and shop cause with the fixes for the casting's metal, to any member", async () => {
    const { caster } = await shopWithCrew("Loop Causes");
    const al = await newCasting(caster, (await newMelt(caster)).id, { marks: misrun });
    const bronze = await newMelt(caster, { alloy: "C83600", process: "green-sand", meltTempC: 1230, pourTempC: 1180 });
    const cu = await newCasting(caster, bronze.id, { marks: misrun });
    const res = await caster.agent.get(`/api/review/castings/${al.id}/causes`);
    expect(res.status).toBe(200);
    const causes = (res.body as CastingCauses).causes;
    expect(causes).toHaveLength(BUILT_IN_RULE_SET.causes.length);
    // hydrogen-pickup carries aluminium-only practice (rules/kb/gas.json): shown for A356, not for C83600.
    const h = builtIn("hydrogen-pickup");
    expect(causes.find((c) => c.id === h.id)?.fixes).toEqual([...h.fixes, ...h.fixesByMetal!.aluminium!]);
    const copper = ((await caster.agent.get(`/api/review/castings/${cu.id}/causes`)).body as CastingCauses).causes;
    expect(copper.find((c) => c.id === h.id)?.fixes).toEqual(h.fixes);
  });

  it("confirms a cause the diagnosis did not list, and the rules that fired are scored against it", async () => {
    const { caster, mentor } = await shopWithCrew("Loop Unlisted");
    const c = await newCasting(caster, (await newMelt(caster)).id, { marks: misrun });
    const snap = (await caster.agent.post(`/api/diagnosis/castings/${c.id}`)).body as DiagnosisSnapshot;
    const listed = new Set(snap.result.causes.map((x) => x.id));
    const unlisted = BUILT_IN_RULE_SET.causes.find((x) => !listed.has(x.id))!;
    // The cold lost-foam misrun fires the cold-pour rules; none of them is scored before a confirmation.
    const coldRule = BUILT_IN_RULE_SET.rules.find((r) => r.cause === "cold-pour" && r.explains[0].type === "misrun")!;
    expect(await recordOf(mentor, coldRule.id)).toBeNull();

    const ok = await confirm(mentor, c.id, { causeId: unlisted.id });
    expect(ok.status).toBe(201);
    expect((ok.body as CaseReview).current).toMatchObject({ causeId: unlisted.id, causeTitle: unlisted.title });
    const rec = await recordOf(mentor, coldRule.id);
    expect(rec?.fired).toBeGreaterThanOrEqual(1);
    expect(rec?.agreed).toBe(0);
  });

  it("does not count words that name no rulebook cause against the rules that fired", async () => {
    const { caster, mentor } = await shopWithCrew("Loop Words");
    const c = await newCasting(caster, (await newMelt(caster)).id, { marks: misrun });
    const coldRule = BUILT_IN_RULE_SET.rules.find((r) => r.cause === "cold-pour" && r.explains[0].type === "misrun")!;
    const typed = await confirm(mentor, c.id, { causeText: "Ladle lip froze over" });
    expect((typed.body as CaseReview).current).toMatchObject({ causeId: null, causeTitle: "Ladle lip froze over" });
    expect(await recordOf(mentor, coldRule.id)).toBeNull();
    // The title of a rulebook cause typed as words is stored as that cause, and counts.
    const title = builtIn("cold-pour").title.toUpperCase();
    const named = await confirm(mentor, c.id, { causeText: title });
    expect((named.body as CaseReview).current).toMatchObject({ causeId: "cold-pour" });
    const rec = await recordOf(mentor, coldRule.id);
    expect(rec).toEqual({ fired: rec!.fired, agreed: rec!.fired });
  });

  it("adds a named cause to the shop's rulebook when asked, with its fix", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Loop New Cause");
    const c = await newCasting(caster, (await newMelt(caster)).id, { marks: misrun });
    const res = await confirm(mentor, c.id, {
      causeText: "Ladle lip froze over",
      makeShopCause: true,
      newCauseFix: "Preheat the ladle lip with the torch",
    });
    expect(res.status).toBe(201);
    expect((res.body as CaseReview).current).toMatchObject({
      causeId: "shop-ladle-lip-froze-over",
      causeTitle: "Ladle lip froze over",
    });
    const causes = ((await caster.agent.get(`/api/review/castings/${c.id}/causes`)).body as CastingCauses).causes;
    expect(causes.find((x) => x.id === "shop-ladle-lip-froze-over")).toEqual({
      id: "shop-ladle-lip-froze-over",
      title: "Ladle lip froze over",
      fixes: ["Preheat the ladle lip with the torch"],
      fixTemplates: ["Preheat the ladle lip with the torch"],
      shop: true,
    });
    // Adding the same words again confirms the cause already there instead of a second one.
    const again = await confirm(mentor, c.id, {
      causeText: "ladle lip froze over",
      makeShopCause: true,
      newCauseFix: "x",
    });
    expect((again.body as CaseReview).current?.causeId).toBe("shop-ladle-lip-froze-over");
    expect(await db.$count(shopCauses, eq(shopCauses.shopId, shopId))).toBe(1);
  });

  it("refuses casters, other shops and a new cause without its fix, storing nothing", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Loop Refusals");
    const away = await shopWithCrew("Loop Away");
    const c = await newCasting(caster, (await newMelt(caster)).id, { marks: misrun });
    expect((await confirm(caster, c.id, { causeId: "cold-pour" })).status).toBe(403);
    expect((await confirm(away.mentor, c.id, { causeId: "cold-pour" })).status).toBe(404);
    expect((await away.caster.agent.get(`/api/review/castings/${c.id}/causes`)).status).toBe(404);
    expect((await away.caster.agent.get(`/api/diagnosis/castings/${c.id}/freshness`)).status).toBe(404);
    const noFix = await confirm(mentor, c.id, { causeText: "Ladle lip froze over", makeShopCause: true });
    expect(noFix.status).toBe(400);
    expect(noFix.body.error.fields.newCauseFix).toMatch(/fix/);
    const noName = await confirm(mentor, c.id, { makeShopCause: true, newCauseFix: "Preheat" });
    expect(noName.status).toBe(400);
    expect(noName.body.error.fields.causeText).toMatch(/name/);
    const notBool = await confirm(mentor, c.id, { causeText: "x", makeShopCause: "yes", newCauseFix: "y" });
    expect(notBool.status).toBe(400);
    expect(await db.$count(confirmations, eq(confirmations.shopId, shopId))).toBe(0);
    expect(await db.$count(shopCauses, eq(shopCauses.shopId, shopId))).toBe(0);
  });
});

describe("a diagnosis whose marks or conditions changed", () => {
  it("is stale after the pour temperature changes, not after a field the rules never read", async () => {
    const { caster, mentor } = await shopWithCrew("Loop Stale");
    const melt = await newMelt(caster, { pourTempC: 760, meltTempC: 780 });
    const c = await newCasting(caster, melt.id, { marks: misrun });
    expect(await freshness(caster, c.id)).toEqual({ snapshotId: null, stale: false, changed: [] });
    const snap = (await caster.agent.post(`/api/diagnosis/castings/${c.id}`)).body as DiagnosisSnapshot;
    expect(await freshness(caster, c.id)).toEqual({ snapshotId: snap.id, stale: false, changed: [] });

    // Notes, the furnace and the part name are not part of the case the diagnosis reads.
    expect(
      (await caster.agent.patch(`/api/melts/${melt.id}`).send({ notes: "Pot relined", furnace: "Pot #3" })).status,
    ).toBe(200);
    expect((await caster.agent.patch(`/api/castings/${c.id}`).send({ partName: "Ribbed lid" })).status).toBe(200);
    expect(await freshness(mentor, c.id)).toEqual({ snapshotId: snap.id, stale: false, changed: [] });

    expect((await caster.agent.patch(`/api/melts/${melt.id}`).send({ pourTempC: 730 })).status).toBe(200);
    expect(await freshness(mentor, c.id)).toEqual({ snapshotId: snap.id, stale: true, changed: ["pourTempC"] });
    // The old answer stays readable on the casting page until it is worked out again.
    const page = (await caster.agent.get(`/api/castings/${c.id}`)).body as { diagnosis: DiagnosisSnapshot };
    expect(page.diagnosis.id).toBe(snap.id);

    // Back to 760 °C, it fits again: what counts is what the diagnosis read, not when things changed.
    await caster.agent.patch(`/api/melts/${melt.id}`).send({ pourTempC: 760 });
    expect((await freshness(mentor, c.id)).stale).toBe(false);
  });

  it("is stale after the marks change, and fresh once worked out again", async () => {
    const { caster } = await shopWithCrew("Loop Marks");
    const melt = await newMelt(caster);
    const c = await newCasting(caster, melt.id, { marks: misrun });
    await caster.agent.post(`/api/diagnosis/castings/${c.id}`);
    const marks = (await caster.agent.get(`/api/castings/${c.id}`)).body.marks as { id: number }[];
    const changed = await caster.agent.patch(`/api/marks/${marks[0].id}`).send({ severity: 1 });
    expect(changed.status).toBe(200);
    expect(await freshness(caster, c.id)).toMatchObject({ stale: true, changed: ["defects"] });
    const again = (await caster.agent.post(`/api/diagnosis/castings/${c.id}`)).body as DiagnosisSnapshot;
    expect(await freshness(caster, c.id)).toEqual({ snapshotId: again.id, stale: false, changed: [] });
  });
});

describe("fixes to try, ticked on the casting", () => {
  it("keeps the ticks with the casting for everyone in the shop, once each, and takes them off", async () => {
    const { caster, mentor } = await shopWithCrew("Loop Ticks");
    const away = await shopWithCrew("Loop Ticks Away");
    const c = await newCasting(caster, (await newMelt(caster)).id, { marks: misrun });
    const tick = (p: Person, body: object) => p.agent.put(`/api/followups/castings/${c.id}/ticks`).send(body);
    expect((await tick(caster, { fix: "Pour hotter", ticked: true })).body).toEqual({ ticked: ["Pour hotter"] });
    expect((await tick(mentor, { fix: "Pour hotter", ticked: true })).body).toEqual({ ticked: ["Pour hotter"] });
    await tick(caster, { fix: "Shorten the pour", ticked: true });
    const seen = await mentor.agent.get(`/api/followups/castings/${c.id}`);
    expect(seen.body.ticked).toEqual(["Pour hotter", "Shorten the pour"]);
    expect((await tick(mentor, { fix: "Pour hotter", ticked: false })).body).toEqual({ ticked: ["Shorten the pour"] });

    expect((await tick(away.caster, { fix: "Pour hotter", ticked: true })).status).toBe(404);
    for (const bad of [{ fix: "", ticked: true }, { fix: "Pour hotter" }, { fix: "x".repeat(501), ticked: true }]) {
      const res = await tick(caster, bad);
      expect(res.status).toBe(400);
    }
    expect((await caster.agent.get(`/api/followups/castings/${c.id}`)).body.ticked).toEqual(["Shorten the pour"]);
  });
});

describe("a fix recorded from several suggestions", () => {
  it("takes the longest rulebook fixes chosen together, and still refuses an endless one", async () => {
    const { caster } = await shopWithCrew("Loop Long Fix");
    const c = await newCasting(caster, (await newMelt(caster)).id, { marks: misrun });
    const longest = BUILT_IN_RULE_SET.causes
      .flatMap((x) => [...x.fixes, ...Object.values(x.fixesByMetal ?? {}).flat()])
      .sort((a, b) => b.length - a.length)
      .slice(0, 4);
    const ok = await caster.agent.post(`/api/followups/castings/${c.id}/fixes`).send({ fix: longest.join("; ") });
    expect(ok.status).toBe(201);
    const endless = await caster.agent.post(`/api/followups/castings/${c.id}/fixes`).send({ fix: "x".repeat(2001) });
    expect(endless.status).toBe(400);
  });
});
