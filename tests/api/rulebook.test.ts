import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { shopCauses, shopRules, shopRuleVersions } from "../../db/schema";
import type { RuleDraft, RuleVersion } from "../../lib/rulebook-schemas";
import { ruleChanges } from "../../rules/rule-diff";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

/** Flash on a part poured through a tall sprue: the metal's head lifts a cope that was not weighted. */
const draft: RuleDraft = {
  defectTypes: ["flash"],
  locations: [],
  conditions: [{ fact: "sprueHeightMm", comparison: "above", value: 250 }],
  cause: { kind: "new", title: "Cope lifted by the metal's head", fixes: ["Weight or clamp the cope before pouring"] },
  weight: 0.9,
  because: "A {sprueHeightMm} mm sprue pushes hard on the cope",
  sources: ["shop experience"],
};
const greenSand = { process: "green-sand" as const, pourTempC: 720, meltTempC: 740 };

async function flashCasting(p: Person, sprueHeightMm = 300, pouredOn = "2026-02-02") {
  const melt = await newMelt(p, { ...greenSand, pouredOn });
  return newCasting(p, melt.id, {
    partName: "Gear blank",
    sprueHeightMm,
    marks: [{ type: "flash", location: "side", severity: 2 }],
  });
}
const causesOf = async (p: Person, castingId: number) => {
  const res = await p.agent.post(`/api/diagnosis/castings/${castingId}`);
  expect(res.status).toBe(201);
  return res.body.result.causes as { id: string; because: string[]; record: { confirmed: number; right: number } }[];
};
const ruleCount = (shopId: string) => db.$count(shopRules, eq(shopRules.shopId, shopId));

describe("the rulebook's routes and roles", () => {
  it("lets every member read it, and only mentors and owners write, try, publish, retire and switch", async () => {
    const { shopId, caster, mentor, owner } = await shopWithCrew("Rulebook Roles");
    const list = await caster.agent.get("/api/rulebook");
    expect(list.status).toBe(200);
    expect(list.body.rules.length).toBeGreaterThan(100);
    expect(list.body.rules[0]).toMatchObject({
      source: "built-in",
      status: "built-in",
      inUse: true,
      record: null,
      factor: 1,
    });
    expect((await caster.agent.get(`/api/rulebook/rules/${list.body.rules[0].id}`)).status).toBe(200);

    const made = await mentor.agent.post("/api/rulebook/rules").send(draft);
    expect(made.status).toBe(201);
    const id = made.body.id as string;
    expect(id).toMatch(/^shop-\d+$/);
    const tries = [
      caster.agent.post("/api/rulebook/rules").send(draft),
      caster.agent.put(`/api/rulebook/rules/${id}`).send(draft),
      caster.agent.post(`/api/rulebook/rules/${id}/publish`),
      caster.agent.post(`/api/rulebook/rules/${id}/retire`),
      caster.agent.put("/api/rulebook/rules/h2-no-degassing/switch").send({ off: true }),
      caster.agent.post("/api/rulebook/try").send({ draft }),
    ];
    for (const res of await Promise.all(tries)) expect(res.status).toBe(403);
    expect(await ruleCount(shopId)).toBe(1);
    expect((await owner.agent.post(`/api/rulebook/rules/${id}/publish`)).status).toBe(200);
    expect((await owner.agent.post("/api/rulebook/try").send({ draft })).status).toBe(200);
  });

  it("answers 404 for another shop's rule, whoever asks", async () => {
    const a = await shopWithCrew("Rulebook Home");
    const b = await shopWithCrew("Rulebook Away");
    const theirs = (await b.mentor.agent.post("/api/rulebook/rules").send(draft)).body.id;
    for (const res of await Promise.all([
      a.caster.agent.get(`/api/rulebook/rules/${theirs}`),
      a.mentor.agent.put(`/api/rulebook/rules/${theirs}`).send(draft),
      a.mentor.agent.post(`/api/rulebook/rules/${theirs}/publish`),
      a.owner.agent.post(`/api/rulebook/rules/${theirs}/retire`),
      a.mentor.agent.post("/api/rulebook/try").send({ draft, ruleId: theirs }),
      a.mentor.agent.get("/api/rulebook/rules/no-such-rule"),
      a.mentor.agent.put(`/api/rulebook/rules/${theirs}/switch`).send({ off: true }), // only built-ins switch
    ]))
      expect(res.status).toBe(404);
    const listed = (await a.mentor.agent.get("/api/rulebook")).body.rules.map((r: { id: string }) => r.id);
    expect(listed).not.toContain(theirs);
    // Their new cause is theirs alone.
    const titles = (await a.mentor.agent.get("/api/rulebook")).body.causes.map((c: { title: string }) => c.title);
    expect(titles).not.toContain("Cope lifted by the metal's head");
    expect((await b.caster.agent.get("/api/rulebook")).body.causes.map((c: { title: string }) => c.title)).toContain(
      "Cope lifted by the metal's head",
    );
  });

  it("refuses bad rules with a message per field and stores nothing", async () => {
    const { shopId, mentor } = await shopWithCrew("Rulebook Bad Input");
    const empty = await mentor.agent.post("/api/rulebook/rules").send({});
    expect(empty.status).toBe(400);
    expect(Object.keys(empty.body.error.fields).sort()).toEqual([
      "because",
      "cause",
      "conditions",
      "defectTypes",
      "sources",
      "weight",
    ]);
    const cases: [Partial<RuleDraft>, string, RegExp][] = [
      [
        { conditions: [{ fact: "pourTemp", comparison: "below", value: 700 }] },
        "conditions.0.fact",
        /not something the rulebook knows/,
      ],
      [
        { conditions: [{ fact: "fluxed", comparison: "below", value: 3 }] },
        "conditions.0.comparison",
        /does not fit flux used/,
      ],
      [{ cause: { kind: "existing", id: "" } }, "cause.id", /choose a cause/],
      [{ cause: { kind: "existing", id: "no-such-cause" } }, "cause.id", /not a cause in this rulebook/],
      [{ weight: 1.5 }, "weight", /at most 1/],
      [{ because: "see {nothing}" }, "because", /fact name/],
    ];
    for (const [change, field, message] of cases) {
      const res = await mentor.agent.post("/api/rulebook/rules").send({ ...draft, ...change });
      expect(res.status, field).toBe(400);
      expect(res.body.error.fields[field]).toMatch(message);
    }
    const malformed = await mentor.agent
      .post("/api/rulebook/rules")
      .set("Content-Type", "application/json")
      .send("{oops");
    expect(malformed.status).toBe(400);
    expect(await ruleCount(shopId)).toBe(0);
    expect(await db.$count(shopCauses, eq(shopCauses.shopId, shopId))).toBe(0);
  });

  it("keeps a rule that can never fire as a draft, with a warning, and refuses to publish it", async () => {
    const { mentor } = await shopWithCrew("Rulebook Impossible");
    const never = {
      ...draft,
      conditions: [
        { fact: "pourTempC", comparison: "below", value: 600 },
        { fact: "pourTempC", comparison: "above", value: 700 },
      ],
    };
    const made = await mentor.agent.post("/api/rulebook/rules").send(never);
    expect(made.status).toBe(201);
    expect(made.body.warnings[0].message).toMatch(/below 600 °C and pour temperature is above 700 °C/);
    const pub = await mentor.agent.post(`/api/rulebook/rules/${made.body.id}/publish`);
    expect(pub.status).toBe(400);
    expect(pub.body.error.fields.conditions).toMatch(/never all be true/);
    const trial = await mentor.agent.post("/api/rulebook/try").send({ draft: never });
    expect(trial.body.contradictions).toHaveLength(1);
  });
});

describe("shop rules in diagnoses", () => {
  it("a published rule changes the diagnosis; a draft does not; a retired one no longer fires", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Rulebook Diagnosis");
    const casting = await flashCasting(caster);
    const before = await causesOf(caster, casting.id);
    expect(before.map((c) => c.id)).not.toContain("shop-cope-lifted-by-the-metal-s-head");

    const made = await mentor.agent.post("/api/rulebook/rules").send(draft);
    const id = made.body.id;
    expect(made.body).toMatchObject({
      status: "draft",
      inUse: false,
      cause: { id: "shop-cope-lifted-by-the-metal-s-head" },
    });
    expect((await causesOf(caster, casting.id)).map((c) => c.id)).toEqual(before.map((c) => c.id));

    const pub = await mentor.agent.post(`/api/rulebook/rules/${id}/publish`);
    expect(pub.body).toMatchObject({ status: "published", inUse: true });
    const after = await causesOf(caster, casting.id);
    expect(after[0].id).toBe("shop-cope-lifted-by-the-metal-s-head");
    expect(after[0].because).toContain("A 300 mm sprue pushes hard on the cope");
    expect((await mentor.agent.post(`/api/rulebook/rules/${id}/publish`)).status).toBe(409);

    // A changed draft on top of the published version changes nothing until it is published.
    await mentor.agent.put(`/api/rulebook/rules/${id}`).send({
      ...draft,
      conditions: [{ fact: "sprueHeightMm", comparison: "above", value: 400 }],
      cause: { kind: "existing", id: after[0].id },
    });
    expect((await causesOf(caster, casting.id))[0].id).toBe(after[0].id);

    expect((await mentor.agent.post(`/api/rulebook/rules/${id}/retire`)).body).toMatchObject({
      status: "retired",
      inUse: false,
    });
    expect((await causesOf(caster, casting.id)).map((c) => c.id)).not.toContain(after[0].id);
    expect((await mentor.agent.post(`/api/rulebook/rules/${id}/retire`)).status).toBe(409);

    const versions = await db
      .select()
      .from(shopRuleVersions)
      .where(and(eq(shopRuleVersions.shopId, shopId)))
      .orderBy(shopRuleVersions.version);
    expect(versions.map((v) => [v.version, v.status])).toEqual([
      [1, "draft"],
      [2, "published"],
      [3, "draft"],
      [4, "retired"],
    ]);
  });

  it("keeps every version with who and when, and the differences read plainly", async () => {
    const { caster, mentor, owner } = await shopWithCrew("Rulebook Versions");
    const id = (await mentor.agent.post("/api/rulebook/rules").send(draft)).body.id;
    const causeId = (await caster.agent.get(`/api/rulebook/rules/${id}`)).body.cause.id;
    await owner.agent.put(`/api/rulebook/rules/${id}`).send({
      ...draft,
      cause: { kind: "existing", id: causeId },
      weight: 0.7,
      sources: ["shop experience", "Pattern shop notes"],
    });
    await mentor.agent.post(`/api/rulebook/rules/${id}/publish`);
    const detail = await caster.agent.get(`/api/rulebook/rules/${id}`);
    const versions = detail.body.versions as RuleVersion[];
    expect(versions.map((v) => [v.version, v.status, v.createdBy?.id])).toEqual([
      [3, "published", mentor.userId],
      [2, "draft", owner.userId],
      [1, "draft", mentor.userId],
    ]);
    for (const v of versions) expect(Date.parse(v.createdAt)).toBeGreaterThan(Date.now() - 60_000);
    const [v3, v2, v1] = versions;
    expect(ruleChanges(v1, v2)).toEqual(["Weight: 0.9 → 0.7", "Source added: Pattern shop notes"]);
    expect(ruleChanges(v2, v3)).toEqual(["Published: now used in every diagnosis here"]);
  });

  it("switches a built-in rule off for this shop only, and back on", async () => {
    const a = await shopWithCrew("Switch Home");
    const b = await shopWithCrew("Switch Away");
    const gas = {
      defects: [{ type: "gas-porosity" }],
      alloy: "A356.0",
      process: "green-sand",
      pourTempC: 720,
      degassing: "none",
    };
    const reasons = async (p: Person) =>
      (await p.agent.post("/api/diagnosis").send(gas)).body.causes.flatMap((c: { because: string[] }) => c.because);
    expect(await reasons(a.caster)).toContain("The melt was not degassed");
    const off = await a.mentor.agent.put("/api/rulebook/rules/h2-no-degassing/switch").send({ off: true });
    expect(off.body).toMatchObject({
      switchedOff: true,
      inUse: false,
      switches: [{ off: true, createdBy: { id: a.mentor.userId } }],
    });
    expect(await reasons(a.caster)).not.toContain("The melt was not degassed");
    expect(await reasons(b.caster)).toContain("The melt was not degassed");
    expect((await a.mentor.agent.put("/api/rulebook/rules/h2-no-degassing/switch").send({ off: "maybe" })).status).toBe(
      400,
    );
    await a.owner.agent.put("/api/rulebook/rules/h2-no-degassing/switch").send({ off: false });
    expect(await reasons(a.caster)).toContain("The melt was not degassed");
  });
});

describe("trying a rule and learning from confirmed cases", () => {
  it("tries a draft on the shop's past cases and lists the cases whose top cause it changes", async () => {
    const { caster, mentor } = await shopWithCrew("Rulebook Trial");
    const tall = await flashCasting(caster, 300, "2026-02-01");
    const short = await flashCasting(caster, 120, "2026-02-02");
    const confirmed = await flashCasting(caster, 320, "2026-02-03");
    const topBefore = (await causesOf(caster, confirmed.id))[0].id;
    await mentor.agent.post(`/api/review/castings/${confirmed.id}/confirmations`).send({ causeId: topBefore });
    const res = await mentor.agent.post("/api/rulebook/try").send({ draft });
    expect(res.status).toBe(200);
    // Fires on the two tall sprues; the confirmed one was something else, so it does not agree.
    expect(res.body).toMatchObject({
      cases: 3,
      fired: 2,
      firedConfirmed: 1,
      agreed: 0,
      confirmedCases: 1,
      topRightBefore: 1,
      topRightAfter: 0,
    });
    const changed = res.body.changed as {
      castingId: number;
      verdict: string;
      after: { title: string };
      confirmed: { id: string } | null;
    }[];
    expect(changed.map((c) => [c.castingId, c.verdict]).sort()).toEqual(
      [
        [confirmed.id, "now-wrong"],
        [tall.id, "unconfirmed"],
      ].sort(),
    );
    expect(changed.every((c) => c.after.title === "Cope lifted by the metal's head")).toBe(true);
    expect(res.body.causeTitles[topBefore]).toBeDefined();
    expect(changed.map((c) => c.castingId)).not.toContain(short.id);
  });

  it("shows each rule's and cause's record here and moves weights with it", async () => {
    const { caster, mentor } = await shopWithCrew("Rulebook Learning");
    const id = (await mentor.agent.post("/api/rulebook/rules").send(draft)).body.id;
    await mentor.agent.post(`/api/rulebook/rules/${id}/publish`);
    const cause = "shop-cope-lifted-by-the-metal-s-head";
    const scores: number[] = [];
    for (const day of ["2026-03-01", "2026-03-02", "2026-03-03"]) {
      const c = await flashCasting(caster, 300, day);
      const top = (await causesOf(caster, c.id))[0] as unknown as { id: string; score: number; record: object };
      scores.push(top.score);
      expect(top.id).toBe(cause);
      expect(
        (await mentor.agent.post(`/api/review/castings/${c.id}/confirmations`).send({ causeId: cause })).status,
      ).toBe(201);
    }
    const latest = await flashCasting(caster, 300, "2026-03-04");
    const [top] = await causesOf(caster, latest.id);
    expect(top.record).toEqual({ confirmed: 3, right: 3 });
    expect((top as unknown as { score: number }).score).toBeGreaterThan(scores[0]);
    const row = (await caster.agent.get("/api/rulebook")).body.rules.find((r: { id: string }) => r.id === id);
    expect(row.record).toEqual({ fired: 3, agreed: 3 });
    expect(row.factor).toBeCloseTo(0.5 + 5 / 7, 10); // (3 + 2) / (3 + 4)
  });
});

describe("simultaneous saves of one rule", () => {
  it("gives every save its own version number, none answering 500", async () => {
    const { mentor, owner } = await shopWithCrew("Rule Race Shop");
    const id = (await mentor.agent.post("/api/rulebook/rules").send(draft)).body.id as string;
    const saves = await Promise.all(
      Array.from({ length: 8 }, (_, i) =>
        (i % 2 ? owner : mentor).agent.put(`/api/rulebook/rules/${id}`).send({ ...draft, weight: 0.5 + i / 20 }),
      ),
    );
    expect(saves.map((s) => s.status)).toEqual(Array(8).fill(200));
    const detail = await mentor.agent.get(`/api/rulebook/rules/${id}`);
    const numbers = detail.body.versions
      .map((v: { version: number }) => v.version)
      .sort((a: number, b: number) => a - b);
    expect(numbers).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
  });
});
