import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "../../server/db";
import { confirmations, fixesTried, reviewRequests } from "../../db/schema";
import type { CaseReview, Followups, QueueItem } from "../../lib/review-schemas";
import { migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

const misrun = [{ type: "misrun" as const, location: "far-from-gate" as const, severity: 3 }];

describe("review: asking, the queue and confirming a cause", () => {
  it("a caster asks, mentors see the oldest first, a mentor confirms and the case leaves the queue", async () => {
    const { caster, mentor, owner } = await shopWithCrew("Review Shop");
    const melt = await newMelt(caster);
    const first = await newCasting(caster, melt.id, { marks: misrun });
    const second = await newCasting(caster, melt.id, { partName: "Second plate", marks: misrun });
    await caster.agent.post(`/api/diagnosis/castings/${first.id}`);

    const asked = await caster.agent
      .post(`/api/review/castings/${first.id}/requests`)
      .send({ note: "Corner never filled" });
    expect(asked.status).toBe(201);
    expect((asked.body as CaseReview).waiting).toMatchObject({
      note: "Corner never filled",
      createdBy: { id: caster.userId },
    });
    // Asking again while it waits keeps one request.
    expect((await caster.agent.post(`/api/review/castings/${first.id}/requests`).send({})).status).toBe(200);
    expect((await mentor.agent.post(`/api/review/castings/${second.id}/requests`).send({})).status).toBe(201);

    expect((await caster.agent.get("/api/review/queue")).status).toBe(403);
    const queue = (await mentor.agent.get("/api/review/queue")).body.items as QueueItem[];
    expect(queue.map((q) => q.castingId)).toEqual([first.id, second.id]);
    expect(queue[0]).toMatchObject({
      partName: "Ribbed cover plate",
      defectTypes: ["misrun"],
      askedBy: { id: caster.userId },
      topCause: { id: "cold-pour" },
    });
    expect(queue[1].topCause).toBeNull(); // never diagnosed

    const denied = await caster.agent
      .post(`/api/review/castings/${first.id}/confirmations`)
      .send({ causeId: "cold-pour" });
    expect(denied.status).toBe(403);
    const ok = await mentor.agent
      .post(`/api/review/castings/${first.id}/confirmations`)
      .send({ causeId: "cold-pour", note: "Pot sat too long" });
    expect(ok.status).toBe(201);
    const review = ok.body as CaseReview;
    expect(review.waiting).toBeNull();
    expect(review.current).toMatchObject({
      causeId: "cold-pour",
      note: "Pot sat too long",
      createdBy: { id: mentor.userId },
    });
    expect(review.current?.causeTitle).toMatch(/cold/i);
    expect(((await owner.agent.get("/api/review/queue")).body.items as QueueItem[]).map((q) => q.castingId)).toEqual([
      second.id,
    ]);

    // A cause the rulebook lacks, in words; the newest confirmation is the one that counts.
    const other = await owner.agent
      .post(`/api/review/castings/${first.id}/confirmations`)
      .send({ causeText: "Ladle lip froze over", note: "Found a skull in the ladle" });
    expect(other.body.current).toMatchObject({ causeId: null, causeTitle: "Ladle lip froze over" });
    const read = (await caster.agent.get(`/api/review/castings/${first.id}`)).body as CaseReview;
    expect(read.confirmations.map((c) => c.causeTitle)).toEqual(["Ladle lip froze over", review.current!.causeTitle]);
  });

  it("refuses a confirmation without a cause, or with one the rulebook does not have", async () => {
    const { shopId, caster, mentor } = await shopWithCrew("Review Bad Input");
    const melt = await newMelt(caster);
    const c = await newCasting(caster, melt.id, { marks: misrun });
    const none = await mentor.agent.post(`/api/review/castings/${c.id}/confirmations`).send({ note: "hm" });
    expect(none.status).toBe(400);
    expect(none.body.error.fields.causeId).toMatch(/choose a cause/);
    const both = await mentor.agent
      .post(`/api/review/castings/${c.id}/confirmations`)
      .send({ causeId: "cold-pour", causeText: "also this" });
    expect(both.body.error.fields.causeText).toBeDefined();
    const unknown = await mentor.agent.post(`/api/review/castings/${c.id}/confirmations`).send({ causeId: "gremlins" });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields.causeId).toMatch(/not a cause/);
    const long = await caster.agent.post(`/api/review/castings/${c.id}/requests`).send({ note: "x".repeat(1001) });
    expect(long.status).toBe(400);
    expect(await db.$count(confirmations, eq(confirmations.shopId, shopId))).toBe(0);
    expect(await db.$count(reviewRequests, eq(reviewRequests.shopId, shopId))).toBe(0);
  });

  it("answers 404 for another shop's castings and fixes on every route", async () => {
    const a = await shopWithCrew("Review Home");
    const b = await shopWithCrew("Review Away");
    const melt = await newMelt(b.caster);
    const theirs = await newCasting(b.caster, melt.id, { marks: misrun });
    const fix = await b.caster.agent.post(`/api/followups/castings/${theirs.id}/fixes`).send({ fix: "Pour hotter" });
    expect(fix.status).toBe(201);
    for (const res of await Promise.all([
      a.mentor.agent.get(`/api/review/castings/${theirs.id}`),
      a.caster.agent.post(`/api/review/castings/${theirs.id}/requests`).send({}),
      a.mentor.agent.post(`/api/review/castings/${theirs.id}/confirmations`).send({ causeId: "cold-pour" }),
      a.caster.agent.get(`/api/followups/castings/${theirs.id}`),
      a.caster.agent.post(`/api/followups/castings/${theirs.id}/fixes`).send({ fix: "Pour hotter" }),
      a.owner.agent.patch(`/api/followups/fixes/${fix.body.id}`).send({ worked: "no" }),
      a.mentor.agent.get("/api/review/castings/not-a-number"),
    ]))
      expect(res.status).toBe(404);
    expect((await a.mentor.agent.get("/api/review/queue")).body.items as QueueItem[]).toEqual([]);
  });
});

describe("fixes tried and the next casting", () => {
  it("records a fix, links the next casting of the part from a later melt, marks it worked, and shows the chain", async () => {
    const { shopId, caster } = await shopWithCrew("Followup Shop");
    const m1 = await newMelt(caster, { pouredOn: "2026-01-10" });
    const m2 = await newMelt(caster, { pouredOn: "2026-01-17", pourTempC: 760, meltTempC: 780 });
    const m3 = await newMelt(caster, { pouredOn: "2026-01-24", pourTempC: 770, meltTempC: 790 });
    const early = await newMelt(caster, { pouredOn: "2026-01-03" });
    const a = await newCasting(caster, m1.id, { marks: misrun });
    const sameMelt = await newCasting(caster, m1.id, {});
    const b = await newCasting(caster, m2.id, { partName: " ribbed COVER plate ", outcome: "rework" });
    const c = await newCasting(caster, m3.id, { outcome: "good" });
    const otherPart = await newCasting(caster, m2.id, { partName: "Bracket" });
    const before = await newCasting(caster, early.id, {});

    const list = (await caster.agent.get(`/api/followups/castings/${a.id}`)).body as Followups;
    expect(list.candidates.map((x) => x.id)).toEqual([b.id, c.id]);
    expect(list.chain).toEqual([]);

    const refused: [object, string, RegExp][] = [
      [{ fix: "" }, "fix", /say what was changed/],
      [{ fix: "Pour hotter", nextCastingId: otherPart.id }, "nextCastingId", /same part/],
      [{ fix: "Pour hotter", nextCastingId: before.id }, "nextCastingId", /later melt/],
      [{ fix: "Pour hotter", nextCastingId: sameMelt.id }, "nextCastingId", /later melt/],
      [{ fix: "Pour hotter", nextCastingId: 2_000_000_000 }, "nextCastingId", /no such casting/],
      [{ fix: "Pour hotter", worked: "yes" }, "worked", /link the next casting/],
      [{ fix: "Pour hotter", nextCastingId: b.id, worked: "mostly" }, "worked", /yes, partly or no/],
    ];
    for (const [body, field, message] of refused) {
      const res = await caster.agent.post(`/api/followups/castings/${a.id}/fixes`).send(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.fields[field]).toMatch(message);
    }
    expect(await db.$count(fixesTried, eq(fixesTried.shopId, shopId))).toBe(0);

    const first = await caster.agent.post(`/api/followups/castings/${a.id}/fixes`).send({ fix: "Pour 60 °C hotter" });
    expect(first.status).toBe(201);
    const linked = await caster.agent
      .patch(`/api/followups/fixes/${first.body.id}`)
      .send({ nextCastingId: b.id, worked: "partly" });
    expect(linked.status).toBe(200);
    expect(linked.body).toMatchObject({ next: { id: b.id, outcome: "rework" }, worked: "partly" });
    await caster.agent
      .post(`/api/followups/castings/${b.id}/fixes`)
      .send({ fix: "Add an overflow at the far corner", nextCastingId: c.id, worked: "yes" });

    const mid = (await caster.agent.get(`/api/followups/castings/${b.id}`)).body as Followups;
    expect(mid.chain.map((l) => [l.casting.id, l.current, l.fixes.map((f) => f.worked)])).toEqual([
      [a.id, false, ["partly"]],
      [b.id, true, ["yes"]],
      [c.id, false, []],
    ]);
    expect(
      (await caster.agent.patch(`/api/followups/fixes/${first.body.id}`).send({ nextCastingId: null })).status,
    ).toBe(400); // still marked
  });
});

describe("simultaneous review requests", () => {
  it("keeps one open request per casting when ten clicks arrive at once, answering the rest with it", async () => {
    const { owner, mentor, caster } = await shopWithCrew("Review Race Shop");
    const casting = await newCasting(caster, (await newMelt(caster)).id);
    const people = [owner, mentor, caster];
    const answers = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        people[i % 3].agent.post(`/api/review/castings/${casting.id}/requests`).send({ note: `click ${i}` }),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 200, 200, 200, 200, 200, 200, 201]);
    const open = await db.select().from(reviewRequests).where(eq(reviewRequests.castingId, casting.id));
    expect(open).toHaveLength(1);
    for (const a of answers) expect(a.body.waiting.id).toBe(open[0].id);
  });
});
