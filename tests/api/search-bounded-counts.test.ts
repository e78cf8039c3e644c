import { beforeAll, describe, expect, it } from "vitest";
import type { SearchAnswer } from "../../lib/search-schemas";
import type { Person } from "./helpers";

// This file alone counts over at most 10 matches (1,000 elsewhere), so a small casebook goes past
// the limit. The environment is read on first use, after this line.
process.env.SEARCH_COUNT_LIMIT = "10";
const { migrateOnce } = await import("./helpers");
const { newCasting, newMelt } = await import("./notebook-fixtures");
const { buildCasebook } = await import("./search-fixtures");

let book: Awaited<ReturnType<typeof buildCasebook>>;
let all: number;
beforeAll(async () => {
  await migrateOnce();
  book = await buildCasebook("Bounded Counts Shop");
  const m = await newMelt(book.caster, { pouredOn: "2026-05-02", alloy: "319.0", process: "green-sand" });
  for (let i = 0; i < 12; i++)
    await newCasting(book.caster, m.id, {
      partName: `Bearing cap ${i}`,
      outcome: i % 2 ? "good" : "scrap",
      marks: i % 2 ? [] : [{ type: "shrinkage", location: "thick-section", severity: 2 }],
    });
  all = (await walk(book.caster, { sort: "date-desc" })).length;
}, 120_000);

async function search(p: Person, query: Record<string, string | number>) {
  const res = await p.agent.get("/api/search").query(query);
  expect(res.status, res.text).toBe(200);
  return res.body as SearchAnswer;
}
/** Every case of a query, page after page by `after`, in its order. */
async function walk(p: Person, query: Record<string, string | number>) {
  const out: SearchAnswer["items"] = [];
  let after: string | null = null;
  for (let i = 0; i < 50; i++) {
    const a: SearchAnswer = await search(p, { ...query, pageSize: 4, ...(after ? { after } : {}) });
    out.push(...a.items);
    if (!(after = a.next)) break;
  }
  return out;
}
const tally = (values: string[]) =>
  values.reduce<Record<string, number>>((t, v) => ({ ...t, [v]: (t[v] ?? 0) + 1 }), {});

describe("counting past SEARCH_COUNT_LIMIT", () => {
  it("says the total is a lower bound and counts the chips among the newest matches", async () => {
    expect(all).toBe(19); // the casebook's 7 and 12 bearing caps
    const a = await search(book.caster, { pageSize: 20 });
    expect(a).toMatchObject({ total: 10, totalExact: false, facetsExact: false, countLimit: 10 });
    // The page itself is not bounded: the newest 20 of 19 cases are all 19.
    expect(a.items).toHaveLength(19);
    const newest = a.items.slice(0, 10);
    expect(a.facets.process).toEqual(tally(newest.map((i) => i.process)));
    expect(a.facets.alloy).toEqual(tally(newest.map((i) => i.alloy)));
    expect(a.facets.outcome).toEqual(tally(newest.flatMap((i) => (i.outcome ? [i.outcome] : []))));
    expect(a.facets.defect).toEqual(tally(newest.flatMap((i) => [...new Set(i.defects.map((d) => d.type))])));
  });

  it("pages on past the limit in date order, by page number and by `after`, without gaps or repeats", async () => {
    const byAfter = (await walk(book.caster, { sort: "date-asc" })).map((i) => i.id);
    expect(new Set(byAfter).size).toBe(19);
    const pages: number[] = [];
    for (let page = 1; page <= 5; page++) {
      const a = await search(book.caster, { sort: "date-asc", pageSize: 4, page });
      pages.push(...a.items.map((i) => i.id));
      expect(a.next === null, `page ${page}`).toBe(page === 5);
    }
    expect(pages).toEqual(byAfter);
  });

  it("is exact again when the filters leave fewer cases than the limit", async () => {
    const foam = await search(book.caster, { process: "lost-foam", pageSize: 20 });
    expect(foam.totalExact).toBe(true);
    expect(foam.total).toBe(foam.items.length);
    expect(foam.items.length).toBeLessThan(10);
    // The alloy chips count with the process filter on: exact. The process chips count without
    // their own filter (all 19 cases), so they are the newest 10's.
    expect(foam.facets.alloy).toEqual(tally(foam.items.map((i) => i.alloy)));
    expect(foam.facetsExact).toBe(false);
    const words = await search(book.caster, { q: "porosity" });
    expect(words).toMatchObject({ totalExact: true, facetsExact: true });
    expect(words.total).toBe(words.items.length);
  });

  it("ranks by relevance among the newest matches and stops there; date order finds them all", async () => {
    const first = await search(book.caster, { q: "bearing cap", pageSize: 4 });
    expect(first).toMatchObject({ sort: "relevance", total: 10, totalExact: false });
    const ranked = await walk(book.caster, { q: "bearing cap" });
    const dated = await walk(book.caster, { q: "bearing cap", sort: "date-desc" });
    expect(dated).toHaveLength(12);
    expect(ranked).toHaveLength(10);
    // The ten ranked are the ten newest matches (ids break the tie of one pour day).
    expect(ranked.map((i) => i.id).sort()).toEqual(
      dated
        .slice(0, 10)
        .map((i) => i.id)
        .sort(),
    );
  });
});
