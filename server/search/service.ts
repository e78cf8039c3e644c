import type {
  CaseHit,
  CaseSummary,
  SearchAnswer,
  SearchFacets,
  SearchParams,
  SearchSort,
  SimilarAnswer,
} from "../../lib/search-schemas";
import { reasonText } from "../../lib/search-schemas";
import { DEFECT_TYPES, PROCESSES } from "../../rules/case";
import { notFound } from "../http/errors";
import { bestFirst } from "./best-first";
import { checkNames, namesOf, slotFilter } from "./filters";
import { shopIndex } from "./index-cache";
import { markPage } from "./marks";
import { OUTCOME_CODES } from "./names";
import type { IndexedCase, ShopIndex } from "./shop-index";
import { similarInIndex } from "./similar-scan";

/**
 * GET /api/search and GET /api/search/castings/:id/similar over the shop's in-memory index. Words first
 * narrow to the cases holding a match for every word (the index's postings), then one pass in
 * date order applies the filters, scores the words as Fuse would and counts the chips; only the
 * page asked for is dressed (names, marked words) and sent.
 */
export async function searchCases(shopId: string, p: SearchParams): Promise<SearchAnswer> {
  const index = await shopIndex(shopId);
  await checkNames(shopId, index, p);
  const prepared = index.fuzzy.prepare(p.q);
  const sort: SearchSort = prepared ? (p.sort ?? "relevance") : p.sort === "date-asc" ? "date-asc" : "date-desc";
  const filter = slotFilter(index, p);
  const counts = new Counts(index);
  const work = index.scratch();
  const hit = prepared ? termHits(index, prepared.unitMask, work.hit) : null;
  const full = prepared?.full ?? 0;
  const { order, compiled, start } = index;
  const found = work.found;
  const scores = prepared ? work.scores : null;
  let total = 0;
  for (let pos = 0; pos < order.length; pos++) {
    const s = order[pos];
    if (hit && hit[s] !== full) continue;
    if (!filter.other(s)) continue;
    const failed = filter.failed(s);
    if (failed & (failed - 1)) continue; // fails two chip filters: counts for no chip
    const score = prepared ? index.fuzzy.score(prepared, compiled, start[s]) : 0;
    if (score < 0) continue;
    counts.add(s, failed);
    if (failed) continue;
    if (scores) scores[total] = score;
    found[total++] = pos;
  }
  const from = (p.page - 1) * p.pageSize;
  const upto = Math.min(total, from + p.pageSize);
  let slice: number[];
  if (sort === "relevance" && scores) {
    slice = bestFirst(scores.subarray(0, total), upto).slice(from);
  } else {
    slice = Array.from({ length: Math.max(0, upto - from) }, (_, k) =>
      sort === "date-asc" ? total - 1 - from - k : from + k,
    );
  }
  const page = slice.map((i) => index.slots[order[found[i]]]!);
  const pageScores = slice.map((i) => (scores && sort === "relevance" ? scores[i] : null)); // before the work arrays are reused
  const names = await namesOf(page.map((c) => c.createdBy));
  const marked = markPage(
    page.map((c) => c.fields),
    prepared ? p.q : "",
  );
  const items: CaseHit[] = page.map((c, i) => ({ ...summary(c, names), score: pageScores[i], marked: marked[i] }));
  return { items, total, page: p.page, pageSize: p.pageSize, sort, facets: counts.facets() };
}

/** Per slot, which query words some unit of the case matches (bit i = word i). */
function termHits(index: ShopIndex, unitMask: Int32Array, hit: Int32Array): Int32Array {
  hit.fill(0);
  for (let u = 0; u < unitMask.length; u++) {
    const m = unitMask[u];
    const list = m ? index.postings[u] : undefined;
    if (list) for (let i = 0; i < list.length; i++) hit[list[i]] |= m;
  }
  return hit;
}

/** Chip counts in typed arrays during the scan, named at the end. */
class Counts {
  private defect = new Int32Array(DEFECT_TYPES.length);
  private alloy: Int32Array;
  private process = new Int32Array(PROCESSES.length);
  private outcome = new Int32Array(OUTCOME_CODES.length);
  private cause: Int32Array;
  constructor(private readonly index: ShopIndex) {
    this.alloy = new Int32Array(index.alloys.list.length);
    this.cause = new Int32Array(index.causes.list.length);
  }
  add(s: number, failed: number) {
    const x = this.index;
    if (!failed || failed === 1) for (let m = x.defects[s]; m; m &= m - 1) this.defect[31 - Math.clz32(m & -m)]++;
    if (!failed || failed === 2) this.alloy[x.alloy[s]]++;
    if (!failed || failed === 4) this.process[x.process[s]]++;
    if (!failed || failed === 8) this.outcome[x.outcome[s]]++;
    if (!failed || failed === 16) this.cause[x.cause[s]]++;
  }
  facets(): SearchFacets {
    const named = <K extends string>(counts: Int32Array, name: (i: number) => K | "") => {
      const out: Partial<Record<K, number>> = {};
      counts.forEach((n, i) => {
        const k = name(i);
        if (n && k) out[k] = n;
      });
      return out as Record<K, number>;
    };
    const causes = named(this.cause, (i) => this.index.causes.list[i]);
    return {
      defect: named(this.defect, (i) => DEFECT_TYPES[i]),
      alloy: named(this.alloy, (i) => this.index.alloys.labels[i]),
      process: named(this.process, (i) => PROCESSES[i]),
      outcome: named(this.outcome, (i) => OUTCOME_CODES[i]),
      cause: Object.fromEntries(
        Object.entries(causes).map(([id, count]) => [
          id,
          { title: this.index.causes.labels[this.index.causes.find(id)!], count },
        ]),
      ),
    };
  }
}

const summary = (c: IndexedCase, names: Map<string, string>): CaseSummary => ({
  id: c.id,
  meltId: c.meltId,
  partName: c.partName,
  pouredOn: c.pouredOn,
  alloy: c.alloy,
  process: c.process,
  outcome: c.outcome,
  defects: c.defects,
  cause: c.cause,
  fixWorked: c.fixWorked,
  createdBy: { id: c.createdBy, name: names.get(c.createdBy) ?? "" },
});

export async function similarTo(shopId: string, castingId: number): Promise<SimilarAnswer> {
  const index = await shopIndex(shopId);
  const target = index.get(castingId);
  if (!target) throw notFound("No such casting");
  const found = similarInIndex(index, target);
  const names = await namesOf(found.map((s) => s.doc.createdBy));
  return {
    items: found.map((s) => ({
      ...summary(s.doc, names),
      similarity: s.similarity,
      reason: reasonText(s.parts),
      parts: s.parts,
    })),
  };
}
