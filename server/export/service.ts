import { stringify } from "csv-stringify/sync";
import { asc, count, desc, eq } from "drizzle-orm";
import { db } from "../db";
import { alloys, castings, diagnosisSnapshots, melts, photos, user } from "../../db/schema";
import type { DiagnosisResult } from "../../rules/engine";
import { marksOf } from "../marks/service";
import { groupBy } from "../notebook/shared";

/**
 * Text a spreadsheet would run as a formula (=, +, -, @, tab, CR) is prefixed with ' so it stays text.
 * Applied to every string cell by the writer (castingsCsv), so no column can skip it; numbers are
 * written as numbers, so a negative temperature is never mistaken for a formula.
 */
export const guardCell = (v: string) => (/^[=+\-@\t\r]/.test(v) ? `'${v}` : v);
const orBlank = (v: string | null) => v ?? "";
const yesNo = (v: boolean | null) => (v === null ? "" : v ? "yes" : "no");
const num = (v: number | null) => (v === null ? "" : v);

/** Column name (trade words, unit in the name) and how to read it from one joined row. */
type Row = Awaited<ReturnType<typeof loadRows>>[number];
const COLUMNS: [string, (r: Row) => string | number][] = [
  ["casting_id", (r) => r.c.id],
  ["melt_id", (r) => r.m.id],
  ["poured_on", (r) => r.m.pouredOn],
  ["alloy", (r) => r.alloy],
  ["process", (r) => r.m.process],
  ["charge", (r) => r.m.charge ?? ""],
  ["furnace", (r) => orBlank(r.m.furnace)],
  ["melt_temp_c", (r) => num(r.m.meltTempC)],
  ["pour_temp_c", (r) => num(r.m.pourTempC)],
  ["superheat_c", (r) => (r.m.pourTempC === null ? "" : Math.round((r.m.pourTempC - r.liquidusC) * 10) / 10)],
  ["degassing", (r) => r.m.degassing ?? ""],
  ["degas_minutes", (r) => num(r.m.degasMinutes)],
  ["fluxed", (r) => yesNo(r.m.fluxed)],
  ["skimmed", (r) => yesNo(r.m.skimmed)],
  ["ambient_temp_c", (r) => num(r.m.ambientTempC)],
  ["humidity_pct", (r) => num(r.m.humidityPct)],
  ["sand_moisture_pct", (r) => num(r.m.sandMoisturePct)],
  ["coating_applied", (r) => yesNo(r.m.coatingApplied)],
  ["coating_dried", (r) => yesNo(r.m.coatingDried)],
  ["coating_coats", (r) => num(r.m.coatingCoats)],
  ["foam_density_kg_m3", (r) => num(r.m.foamDensityKgM3)],
  ["part_name", (r) => orBlank(r.c.partName)],
  ["pattern", (r) => orBlank(r.c.pattern)],
  ["min_section_mm", (r) => num(r.c.minSectionMm)],
  ["max_section_mm", (r) => num(r.c.maxSectionMm)],
  ["sprue_height_mm", (r) => num(r.c.sprueHeightMm)],
  ["pour_time_s", (r) => num(r.c.pourTimeS)],
  ["riser", (r) => yesNo(r.c.hasRiser)],
  ["overflow", (r) => yesNo(r.c.hasOverflow)],
  ["vents", (r) => yesNo(r.c.hasVents)],
  ["orientation", (r) => orBlank(r.c.orientation)],
  ["outcome", (r) => r.c.outcome ?? ""],
  ["marks", (r) => r.marks],
  ["photo_count", (r) => r.photoCount],
  ["likely_cause", (r) => r.likelyCause],
  ["casting_notes", (r) => orBlank(r.c.notes)],
  ["melt_notes", (r) => orBlank(r.m.notes)],
  ["logged_by", (r) => orBlank(r.byName)],
  ["logged_at", (r) => r.c.createdAt.toISOString()],
];

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
  const marks = groupBy(await marksOf(ids), (mk) => mk.castingId);
  const photoCounts = await db
    .select({ castingId: photos.castingId, n: count() })
    .from(photos)
    .where(eq(photos.shopId, shopId))
    .groupBy(photos.castingId);
  // The latest snapshot per casting (PostgreSQL's DISTINCT ON keeps the first row of each group).
  const latest = await db
    .selectDistinctOn([diagnosisSnapshots.castingId], {
      castingId: diagnosisSnapshots.castingId,
      result: diagnosisSnapshots.result,
    })
    .from(diagnosisSnapshots)
    .where(eq(diagnosisSnapshots.shopId, shopId))
    .orderBy(diagnosisSnapshots.castingId, desc(diagnosisSnapshots.createdAt), desc(diagnosisSnapshots.id));
  const photosBy = new Map(photoCounts.map((p) => [p.castingId, p.n]));
  const causeBy = new Map(latest.map((s) => [s.castingId, (s.result as DiagnosisResult).causes[0]?.title ?? ""]));
  return rows.map((r) => ({
    ...r,
    marks: (marks.get(r.c.id) ?? []).map((mk) => `${mk.type} at ${mk.location} (severity ${mk.severity})`).join("; "),
    photoCount: photosBy.get(r.c.id) ?? 0,
    likelyCause: causeBy.get(r.c.id) ?? "",
  }));
}

/** One row per casting with its melt's conditions and its marks; SI units, named in each column. */
export async function castingsCsv(shopId: string): Promise<string> {
  const rows = await loadRows(shopId);
  return stringify([COLUMNS.map(([name]) => name), ...rows.map((r) => COLUMNS.map(([, read]) => read(r)))], {
    bom: true,
    cast: { string: guardCell },
  });
}
