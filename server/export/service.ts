import { stringify } from "csv-stringify/sync";
import { asc, count, desc, eq } from "drizzle-orm";
import { db } from "../db";
import { alloys, castings, confirmations, diagnosisSnapshots, fixesTried, melts, photos, user } from "../../db/schema";
import type { Units } from "../../lib/notebook-schemas";
import type { DiagnosisResult } from "../../rules/engine";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { marksOf } from "../marks/service";
import { groupBy } from "../notebook/shared";
import { causesOf } from "../rulebook/context";
import { columnsIn } from "./columns";

/**
 * Text a spreadsheet would run as a formula (=, +, -, @, tab, CR) is prefixed with ' so it stays text.
 * Applied to every string cell by the writer (castingsCsv), so no column can skip it; numbers are
 * written as numbers, so a negative temperature is never mistaken for a formula.
 */
export const guardCell = (v: string) => (/^[=+\-@\t\r]/.test(v) ? `'${v}` : v);

export type ExportRow = Awaited<ReturnType<typeof loadRows>>[number];

/** The newest confirmation per casting, its cause in words (a cause id read through the rulebook's titles). */
async function confirmedCauses(shopId: string) {
  const [latest, shopCauses] = await Promise.all([
    db
      .selectDistinctOn([confirmations.castingId], {
        castingId: confirmations.castingId,
        causeId: confirmations.causeId,
        causeText: confirmations.causeText,
      })
      .from(confirmations)
      .where(eq(confirmations.shopId, shopId))
      .orderBy(confirmations.castingId, desc(confirmations.id)),
    causesOf(shopId),
  ]);
  const titles = new Map([...BUILT_IN_RULE_SET.causes, ...shopCauses].map((c) => [c.id, c.title]));
  return new Map(
    latest.map((c) => [c.castingId, c.causeId ? (titles.get(c.causeId) ?? c.causeId) : (c.causeText ?? "")]),
  );
}

async function loadRows(shopId: string) {
  const rows = await db
    .select({ c: castings, m: melts, alloy: alloys.designation, liquidusC: alloys.liquidusC, byName: user.name })
    .from(castings)
    .innerJoin(melts, eq(melts.id, castings.meltId))
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .innerJoin(user, eq(user.id, castings.createdBy))
    .where(eq(castings.shopId, shopId))
    .orderBy(asc(melts.pouredOn), asc(castings.id));
  const ids = rows.map((r) => r.c.id);
  const [markRows, photoCounts, latest, confirmed, fixRows] = await Promise.all([
    marksOf(ids),
    db
      .select({ castingId: photos.castingId, n: count() })
      .from(photos)
      .where(eq(photos.shopId, shopId))
      .groupBy(photos.castingId),
    // The latest snapshot per casting (PostgreSQL's DISTINCT ON keeps the first row of each group).
    db
      .selectDistinctOn([diagnosisSnapshots.castingId], {
        castingId: diagnosisSnapshots.castingId,
        result: diagnosisSnapshots.result,
      })
      .from(diagnosisSnapshots)
      .where(eq(diagnosisSnapshots.shopId, shopId))
      .orderBy(diagnosisSnapshots.castingId, desc(diagnosisSnapshots.createdAt), desc(diagnosisSnapshots.id)),
    confirmedCauses(shopId),
    db
      .select({ castingId: fixesTried.castingId, fix: fixesTried.fix, worked: fixesTried.worked })
      .from(fixesTried)
      .where(eq(fixesTried.shopId, shopId))
      .orderBy(asc(fixesTried.id)),
  ]);
  const marks = groupBy(markRows, (mk) => mk.castingId);
  const fixes = groupBy(fixRows, (f) => f.castingId);
  const photosBy = new Map(photoCounts.map((p) => [p.castingId, p.n]));
  const causeBy = new Map(latest.map((s) => [s.castingId, (s.result as DiagnosisResult).causes[0]?.title ?? ""]));
  return rows.map((r) => ({
    ...r,
    marks: (marks.get(r.c.id) ?? []).map((mk) => `${mk.type} at ${mk.location} (severity ${mk.severity})`).join("; "),
    photoCount: photosBy.get(r.c.id) ?? 0,
    likelyCause: causeBy.get(r.c.id) ?? "",
    confirmedCause: confirmed.get(r.c.id) ?? "",
    fixes: fixes.get(r.c.id) ?? [],
  }));
}

/** One row per casting with its melt's conditions, its marks and what was learned, in the units asked for. */
export async function castingsCsv(shopId: string, units: Units): Promise<string> {
  const rows = await loadRows(shopId);
  const columns = columnsIn(units);
  return stringify([columns.map(([name]) => name), ...rows.map((r) => columns.map(([, read]) => read(r)))], {
    bom: true,
    cast: { string: guardCell },
  });
}
