import { sql } from "drizzle-orm";
import { reasonText, type SimilarAnswer } from "../../lib/search-schemas";
import type { DefectLocation, DefectType } from "../../rules/case";
import { db } from "../db";
import { notFound } from "../http/errors";
import { summaryOf, type DocRow } from "./case-doc";
import { causeTitles, namesOf } from "./names";
import { ALIKE_MIN, defectBit, likeness, markCode, type SimilarInput } from "./similarity";

/**
 * GET /api/search/castings/:id/similar: "cases like this one" in SQL over the documents' typed
 * columns, with the weights and order of similarity.ts (which stays the reference the tests compare
 * with): a marked target only meets cases sharing one of its defect types (GIN index on
 * defect_types); among cases alike enough, the ones that teach come first. The few found get their
 * likeness and reasons from similarity.ts.
 */
type SimilarRow = DocRow & {
  alloyKey: string;
  alloyFamily: string;
  superheatC: number | null;
  minSectionMm: number | null;
};

const COLUMNS = sql`casting_id AS "id", melt_id AS "meltId", part_name AS "partName", pattern,
  poured_on::text AS "pouredOn", alloy, alloy_key AS "alloyKey", alloy_family AS "alloyFamily", process, degassing,
  outcome, marks, cause_id AS "causeId", cause_title AS "causeTitle", cause_confirmed AS "causeConfirmed",
  fix_worked AS "fixWorked", created_by AS "createdBy", superheat_c AS "superheatC", min_section_mm AS "minSectionMm",
  causes_text AS "causesText", notes_text AS "notesText", comments_text AS "commentsText"`;

export async function similarTo(shopId: string, castingId: number, limit = 5): Promise<SimilarAnswer> {
  const [target] = (
    await db.execute(
      sql`SELECT ${COLUMNS} FROM search_documents WHERE shop_id = ${shopId} AND casting_id = ${castingId}`,
    )
  ).rows as unknown as SimilarRow[];
  if (!target) throw notFound("No such casting");
  const marked = target.marks.length > 0;
  // Shared types count 1 at the same place, 0.6 elsewhere, over every type either case has.
  const defects = marked
    ? sql`(SELECT 0.5 * (count(DISTINCT split_part(p, '@', 1)) FILTER (WHERE p = ANY(t.mark_places))
            + 0.6 * ((SELECT count(*) FROM (SELECT unnest(d.defect_types) INTERSECT SELECT unnest(t.defect_types)) s)
                     - count(DISTINCT split_part(p, '@', 1)) FILTER (WHERE p = ANY(t.mark_places))))
            / (SELECT count(*) FROM (SELECT unnest(d.defect_types) UNION SELECT unnest(t.defect_types)) u)
          FROM unnest(d.mark_places) p)`
    : sql`0`;
  const rows = (
    await db.execute(sql`
      WITH t AS (SELECT * FROM search_documents WHERE casting_id = ${castingId}),
      scored AS (
        SELECT d.casting_id, d.poured_on,
          round((coalesce(${defects}, 0)
            + CASE WHEN d.process = t.process THEN 0.15 ELSE 0 END
            + CASE WHEN d.alloy_key = t.alloy_key THEN 0.1 WHEN d.alloy_family = t.alloy_family THEN 0.05 ELSE 0 END
            + CASE WHEN d.superheat_c IS NULL OR t.superheat_c IS NULL THEN 0
                ELSE 0.1 * greatest(0, 1 - abs(d.superheat_c - t.superheat_c) / 60) END
            + CASE WHEN t.degassing IS NOT NULL AND d.degassing = t.degassing THEN 0.05 ELSE 0 END
            + CASE WHEN coalesce(d.min_section_mm, 0) = 0 OR coalesce(t.min_section_mm, 0) = 0 THEN 0
                WHEN greatest(d.min_section_mm, t.min_section_mm) / least(d.min_section_mm, t.min_section_mm) <= 1.25 THEN 0.1
                WHEN greatest(d.min_section_mm, t.min_section_mm) / least(d.min_section_mm, t.min_section_mm) <= 2 THEN 0.05
                ELSE 0 END)::numeric, 3) AS similarity,
          d.cause_confirmed::int + (d.fix_worked IS NOT DISTINCT FROM 'yes')::int AS teaches
        FROM search_documents d, t
        WHERE d.shop_id = t.shop_id AND d.casting_id <> t.casting_id
          ${marked ? sql`AND d.defect_types && t.defect_types` : sql``}
      )
      SELECT ${COLUMNS} FROM (
        SELECT casting_id, row_number() OVER (
          ORDER BY similarity >= ${ALIKE_MIN} DESC, CASE WHEN similarity >= ${ALIKE_MIN} THEN teaches ELSE 0 END DESC,
            similarity DESC, poured_on DESC, casting_id DESC) AS place
        FROM scored ORDER BY place LIMIT ${limit}
      ) best JOIN search_documents USING (casting_id)
      ORDER BY best.place`)
  ).rows as unknown as SimilarRow[];
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
