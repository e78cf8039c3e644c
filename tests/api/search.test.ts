import { beforeAll, describe, expect, it } from "vitest";
import type { SearchAnswer } from "../../lib/search-schemas";
import { migrateOnce, signUp, type Person } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";
import { buildCasebook, type Casebook } from "./search-fixtures";

let book: Casebook;
let other: Casebook;
beforeAll(async () => {
  await migrateOnce();
  book = await buildCasebook("Search Shop");
  other = await buildCasebook("Other Search Shop");
}, 120_000);

async function search(p: Person, query: Record<string, string | number>) {
  const res = await p.agent.get("/api/search").query(query);
  expect(res.status, res.text).toBe(200);
  return res.body as SearchAnswer;
}
const ids = (a: SearchAnswer) => a.items.map((i) => i.id);
const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);

describe("words", () => {
  it("forgives typos: porosty, misrnu and mis-run", async () => {
    const { c1, c2, c3, c5, c7 } = book.ids;
    expect(sorted(ids(await search(book.caster, { q: "porosty" })))).toEqual(sorted([c2, c3, c7]));
    expect(sorted(ids(await search(book.caster, { q: "misrnu" })))).toEqual(sorted([c1, c5]));
    expect(
      ids(await search(book.caster, { q: "mis-run" }))
        .slice(0, 2)
        .sort(),
    ).toEqual(sorted([c1, c5]));
  });

  it("ranks by relevance: the defect and the notes beat the defect alone, which beats a comment", async () => {
    const { c2, c3, c7 } = book.ids;
    const answer = await search(book.caster, { q: "porosity" });
    expect(answer.sort).toBe("relevance");
    expect(ids(answer)).toEqual([c7, c2, c3]);
    expect(answer.items.map((i) => i.score)).toEqual([...answer.items.map((i) => i.score!)].sort((a, b) => a - b));
  });

  it("finds part names, alloys, processes, causes and fixes", async () => {
    const { c1, c3, c4, c5, c6 } = book.ids;
    expect(sorted(ids(await search(book.caster, { q: "ribbed plate" })))).toEqual(sorted([c1, c5, c6]));
    expect(sorted(ids(await search(book.caster, { q: "319.0" })))).toEqual(sorted([c3, c4]));
    expect(ids(await search(book.caster, { q: "hotter" }))).toEqual([c5]);
    expect(ids(await search(book.caster, { q: "cold pour" }))[0]).toBe(c5);
  });

  it("marks the words that matched", async () => {
    const [hit] = (await search(book.caster, { q: "porosty", defect: "gas-porosity", process: "lost-foam" })).items;
    expect(hit.id).toBe(book.ids.c2);
    const runs = hit.marked.defects!;
    expect(runs.map((r) => r.text).join("")).toBe("Gas porosity (throughout)");
    expect(
      runs
        .filter((r) => r.hit)
        .map((r) => r.text)
        .join(""),
    ).toMatch(/poros/i);
  });
});

describe("filters", () => {
  it("filters by each of defect, alloy, process, outcome, cause, person and dates", async () => {
    const { c1, c2, c3, c4, c5, c6, c7 } = book.ids;
    const only = async (query: Record<string, string>) => sorted(ids(await search(book.caster, query)));
    expect(await only({ defect: "cold-shut" })).toEqual([c3]);
    expect(await only({ defect: "misrun,gas-porosity" })).toEqual(sorted([c1, c2, c5, c7]));
    expect(await only({ alloy: "319.0" })).toEqual(sorted([c3, c4]));
    expect(await only({ alloy: "a356.0" })).toEqual(sorted([c1, c2, c5, c6, c7]));
    expect(await only({ process: "lost-foam" })).toEqual(sorted([c1, c2, c5, c6]));
    expect(await only({ outcome: "good" })).toEqual(sorted([c4, c6]));
    expect(await only({ cause: "cold-pour" })).toEqual([c5]);
    expect(await only({ by: book.mentor.userId })).toEqual([c7]);
    expect(await only({ from: "2026-02-01", to: "2026-03-01" })).toEqual(sorted([c3, c4, c5]));
  });

  it("filters by the latest diagnosis's first cause where no mentor confirmed one", async () => {
    // Casting 1 is the textbook cold lost-foam misrun: the diagnosis names a cause for it.
    const { c1 } = book.ids;
    const res = await book.caster.agent.post(`/api/diagnosis/castings/${c1}`);
    expect(res.status, res.text).toBe(201);
    const top = res.body.result.causes[0].id as string;
    expect(ids(await search(book.caster, { cause: top }))).toContain(c1);
  });

  it("combines words and filters, and counts each chip with the other filters applied", async () => {
    const { c1, c5 } = book.ids;
    const answer = await search(book.caster, { q: "plate", process: "lost-foam", outcome: "scrap" });
    expect(sorted(ids(answer))).toEqual(sorted([c1, c5]));
    expect(answer.facets.outcome).toEqual({ scrap: 2, good: 1 });
    expect(answer.facets.process).toEqual({ "lost-foam": 2 });
    expect(answer.facets.defect).toEqual({ misrun: 2, "rounded-edges": 1 });
  });

  it("sorts by date either way and pages without gaps or repeats", async () => {
    const all = await search(book.caster, { pageSize: 50 });
    expect(all.sort).toBe("date-desc");
    expect(all.total).toBe(7);
    const { c7, c6, c5, c4, c3, c2, c1 } = book.ids;
    expect(ids(all)).toEqual([c6, c7, c5, c4, c3, c2, c1]);
    const pages = [];
    for (let page = 1; page <= 4; page++)
      pages.push(await search(book.caster, { sort: "date-asc", pageSize: 2, page }));
    expect(pages.map((p) => p.total)).toEqual([7, 7, 7, 7]);
    expect(pages.flatMap(ids)).toEqual([c1, c2, c3, c4, c5, c7, c6]);
    expect(pages[3].items).toHaveLength(1);
  });
});

describe("bad input and other shops", () => {
  it("answers 400 with a message per field and searches nothing", async () => {
    const bad = async (query: Record<string, string>, field: string, message: RegExp) => {
      const res = await book.caster.agent.get("/api/search").query(query);
      expect(res.status, JSON.stringify(query)).toBe(400);
      expect(res.body.error.fields[field]).toMatch(message);
    };
    await bad({ q: "x".repeat(201) }, "q", /200 characters/);
    await bad({ defect: "misrun,warpage" }, "defect.1", /"warpage" is not a defect type/);
    await bad({ process: "die-cast" }, "process.0", /not a process/);
    await bad({ outcome: "fine" }, "outcome.0", /not an outcome/);
    await bad({ from: "2026-13-45" }, "from", /YYYY-MM-DD/);
    await bad({ from: "2026-03-01", to: "2026-02-01" }, "to", /before the start/);
    await bad({ sort: "newest" }, "sort", /relevance, date-desc, date-asc/);
    await bad({ pageSize: "500" }, "pageSize", /at most 50/);
    await bad({ alloy: "Unobtainium" }, "alloy", /"Unobtainium" is not an alloy/);
    await bad({ cause: "gremlins" }, "cause", /not a cause/);
    await bad({ by: other.caster.userId }, "by", /not a person/);
  });

  it("never returns or counts another shop's cases", async () => {
    const mine = await search(book.caster, { q: "ribbed cover plate", pageSize: 50 });
    const theirs = await search(other.caster, { q: "ribbed cover plate", pageSize: 50 });
    expect(mine.total).toBe(3);
    expect(theirs.total).toBe(3);
    expect(ids(mine).some((id) => ids(theirs).includes(id))).toBe(false);
    const all = await search(book.owner, { pageSize: 50 });
    expect(all.total).toBe(7);
    expect(Object.values(all.facets.alloy).reduce((a, b) => a + b, 0)).toBe(7);
  });

  it("asks who is searching: signed out 401, no shop 403", async () => {
    expect((await (await signUp("Loner")).agent.get("/api/search")).status).toBe(403);
    const { default: request } = await import("supertest");
    const { app } = await import("./helpers");
    expect((await request(app).get("/api/search")).status).toBe(401);
  });
});

describe("stays current with every write", () => {
  it("finds a new comment, a new casting, a changed melt and forgets a removed mark at once", async () => {
    const shop = await buildCasebook("Fresh Shop");
    const { c4, c2 } = shop.ids;
    await search(shop.caster, { q: "anything" }); // the index exists before the writes
    await shop.caster.agent.post(`/api/comments/castings/${c4}`).send({ body: "surprising shrinkage inside the boss" });
    expect(ids(await search(shop.caster, { q: "shrinkage" }))).toEqual([c4]);

    const m = await newMelt(shop.caster, {
      pouredOn: "2026-04-01",
      alloy: "319.0",
      process: "plaster",
      pourTempC: 700,
      meltTempC: 720,
    });
    const fresh = await newCasting(shop.caster, m.id, {
      partName: "Gearbox lid",
      marks: [{ type: "cold-shut", location: "side", severity: 1 }],
    });
    expect(ids(await search(shop.caster, { q: "gearbox" }))).toEqual([fresh.id]);

    await shop.caster.agent.patch(`/api/melts/${shop.melts.m1.id}`).send({ process: "investment" });
    expect(ids(await search(shop.caster, { process: "investment" })).sort()).toContain(c2);

    const detail = await shop.caster.agent.get(`/api/castings/${c2}`);
    await shop.caster.agent.delete(`/api/marks/${detail.body.marks[0].id}`);
    expect(ids(await search(shop.caster, { defect: "gas-porosity" }))).not.toContain(c2);
  });
});
