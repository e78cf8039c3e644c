import { sql, type SQL } from "drizzle-orm";
import { reasonText, type SimilarAnswer } from "../../lib/search-schemas";
import type { DefectLocation, DefectType } from "../../rules/case";
import { db } from "../db";
import { notFound } from "../http/errors";
import { summaryOf, type DocRow } from "./case-doc";
import { causeTitles, namesOf } from "./names";
import { ALIKE_MIN, defectBit, likeness, markCode, type SimilarInput } from "./similarity";

/**
 * GET /api/search/castings/:id/similar: "cases like this one" in SQL over the documents' typed
 * columns, with the weights, candidates and order of similarity.ts (which stays the reference the
 * tests compare with). Candidates first, through an index, then only they are scored: a marked
 * target meets cases sharing one of its defect types (GIN index on defect_types); an unmarked one
 * the cases of its alloy and process (the shop-alloy index), widened to its process, then to the
 * shop, only when fewer than `limit` are found. Among cases alike enough, the ones that teach come
 * first. The few found get their likeness and reasons from similarity.ts.
 */
type SimilarRow = DocRow & {
  markPlaces: string[];
  defectTypes: string[];
  alloyKey: string;
  alloyFamily: string;
  superheatC: number | null;
  minSectionMm: number | null;
};

const COLUMNS = sql`casting_id AS "id", melt_id AS "meltId", part_name AS "partName", pattern,
  poured_on::text AS "pouredOn", alloy, alloy_key AS "alloyKey", alloy_family AS "alloyFamily", process, degassing,
  outcome, marks, cause_id AS "causeId", cause_title AS "causeTitle", cause_confirmed AS "causeConfirmed",
  fix_worked AS "fixWorked", created_by AS "createdBy", superheat_c AS "superheatC", min_section_mm AS "minSectionMm",
  causes_text AS "causesText", notes_text AS "notesText", comments_text AS "commentsText",
  mark_places AS "markPlaces", defect_types::text[] AS "defectTypes"`;

export async function similarTo(shopId: string, castingId: number, limit = 5): Promise<SimilarAnswer> {
  const [target] = (
    await db.execute(
      sql`SELECT ${COLUMNS} FROM search_documents WHERE shop_id = ${shopId} AND casting_id = ${castingId}`,
    )
  ).rows as unknown as SimilarRow[];
  if (!target) throw notFound("No such casting");
  const marked = target.marks.length > 0;
  // Without marks: the pools of similarity.ts's UNMARKED_POOLS in turn, until one holds `limit` cases.
  const pools = marked
    ? [sql`true`]
    : [
        sql`d.alloy_key = ${target.alloyKey} AND d.process = ${target.process}::process`,
        sql`d.process = ${target.process}::process`,
        sql`true`,
      ];
  let rows: SimilarRow[] = [];
  for (const pool of pools) {
    rows = (await db.execute(similarStatement(shopId, target, pool, limit))).rows as unknown as SimilarRow[];
    if (rows.length >= limit) break;
  }
  const [names, titles] = await Promise.all([namesOf(rows.map((r) => r.createdBy)), causeTitles(shopId)]);
  const t = asInput(target, titles);
  return {
    items: rows.map((r) => {
      const parts: Parameters<typeof likeness>[2] = [];
      const similarity = likeness(t, asInput(r, titles), parts);
      return { ...summaryOf(r, names, titles), similarity, reason: reasonText(parts), parts };
    }),
  };
}

/**
 * The target's values go in as parameters, not as a join, so the planner sees constants: a marked
 * target's candidates come from the GIN index on defect_types (only cases sharing a type), and
 * every column the score reads is in the covering index (drizzle/0019), so scoring the candidates
 * reads no document rows; only the five kept are read whole. The arithmetic is similarity.ts's, in
 * double precision, rounded to three places as likenessOf rounds.
 */
function similarStatement(shopId: string, t: SimilarRow, pool: SQL, limit: number) {
  const marked = t.marks.length > 0;
  // Per target type: is it shared, and at one of the places the target had it? A few terms, no subquery per row.
  const byType = new Map<string, string[]>();
  for (const place of t.markPlaces) {
    const type = place.split("@")[0];
    byType.set(type, [...(byType.get(type) ?? []), place]);
  }
  const terms = (f: (type: string, places: string[]) => SQL) =>
    sql.join(
      [...byType].map(([type, places]) => sql`(${f(type, places)})::int`),
      sql` + `,
    );
  const shared = terms((type) => sql`${type}::defect_type = ANY(d.defect_types)`);
  const sameSpot = terms((_, places) => sql`d.mark_places && ${sql.param(places)}::text[]`);
  const types = sql`${sql.param([...byType.keys()])}::defect_type[]`;
  // Types either case has: the candidate's, plus the target's it lacks.
  const defects = marked
    ? sql`0.5 * ((${sameSpot}) + 0.6 * ((${shared}) - (${sameSpot})))::float8
        / (cardinality(d.defect_types) + ${byType.size} - (${shared}))`
    : sql`0`;
  const superheat =
    t.superheatC === null
      ? sql`0`
      : sql`CASE WHEN d.superheat_c IS NULL THEN 0
    ELSE 0.1 * greatest(0, 1 - abs(d.superheat_c - ${t.superheatC}::float8) / 60) END`;
  const section = !t.minSectionMm
    ? sql`0`
    : sql`CASE WHEN coalesce(d.min_section_mm, 0) = 0 THEN 0
        WHEN greatest(d.min_section_mm, ${t.minSectionMm}::float8) / least(d.min_section_mm, ${t.minSectionMm}::float8) <= 1.25 THEN 0.1
        WHEN greatest(d.min_section_mm, ${t.minSectionMm}::float8) / least(d.min_section_mm, ${t.minSectionMm}::float8) <= 2 THEN 0.05
        ELSE 0 END`;
  return sql`
    WITH scored AS MATERIALIZED (
      SELECT d.casting_id, d.poured_on,
        round((${defects}
          + CASE WHEN d.process = ${t.process}::process THEN 0.15 ELSE 0 END
          + CASE WHEN d.alloy_key = ${t.alloyKey} THEN 0.1 WHEN d.alloy_family = ${t.alloyFamily}::alloy_family THEN 0.05 ELSE 0 END
          + ${superheat}
          + ${t.degassing ? sql`CASE WHEN d.degassing = ${t.degassing}::degassing_method THEN 0.05 ELSE 0 END` : sql`0`}
          + ${section})::numeric, 3) AS similarity,
        d.cause_confirmed::int + (d.fix_worked IS NOT DISTINCT FROM 'yes')::int AS teaches
      FROM search_documents d
      WHERE d.shop_id = ${shopId} AND d.casting_id <> ${t.id} AND ${pool}
        ${marked ? sql`AND d.defect_types && ${types}` : sql``}
    )
    SELECT ${COLUMNS} FROM (
      SELECT casting_id, row_number() OVER (
        ORDER BY similarity >= ${ALIKE_MIN} DESC, CASE WHEN similarity >= ${ALIKE_MIN} THEN teaches ELSE 0 END DESC,
          similarity DESC, poured_on DESC, casting_id DESC) AS place
      FROM scored ORDER BY place LIMIT ${limit}
    ) best JOIN search_documents USING (casting_id)
    ORDER BY best.place`;
}

/** A document as similarity.ts compares it. */
function asInput(r: SimilarRow, titles: Map<string, string>): SimilarInput {
  const summary = summaryOf(r, new Map(), titles);
  return {
    ...summary,
    defectMask: r.marks.reduce((m, x) => m | defectBit(x.type as DefectType), 0),
    markCodes: r.marks.map((x) => markCode(x.type as DefectType, x.location as DefectLocation)),
    alloyKey: r.alloyKey,
    alloyFamily: r.alloyFamily,
    superheatC: r.superheatC,
    degassing: r.degassing,
    minSectionMm: r.minSectionMm,
  };
}
