import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { alloys, castings, confirmations, defectMarks, fixesTried, melts, searchDocuments } from "../../db/schema";
import { LOCATION_LABELS } from "../../lib/defects";
import { DEGASSING_LABELS, PROCESS_LABELS } from "../../lib/labels";
import type { SearchAnswer, SimilarAnswer } from "../../lib/search-schemas";
import { DEFECT_LOCATIONS, DEFECT_TYPES, PROCESSES, type DefectLocation, type DefectType } from "../../rules/case";
import { rng } from "../../scripts/seeded-random";
import { db } from "../../server/db";
import { alloyKey, defectWords } from "../../server/search/case-doc";
import { defectBit, markCode, similarCases, type SimilarInput } from "../../server/search/similarity";
import { dbFingerprint } from "./db-fingerprint";
import { migrateOnce, shopWithCrew, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";
import { buildCasebook, type Casebook } from "./search-fixtures";

let book: Casebook;
beforeAll(async () => {
  await migrateOnce();
  book = await buildCasebook("Documents Shop");
}, 120_000);

async function search(p: Person, query: Record<string, string | number>) {
  const res = await p.agent.get("/api/search").query(query);
  expect(res.status, res.text).toBe(200);
  return res.body as SearchAnswer;
}
const ids = (a: SearchAnswer) => a.items.map((i) => i.id);

describe("the words the documents hold for codes", () => {
  it("are the app's labels (a changed label needs a migration that rewrites search_labels)", async () => {
    const rows = (await db.execute<{ kind: string; code: string; words: string }>(sql`select * from search_labels`))
      .rows;
    const stored = Object.fromEntries(rows.map((r) => [`${r.kind}:${r.code}`, r.words]));
    const expected: Record<string, string> = {};
    for (const t of DEFECT_TYPES) expected[`defect:${t}`] = defectWords(t);
    for (const [k, v] of Object.entries(LOCATION_LABELS)) expected[`location:${k}`] = v;
    for (const [k, v] of Object.entries(PROCESS_LABELS)) expected[`process:${k}`] = v;
    for (const [k, v] of Object.entries(DEGASSING_LABELS))
      expected[`degassing:${k}`] = k === "none" ? "" : `${v} degassing`;
    expect(stored).toEqual(expected);
  });

  it("find a defect by its label's words and its trade alias", async () => {
    const m = await newMelt(book.caster, { pouredOn: "2026-04-02", alloy: "A356.0", process: "lost-foam" });
    const c = await newCasting(book.caster, m.id, {
      partName: "Tiller arm",
      marks: [{ type: "metal-penetration", location: "around-core", severity: 2 }],
    });
    expect(ids(await search(book.caster, { q: "metal in the sand" }))).toEqual([c.id]);
    expect(ids(await search(book.caster, { q: "penetration around core" }))).toEqual([c.id]);
  });
});

describe("text PostgreSQL's query syntax would choke on", () => {
  it("is read as plain words, never as operators, and never answers 500", async () => {
    const plain = ids(await search(book.caster, { q: "porosity", pageSize: 50 })).sort();
    for (const q of [
      "porosity & !",
      "porosity | (",
      "'porosity'",
      '"porosity"',
      "porosity:*",
      "porosity \\",
      "\\'porosity\\' <-> :*",
      "porosity !!!! &&&& |||| ((((",
      "porosity -- ; ))) <-> ~~",
    ])
      expect(ids(await search(book.caster, { q, pageSize: 50 })).sort(), q).toEqual(plain);
    expect((await search(book.caster, { q: "& | ! ( ) : * ' \" \\" })).total).toBe(8); // no words: every case
    // Words that name no case find none: "drop", "table" and "castings" are only words here.
    expect((await search(book.caster, { q: "porosity'); drop table castings; --" })).total).toBe(0);
    expect((await search(book.caster, {})).total).toBe(8);
  });

  it("answers 400 for a NUL, too many words or too long a word, and changes nothing", async () => {
    const before = await dbFingerprint();
    for (const [q, message] of [
      ["porosity\u0000misrun", /NUL/],
      [Array.from({ length: 1000 }, () => "a").join(" "), /200 characters/],
      [Array.from({ length: 40 }, (_, i) => `w${i}`).join(" "), /at most 31 words/],
      ["x".repeat(33), /at most 32 letters/],
    ] as const) {
      const res = await book.caster.agent.get("/api/search").query({ q });
      expect(res.status, q.slice(0, 40)).toBe(400);
      expect(res.body.error.fields.q).toMatch(message);
    }
    for (const after of ["x", "2026-13-45_1", "0.5_2026-01-01_99999999999", "'; drop table castings; --"]) {
      const res = await book.caster.agent.get("/api/search").query({ after, sort: "date-desc" });
      expect(res.status, after).toBe(400);
      expect(res.body.error.fields.after).toBeTruthy();
    }
    expect(await dbFingerprint()).toEqual(before);
  });
});

describe("keyset paging", () => {
  it("walks every sort by `after` through the same cases as page numbers, without gaps or repeats", async () => {
    for (const query of [
      { sort: "date-desc" },
      { sort: "date-asc" },
      { q: "plate", sort: "date-desc" },
      { q: "ribbed", sort: "date-asc" },
      { q: "plate" },
      { q: "porosity" },
    ] as Record<string, string>[]) {
      const byPage: number[] = [];
      for (let page = 1; page <= 4; page++)
        byPage.push(...ids(await search(book.caster, { ...query, pageSize: 3, page })));
      const walked: number[] = [];
      let after: string | null = null;
      for (let i = 0; i < 10; i++) {
        const answer: SearchAnswer = await search(book.caster, { ...query, pageSize: 3, ...(after ? { after } : {}) });
        walked.push(...ids(answer));
        after = answer.next;
        if (!after) break;
      }
      expect(byPage.length, JSON.stringify(query)).toBeGreaterThan(2);
      expect(walked, JSON.stringify(query)).toEqual(byPage);
    }
    const first = await search(book.caster, { q: "porosity", pageSize: 1 });
    const second = await search(book.caster, { q: "porosity", pageSize: 1, after: first.next! });
    expect(second.items[0].id).not.toBe(first.items[0].id);
    const wrong = await book.caster.agent.get("/api/search").query({ q: "porosity", after: "2026-01-01_5" });
    expect(wrong.status).toBe(400);
  });
});

describe("documents stay current", () => {
  it("keeps every comment when several people write on one casting at once", async () => {
    const { c4 } = book.ids;
    const bodies = ["alpha", "bravo", "charlie", "delta", "echo", "foxtrot"].map((w) => `sparkle${w} noted`);
    const writers = [book.caster, book.mentor, book.owner];
    const res = await Promise.all(
      bodies.map((body, i) => writers[i % 3].agent.post(`/api/comments/castings/${c4}`).send({ body })),
    );
    expect(res.map((r) => r.status)).toEqual(bodies.map(() => 201));
    const [doc] = await db.select().from(searchDocuments).where(eq(searchDocuments.castingId, c4));
    for (const b of bodies) expect(doc.commentsText).toContain(b);
    for (const b of bodies) expect(ids(await search(book.caster, { q: b.split(" ")[0] }))).toEqual([c4]);
  });

  it("widens a typo only to words of this shop", async () => {
    const other = await buildCasebook("Typo Other Shop");
    const m = await newMelt(other.caster, { pouredOn: "2026-04-03", alloy: "A356.0", process: "lost-foam" });
    await newCasting(other.caster, m.id, { partName: "Zeppelin gondola", marks: [] });
    expect((await search(book.caster, { q: "zeppelinn" })).total).toBe(0);
    expect((await search(other.caster, { q: "zeppelinn" })).total).toBe(1);
  });
});

describe("cases like this one, in SQL", () => {
  it("ranks a random casebook exactly as the case-by-case reference does", async () => {
    const crew = await shopWithCrew("Random Likeness Shop");
    // One melt through the routes so the built-in alloys exist, then bulk rows as the bench seeds them.
    await newMelt(crew.caster, { pouredOn: "2025-01-01", alloy: "A356.0", process: "lost-foam" });
    const alloyRows = await db
      .select({ id: alloys.id, d: alloys.designation, family: alloys.family, liquidusC: alloys.liquidusC })
      .from(alloys);
    const pickAlloys = alloyRows.filter((a) => ["A356.0", "319.0", "356.0"].includes(a.d));
    const r = rng(7);
    const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
    const meltRows = await db
      .insert(melts)
      .values(
        Array.from({ length: 60 }, (_, i) => {
          const a = pick(pickAlloys);
          return {
            shopId: crew.shopId,
            alloyId: a.id,
            pouredOn: `2025-0${1 + (i % 9)}-1${i % 10}`,
            process: pick(PROCESSES),
            pourTempC: r() < 0.8 ? 650 + Math.floor(r() * 150) : null,
            degassing: pick([null, "none", "rotary", "argon-lance"] as const),
            createdBy: crew.caster.userId,
          };
        }),
      )
      .returning();
    const castRows = await db
      .insert(castings)
      .values(
        Array.from({ length: 240 }, () => ({
          shopId: crew.shopId,
          meltId: pick(meltRows).id,
          partName: "Part",
          minSectionMm: r() < 0.8 ? pick([3, 4, 5, 8, 12]) : null,
          createdBy: crew.caster.userId,
        })),
      )
      .returning();
    const marks = castRows.flatMap((c) =>
      Array.from({ length: Math.floor(r() * 3) }, () => ({
        shopId: crew.shopId,
        castingId: c.id,
        type: pick(DEFECT_TYPES.slice(0, 5)),
        location: pick(DEFECT_LOCATIONS.slice(0, 4)),
        severity: 2,
        createdBy: crew.caster.userId,
      })),
    );
    await db.insert(defectMarks).values(marks);
    const confirmed = castRows.filter(() => r() < 0.1);
    await db.insert(confirmations).values(
      confirmed.map((c) => ({
        shopId: crew.shopId,
        castingId: c.id,
        causeId: "cold-pour",
        createdBy: crew.mentor.userId,
      })),
    );
    const fixed = confirmed.filter(() => r() < 0.5);
    await db.insert(fixesTried).values(
      fixed.map((c) => ({
        shopId: crew.shopId,
        castingId: c.id,
        fix: "hotter",
        worked: "yes" as const,
        createdBy: crew.caster.userId,
        updatedBy: crew.caster.userId,
      })),
    );

    // The reference's inputs come from the rows written, not from the documents.
    const inputs: SimilarInput[] = castRows.map((c) => {
      const m = meltRows.find((x) => x.id === c.meltId)!;
      const a = alloyRows.find((x) => x.id === m.alloyId)!;
      const mine = marks.filter((k) => k.castingId === c.id) as { type: DefectType; location: DefectLocation }[];
      const isConfirmed = confirmed.includes(c);
      return {
        id: c.id,
        pouredOn: m.pouredOn,
        defects: mine.map((k) => ({ type: k.type, location: k.location, severity: 2 })),
        defectMask: mine.reduce((x, k) => x | defectBit(k.type), 0),
        markCodes: mine.map((k) => markCode(k.type, k.location)),
        process: m.process,
        alloy: a.d,
        alloyKey: alloyKey(a.d),
        alloyFamily: a.family,
        superheatC: m.pourTempC === null ? null : m.pourTempC - a.liquidusC,
        degassing: m.degassing,
        minSectionMm: c.minSectionMm,
        cause: isConfirmed ? { id: "cold-pour", title: "", confirmed: true } : null,
        fixWorked: fixed.includes(c) ? "yes" : null,
      };
    });
    for (const target of inputs.slice(0, 50)) {
      const expected = similarCases(target, inputs).map((s) => [s.doc.id, s.similarity, s.parts]);
      const res = await crew.caster.agent.get(`/api/search/castings/${target.id}/similar`);
      expect(res.status).toBe(200);
      const got = (res.body as SimilarAnswer).items.map((s) => [s.id, s.similarity, s.parts]);
      expect(got, `target ${target.id}`).toEqual(expected);
    }
  });
});
