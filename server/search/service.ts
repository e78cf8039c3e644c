import { sql, type SQL } from "drizzle-orm";
import type { CaseHit, SearchAnswer, SearchFacets, SearchParams, SearchSort } from "../../lib/search-schemas";
import { db } from "../db";
import { HttpError } from "../http/errors";
import { alloyKey, fieldsOf, summaryOf, type DocRow } from "./case-doc";
import { markPage } from "./marks";
import { causeTitles, checkNames, namesOf } from "./names";
import { lookups, queryTerms, tsquery, tsqueryText } from "./query-words";

/**
 * GET /api/search over `search_documents`, in one read-only transaction:
 * 1. each query word of 3+ letters is widened to the shop's words within its slips (trigram index
 *    on `search_words`, then levenshtein), and a tsquery is built from those words;
 * 2. one statement narrows the shop's documents (GIN index on the words, typed columns for the
 *    filters), counts every chip with the other filters applied (GROUP BY), and picks one page in
 *    relevance (ts_rank) or date order, by OFFSET or by keyset (`after`, on the indexed date and id);
 * 3. Fuse.js re-ranks that page and marks its matched words.
 */
type Hit = { kind: "page" | "total" | "defect" | "alloy" | "process" | "outcome" | "cause" };
type FacetRow = Hit & { key: string | null; title: string | null; n: number };
type PageRow = Hit & { id: number; rank: string; poured_on: string; doc: DocRow };

export async function searchCases(shopId: string, p: SearchParams): Promise<SearchAnswer> {
  const titles = await causeTitles(shopId);
  await checkNames(shopId, p, titles);
  const terms = queryTerms(p.q);
  const sort: SearchSort = terms.length ? (p.sort ?? "relevance") : p.sort === "date-asc" ? "date-asc" : "date-desc";
  let words: SQL = sql`true`;
  let rank: SQL = sql`0::real`;
  if (terms.length) {
    const q = tsquery(tsqueryText(terms, await similarWords(shopId, terms)));
    words = sql`d.document @@ ${q}`;
    rank = sql`ts_rank(d.document, ${q})`;
  }
  const rows = (await db.execute(matchStatement(shopId, p, sort, words, rank))).rows as unknown as (
    FacetRow | PageRow
  )[];
  const facetRows = rows.filter((r): r is FacetRow => r.kind !== "page");
  // The join after LIMIT keeps the page's order only in PostgreSQL's plan of the day: sort again.
  const pageRows = rows.filter((r): r is PageRow => r.kind === "page").sort(pageOrder(sort));
  const docs = pageRows.map((r) => r.doc);

  // Fuse re-ranks the page (relevance only) and marks its matched words, in one pass.
  const found = markPage(docs.map(fieldsOf), terms.length ? p.q : "");
  let order = docs.map((_, i) => i);
  if (terms.length && sort === "relevance") order = order.sort((a, b) => found.scores[a] - found.scores[b] || a - b);
  const page = order.map((i) => docs[i]);
  const scores = order.map((i) => (terms.length && sort === "relevance" ? found.scores[i] : null));
  const marked = order.map((i) => found.marked[i]);
  const names = await namesOf(page.map((d) => d.createdBy));
  const items: CaseHit[] = page.map((d, i) => ({
    ...summaryOf(d, names, titles),
    score: scores[i],
    marked: marked[i],
  }));
  const last = pageRows[pageRows.length - 1];
  const total = Number(facetRows.find((r) => r.kind === "total")?.n ?? 0);
  const seen = p.after ? null : (p.page - 1) * p.pageSize + pageRows.length;
  const more = pageRows.length === p.pageSize && (seen === null || seen < total);
  return {
    items,
    total,
    page: p.page,
    pageSize: p.pageSize,
    sort,
    next: more && last ? cursorOf(sort, last) : null,
    facets: facetsOf(facetRows, titles),
  };
}

/** The statement's ORDER BY, in JavaScript. */
const pageOrder = (sort: SearchSort) => (a: PageRow, b: PageRow) => {
  const date = a.poured_on < b.poured_on ? -1 : a.poured_on > b.poured_on ? 1 : a.id - b.id;
  if (sort === "date-asc") return date;
  return (sort === "relevance" ? Number(b.rank) - Number(a.rank) : 0) || -date;
};

const cursorOf = (sort: SearchSort, r: PageRow) => `${sort === "relevance" ? `${r.rank}_` : ""}${r.poured_on}_${r.id}`;

/** One statement: the shop's matching documents, each chip's counts and the page's ids. */
function matchStatement(shopId: string, p: SearchParams, sort: SearchSort, words: SQL, rank: SQL): SQL {
  const any = (column: SQL, values: string[] | undefined, type: string) =>
    values?.length ? sql`${column} = ANY(${sql.param(values)}::${sql.raw(type)}[])` : sql`true`;
  const defect = p.defect?.length ? sql`d.defect_types && ${sql.param(p.defect)}::defect_type[]` : sql`true`;
  const alloy = any(sql`d.alloy_key`, p.alloy?.map(alloyKey), "text");
  const process = any(sql`d.process`, p.process, "process");
  const outcome = any(sql`d.outcome`, p.outcome, "outcome");
  const cause = any(sql`d.cause_id`, p.cause, "text");
  // Conditions without chips. (Archived cases, when they come, are one more line here.)
  const where = sql.join(
    [
      sql`d.shop_id = ${shopId}`,
      words,
      any(sql`d.created_by`, p.by, "text"),
      p.from ? sql`d.poured_on >= ${p.from}::date` : sql`true`,
      p.to ? sql`d.poured_on <= ${p.to}::date` : sql`true`,
    ],
    sql` AND `,
  );
  const desc = sort !== "date-asc";
  const order =
    sort === "relevance"
      ? sql`h.rank DESC, h.poured_on DESC, h.casting_id DESC`
      : desc
        ? sql`h.poured_on DESC, h.casting_id DESC`
        : sql`h.poured_on ASC, h.casting_id ASC`;
  const keyset = p.after ? afterCondition(sort, p.after) : sql`true`;
  const offset = p.after ? 0 : (p.page - 1) * p.pageSize;
  return sql`
    WITH hits AS MATERIALIZED (
      SELECT d.casting_id, d.poured_on, d.defect_types, d.alloy_key, d.alloy, d.process, d.outcome,
        d.cause_id, ${rank} AS rank,
        ${defect} AS f_defect, ${alloy} AS f_alloy, ${process} AS f_process, ${outcome} AS f_outcome,
        ${cause} AS f_cause
      FROM search_documents d WHERE ${where}
    )
    SELECT 'total' AS kind, NULL AS key, NULL AS title, count(*)::int AS n, NULL::int AS id, NULL AS rank,
        NULL AS poured_on, NULL::json AS doc
      FROM hits WHERE f_defect AND f_alloy AND f_process AND f_outcome AND f_cause
    UNION ALL
    SELECT 'defect', t::text, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM hits, unnest(defect_types) t WHERE f_alloy AND f_process AND f_outcome AND f_cause GROUP BY t
    UNION ALL
    SELECT 'alloy', alloy_key, min(alloy), count(*)::int, NULL, NULL, NULL, NULL
      FROM hits WHERE f_defect AND f_process AND f_outcome AND f_cause GROUP BY alloy_key
    UNION ALL
    SELECT 'process', process::text, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM hits WHERE f_defect AND f_alloy AND f_outcome AND f_cause GROUP BY process
    UNION ALL
    SELECT 'outcome', outcome::text, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM hits WHERE outcome IS NOT NULL AND f_defect AND f_alloy AND f_process AND f_cause GROUP BY outcome
    UNION ALL
    SELECT 'cause', cause_id, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM hits WHERE cause_id IS NOT NULL AND f_defect AND f_alloy AND f_process AND f_outcome GROUP BY cause_id
    UNION ALL
    SELECT 'page', NULL, NULL, NULL::int, p.casting_id, p.rank::text, p.poured_on::text, ${DOC_JSON}
    FROM (
      SELECT h.casting_id, h.rank, h.poured_on FROM hits h
      WHERE f_defect AND f_alloy AND f_process AND f_outcome AND f_cause AND ${keyset}
      ORDER BY ${order} LIMIT ${p.pageSize} OFFSET ${offset}
    ) p JOIN search_documents d USING (casting_id)`;
}

/** The rows after the previous page's last one, in the same order (row comparison on the sort key). */
function afterCondition(sort: SearchSort, after: string): SQL {
  const parts = after.split("_");
  if ((sort === "relevance") !== (parts.length === 3))
    throw new HttpError(400, "Some values need fixing.", { after: "this cursor belongs to another sort order" });
  const [day, id] = parts.slice(-2);
  if (Number.isNaN(Date.parse(`${day}T00:00:00Z`)) || Number(id) > 2_147_483_647)
    throw new HttpError(400, "Some values need fixing.", { after: "after is the next value of a previous answer" });
  if (sort === "relevance")
    return sql`(h.rank, h.poured_on, h.casting_id) < (${parts[0]}::real, ${day}::date, ${Number(id)}::int)`;
  return sort === "date-asc"
    ? sql`(h.poured_on, h.casting_id) > (${day}::date, ${Number(id)}::int)`
    : sql`(h.poured_on, h.casting_id) < (${day}::date, ${Number(id)}::int)`;
}

/**
 * Each widenable query word's similar words in this shop: the nearest words by trigram distance,
 * straight from the GiST index, kept when within the word's slips.
 */
async function similarWords(shopId: string, terms: ReturnType<typeof queryTerms>) {
  const { words, slips } = lookups(terms);
  const out = new Map<string, string[]>();
  if (!words.length) return out;
  const rows = (
    await db.execute(sql`
      SELECT q.w, v.word FROM unnest(${sql.param(words)}::text[], ${sql.param(slips)}::int[]) AS q(w, k)
      CROSS JOIN LATERAL (
        SELECT word FROM search_words WHERE shop_id = ${shopId} ORDER BY word <-> q.w LIMIT 24
      ) v
      WHERE levenshtein(v.word, q.w) <= q.k`)
  ).rows as { w: string; word: string }[];
  for (const r of rows) (out.get(r.w) ?? out.set(r.w, []).get(r.w)!).push(r.word);
  return out;
}

/** A page row's document, as the page reads it (case-doc.ts DocRow). */
const DOC_JSON = sql`json_build_object('id', d.casting_id, 'meltId', d.melt_id, 'partName', d.part_name,
  'pattern', d.pattern, 'pouredOn', d.poured_on, 'alloy', d.alloy, 'process', d.process, 'degassing', d.degassing,
  'outcome', d.outcome, 'marks', d.marks, 'causeId', d.cause_id, 'causeTitle', d.cause_title,
  'causeConfirmed', d.cause_confirmed, 'fixWorked', d.fix_worked, 'createdBy', d.created_by,
  'causesText', d.causes_text, 'notesText', d.notes_text, 'commentsText', d.comments_text)`;

function facetsOf(rows: FacetRow[], titles: Map<string, string>): SearchFacets {
  const out: SearchFacets = { defect: {}, alloy: {}, process: {}, outcome: {}, cause: {} };
  for (const r of rows) {
    if (r.kind === "total" || r.key === null) continue;
    if (r.kind === "cause") out.cause[r.key] = { title: titles.get(r.key) ?? r.title ?? r.key, count: r.n };
    else if (r.kind === "alloy") out.alloy[r.title ?? r.key] = r.n;
    else if (r.kind !== "page") (out[r.kind] as Record<string, number>)[r.key] = r.n;
  }
  return out;
}
