import { sql, type SQL } from "drizzle-orm";
import type { CaseHit, SearchAnswer, SearchFacets, SearchParams, SearchSort } from "../../lib/search-schemas";
import { db } from "../db";
import { env } from "../env";
import { HttpError } from "../http/errors";
import { alloyKey, fieldsOf, summaryOf, type DocRow } from "./case-doc";
import { markPage } from "./marks";
import { causeTitles, checkNames } from "./names";
import { answerKey, keep, keptAnswer, stillHolds, versionsOf } from "./answers";
import { queryTerms, tsquery, tsqueryText, type QueryTerm } from "./query-words";
import { similarWords } from "./similar-words";

/**
 * GET /api/search over `search_documents`. An answer this server already gave is given again when
 * the shop's documents version and revision, read first, are still the ones it was computed at
 * (answers.ts: one indexed read). Otherwise, waiting on the database twice more:
 * 1. at once, on up to three connections: the shop's cause titles, the names the filters use, and
 *    each query word of 3+ letters widened to the shop's words within its slips (similar-words.ts: trigram index on `search_words`,
 *    then levenshtein, looked up only for words this server has not already found at the shop's
 *    vocabulary version, which the same statement reads); a tsquery is built from those words;
 * 2. one statement narrows the shop's documents (GIN index on the words, typed columns for the
 *    filters) and picks one page in date order (the shop's date index, by OFFSET or by keyset
 *    `after`) or in relevance order (ts_rank), with the page's people's names;
 * 3. the same statement counts the matches and each chip with the other filters applied (GROUP BY),
 *    over at most the newest SEARCH_COUNT_LIMIT matches (1,000 by default): read in date order from
 *    the covering index, so a count stops there instead of walking every case of a large shop.
 *    Under the limit every figure is exact; over it the answer says so (`totalExact`,
 *    `facetsExact`), the total is the limit ("1,000+") and the chips count the newest matches.
 *    Relevance then ranks those newest matches, their documents fetched again by ctid;
 * 4. Fuse.js re-ranks that page and marks its matched words.
 * Measured at 100,000 cases by scripts/bench-search.ts (the figures are in its output): with words,
 * most of the statement's time is reading every matching row once (about 1.3 µs a row, 11,000
 * rows for "porosty"); a narrower table of just the counted columns and the words read as slowly
 * (the rows' count, not their width, sets the cost), so it was not kept.
 */
type Hit = { kind: "page" | "total" | "sampled" | "defect" | "alloy" | "process" | "outcome" | "cause" };
type FacetRow = Hit & { key: string | null; title: string | null; n: number };
type PageRow = Hit & { id: number; rank: string; poured_on: string; doc: DocRow & { createdByName: string | null } };

export async function searchCases(shopId: string, p: SearchParams): Promise<SearchAnswer> {
  const key = answerKey(shopId, p);
  const before = keptAnswer(key);
  const terms = queryTerms(p.q);
  // At once: the shop's versions, its cause titles, the filters' names and (unless an answer is kept,
  // which usually still holds) the query words' similar words.
  const cause = causeTitles(shopId);
  const [now, titles, , first] = await Promise.all([
    versionsOf(shopId, before?.people ?? []),
    cause,
    checkNames(shopId, p, cause),
    before ? null : similarWords(shopId, terms),
  ]);
  const held = stillHolds(before, now);
  if (held) return held;
  const answer = await answerOf(shopId, p, terms, titles, first ?? (await similarWords(shopId, terms)));
  keep(key, now, answer);
  return answer;
}

async function answerOf(
  shopId: string,
  p: SearchParams,
  terms: QueryTerm[],
  titles: Map<string, string>,
  similar: Map<string, string[]>,
): Promise<SearchAnswer> {
  const sort: SearchSort = terms.length ? (p.sort ?? "relevance") : p.sort === "date-asc" ? "date-asc" : "date-desc";
  const q = terms.length ? tsquery(tsqueryText(terms, similar)) : null;
  const limit = env.SEARCH_COUNT_LIMIT;
  const rows = (await db.execute(matchStatement(shopId, p, sort, q, limit))).rows as unknown as (FacetRow | PageRow)[];
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
  // The page's people's names came with the page (DOC_JSON), not in a round trip of their own.
  const names = new Map(pageRows.map((r) => [r.doc.createdBy, r.doc.createdByName ?? ""]));
  const items: CaseHit[] = page.map((d, i) => ({
    ...summaryOf(d, names, titles),
    score: scores[i],
    marked: marked[i],
  }));
  const last = pageRows[pageRows.length - 1];
  const counted = Number(facetRows.find((r) => r.kind === "total")?.n ?? 0);
  const totalExact = counted <= limit;
  const total = Math.min(counted, limit);
  const seen = p.after ? null : (p.page - 1) * p.pageSize + pageRows.length;
  // Past the count limit, date order pages on through the index; relevance has ranked only the newest matches.
  const reach = totalExact || sort === "relevance" ? total : Infinity;
  const more = pageRows.length === p.pageSize && (seen === null || seen < reach);
  return {
    items,
    total,
    totalExact,
    facetsExact: totalExact && !facetRows.some((r) => r.kind === "sampled" && r.n > limit),
    countLimit: limit,
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

const CHIPS = ["defect", "alloy", "process", "outcome", "cause"] as const;
type Chip = (typeof CHIPS)[number];

/**
 * One statement: the page, the count of matches and each chip's counts. `base` is the shop's
 * matches before the chip filters, each row with a flag per chip filter. Each count reads a
 * bounded set, the newest `limit + 1` rows of `base` that pass the filters it depends on: all of
 * them for the total (`s_all`), all but its own for a chip group whose filter is on (`s_defect`...),
 * so "how many cases would this chip leave" keeps its meaning. Without words `base` is not
 * materialised, and each set is an index-only scan of the covering index in date order that stops
 * at the limit; with words it is the GIN index's matches, read once.
 */
function matchStatement(shopId: string, p: SearchParams, sort: SearchSort, q: SQL | null, limit: number): SQL {
  const any = (column: SQL, values: string[] | undefined, type: string) =>
    values?.length ? sql`${column} = ANY(${sql.param(values)}::${sql.raw(type)}[])` : null;
  const chipTests: Record<Chip, SQL | null> = {
    defect: p.defect?.length ? sql`d.defect_types && ${sql.param(p.defect)}::defect_type[]` : null,
    alloy: any(sql`d.alloy_key`, p.alloy?.map(alloyKey), "text"),
    process: any(sql`d.process`, p.process, "process"),
    outcome: any(sql`d.outcome`, p.outcome, "outcome"),
    cause: any(sql`d.cause_id`, p.cause, "text"),
  };
  const on = CHIPS.filter((c) => chipTests[c] !== null);
  const where = sql.join(
    [
      sql`d.shop_id = ${shopId}`,
      q ? sql`d.document @@ ${q}` : sql`true`,
      any(sql`d.created_by`, p.by, "text") ?? sql`true`,
      p.from ? sql`d.poured_on >= ${p.from}::date` : sql`true`,
      p.to ? sql`d.poured_on <= ${p.to}::date` : sql`true`,
    ],
    sql` AND `,
  );
  const flags = on.map((c) => sql`, ${chipTests[c]} AS ${sql.raw(`f_${c}`)}`);
  const passing = (chips: readonly Chip[]) =>
    chips.length
      ? sql.join(
          chips.map((c) => sql.raw(`f_${c}`)),
          sql` AND `,
        )
      : sql`true`;
  const newest = sql`ORDER BY poured_on DESC, casting_id DESC LIMIT ${limit + 1}`;
  const bounded = (name: string, chips: readonly Chip[]) =>
    sql`, ${sql.raw(name)} AS MATERIALIZED (SELECT casting_id, ${tid} poured_on, defect_types, alloy_key, alloy, process,
      outcome, cause_id FROM base WHERE ${passing(chips)} ${newest})`;
  const setOf = (c: Chip) => sql.raw(on.includes(c) ? `s_${c}` : "s_all");
  // With words, `base` is read from the heap once: its rows' ctid fetches the documents again (ranking,
  // the page) without a walk down the primary key each. Without words the sets are index-only scans,
  // which cannot return a ctid.
  const tid = q ? sql`tid,` : sql``;
  const desc = sort !== "date-asc";
  const order =
    sort === "relevance"
      ? sql`h.rank DESC, h.poured_on DESC, h.casting_id DESC`
      : desc
        ? sql`h.poured_on DESC, h.casting_id DESC`
        : sql`h.poured_on ASC, h.casting_id ASC`;
  const keyset = p.after ? afterCondition(sort, p.after) : sql`true`;
  const offset = p.after ? 0 : (p.page - 1) * p.pageSize;
  // Relevance ranks the newest matches (s_all, at most the count limit); date order reads `base` itself.
  const candidates =
    sort === "relevance" && q
      ? sql`(SELECT s.casting_id, s.tid, s.poured_on, ts_rank(r.document, ${q}) AS rank
          FROM (SELECT * FROM s_all ORDER BY poured_on DESC, casting_id DESC LIMIT ${limit}) s
          JOIN search_documents r ON r.ctid = s.tid)`
      : sql`(SELECT casting_id, ${tid} poured_on, 0::real AS rank FROM base WHERE ${passing(on)})`;
  return sql`
    WITH base AS ${q ? sql`MATERIALIZED` : sql`NOT MATERIALIZED`} (
      SELECT d.casting_id, ${q ? sql`d.ctid AS tid,` : sql``} d.poured_on, d.defect_types, d.alloy_key, d.alloy, d.process, d.outcome,
        d.cause_id ${sql.join(flags, sql``)}
      FROM search_documents d WHERE ${where}
    )
    ${bounded("s_all", on)}
    ${sql.join(
      on.map((c) =>
        bounded(
          `s_${c}`,
          on.filter((o) => o !== c),
        ),
      ),
      sql``,
    )}
    SELECT 'total' AS kind, NULL AS key, NULL AS title, count(*)::int AS n, NULL::int AS id, NULL AS rank,
        NULL AS poured_on, NULL::json AS doc
      FROM s_all
    ${sql.join(
      on.map(
        (c) => sql`UNION ALL SELECT 'sampled', ${c}, NULL, count(*)::int, NULL, NULL, NULL, NULL FROM ${setOf(c)}`,
      ),
      sql` `,
    )}
    UNION ALL
    SELECT 'defect', t::text, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM (SELECT defect_types FROM ${setOf("defect")} ${newestOf(limit)}) s, unnest(defect_types) t GROUP BY t
    UNION ALL
    SELECT 'alloy', alloy_key, min(alloy), count(*)::int, NULL, NULL, NULL, NULL
      FROM (SELECT alloy_key, alloy FROM ${setOf("alloy")} ${newestOf(limit)}) s GROUP BY alloy_key
    UNION ALL
    SELECT 'process', process::text, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM (SELECT process FROM ${setOf("process")} ${newestOf(limit)}) s GROUP BY process
    UNION ALL
    SELECT 'outcome', outcome::text, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM (SELECT outcome FROM ${setOf("outcome")} ${newestOf(limit)}) s WHERE outcome IS NOT NULL GROUP BY outcome
    UNION ALL
    SELECT 'cause', cause_id, NULL, count(*)::int, NULL, NULL, NULL, NULL
      FROM (SELECT cause_id FROM ${setOf("cause")} ${newestOf(limit)}) s WHERE cause_id IS NOT NULL GROUP BY cause_id
    UNION ALL
    SELECT 'page', NULL, NULL, NULL::int, p.casting_id, p.rank::text, p.poured_on::text, ${DOC_JSON}
    FROM (
      SELECT h.casting_id, ${tid} h.rank, h.poured_on FROM ${candidates} h
      WHERE ${keyset}
      ORDER BY ${order} LIMIT ${p.pageSize} OFFSET ${offset}
    ) p JOIN search_documents d ON ${q ? sql`d.ctid = p.tid` : sql`d.casting_id = p.casting_id`}`;
}

/** The newest `limit` rows of a bounded set (which holds one more, to tell that there were more). */
const newestOf = (limit: number) => sql`ORDER BY poured_on DESC, casting_id DESC LIMIT ${limit}`;

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

/** A page row's document, as the page reads it (case-doc.ts DocRow). */
const DOC_JSON = sql`json_build_object('id', d.casting_id, 'meltId', d.melt_id, 'partName', d.part_name,
  'pattern', d.pattern, 'pouredOn', d.poured_on, 'alloy', d.alloy, 'process', d.process, 'degassing', d.degassing,
  'outcome', d.outcome, 'marks', d.marks, 'causeId', d.cause_id, 'causeTitle', d.cause_title,
  'causeConfirmed', d.cause_confirmed, 'fixWorked', d.fix_worked, 'createdBy', d.created_by,
  'causesText', d.causes_text, 'notesText', d.notes_text, 'commentsText', d.comments_text,
  'createdByName', (SELECT u.name FROM "user" u WHERE u.id = d.created_by))`;

function facetsOf(rows: FacetRow[], titles: Map<string, string>): SearchFacets {
  const out: SearchFacets = { defect: {}, alloy: {}, process: {}, outcome: {}, cause: {} };
  for (const r of rows) {
    if (r.kind === "total" || r.kind === "sampled" || r.key === null) continue;
    if (r.kind === "cause") out.cause[r.key] = { title: titles.get(r.key) ?? r.title ?? r.key, count: r.n };
    else if (r.kind === "alloy") out.alloy[r.title ?? r.key] = r.n;
    else if (r.kind !== "page") (out[r.kind] as Record<string, number>)[r.key] = r.n;
  }
  return out;
}
