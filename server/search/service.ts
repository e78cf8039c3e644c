import type { CaseHit, CaseSummary, SearchAnswer, SearchFacets, SearchParams, SearchSort, SimilarAnswer } from "../../lib/search-schemas";
import { reasonText } from "../../lib/search-schemas";
import { notFound } from "../http/errors";
import { caseFilter, checkNames, namesOf } from "./filters";
import { shopIndex, type IndexedCase } from "./index-cache";
import { markPage } from "./marks";
import { similarCases } from "./similarity";

/**
 * GET /api/search and GET /api/castings/:id/similar over the shop's in-memory index. One pass over
 * the shop's cases applies the filters, scores the words and counts the chips; only the page
 * asked for is dressed (names, marked words) and sent.
 */
export async function searchCases(shopId: string, p: SearchParams): Promise<SearchAnswer> {
  const index = await shopIndex(shopId);
  await checkNames(shopId, index, p);
  const prepared = index.fuzzy.prepare(p.q);
  const sort: SearchSort = prepared ? (p.sort ?? "relevance") : p.sort === "date-asc" ? "date-asc" : "date-desc";
  const filter = caseFilter(p);
  const facets: SearchFacets = { defect: {}, alloy: {}, process: {}, outcome: {} };
  const found: number[] = [];
  const scores: number[] = [];
  const cases = index.cases;
  for (let pos = 0; pos < cases.length; pos++) {
    const c = cases[pos];
    if (!filter.other(c)) continue;
    const failed = filter.failed(c);
    if (failed & (failed - 1)) continue; // fails two chip filters: counts for no chip
    const score = prepared ? index.fuzzy.score(prepared, c.compiled) : 0;
    if (score < 0) continue;
    count(facets, c, failed);
    if (failed) continue;
    found.push(pos);
    scores.push(score);
  }
  const order = found.map((_, i) => i);
  // `cases` is newest first, so position breaks ties as Fuse's own order would.
  if (sort === "relevance") order.sort((a, b) => scores[a] - scores[b] || found[a] - found[b]);
  if (sort === "date-asc") order.reverse();
  const slice = order.slice((p.page - 1) * p.pageSize, p.page * p.pageSize);
  const page = slice.map((i) => cases[found[i]]);
  const names = await namesOf(page.map((c) => c.createdBy));
  const marked = markPage(page.map((c) => c.fields), prepared ? p.q : "");
  const items: CaseHit[] = page.map((c, i) => ({
    ...summary(c, names), score: sort === "relevance" ? scores[slice[i]] : null, marked: marked[i],
  }));
  return { items, total: found.length, page: p.page, pageSize: p.pageSize, sort, facets };
}

function count(f: SearchFacets, c: IndexedCase, failed: number) {
  if (!failed || failed === 1) for (const t of new Set(c.defects.map((d) => d.type))) f.defect[t] = (f.defect[t] ?? 0) + 1;
  if (!failed || failed === 2) f.alloy[c.alloy] = (f.alloy[c.alloy] ?? 0) + 1;
  if (!failed || failed === 4) f.process[c.process] = (f.process[c.process] ?? 0) + 1;
  if ((!failed || failed === 8) && c.outcome) f.outcome[c.outcome] = (f.outcome[c.outcome] ?? 0) + 1;
}

const summary = (c: IndexedCase, names: Map<string, string>): CaseSummary => ({
  id: c.id, meltId: c.meltId, partName: c.partName, pouredOn: c.pouredOn, alloy: c.alloy, process: c.process,
  outcome: c.outcome, defects: c.defects, cause: c.cause, fixWorked: c.fixWorked,
  createdBy: { id: c.createdBy, name: names.get(c.createdBy) ?? "" },
});

export async function similarTo(shopId: string, castingId: number): Promise<SimilarAnswer> {
  const index = await shopIndex(shopId);
  const target = index.get(castingId);
  if (!target) throw notFound("No such casting");
  const found = similarCases(target, index.cases);
  const names = await namesOf(found.map((s) => s.doc.createdBy));
  return {
    items: found.map((s) => ({ ...summary(s.doc, names), similarity: s.similarity, reason: reasonText(s.parts), parts: s.parts })),
  };
}
