import { and, asc, desc, eq, inArray, lt, sql, type SQL } from "drizzle-orm";
import type { PgColumn } from "drizzle-orm/pg-core";
import { db } from "../db";
import {
  alloys,
  castings,
  comments,
  confirmations,
  defectMarks,
  diagnosisSnapshots,
  fixesTried,
  melts,
  searchChanges,
} from "../../db/schema";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { causesOf } from "../rulebook/context";
import { caseDocs, type CaseDoc } from "./case-doc";

/**
 * What the casebook index reads from PostgreSQL: a shop's cases (all, or the ones that changed),
 * and the change log the triggers keep (db/search-schema.ts). Reads run in one REPEATABLE READ
 * transaction so the cases and the snapshot's xmin agree: every transaction below xmin is in
 * what was read, every later one will show up in the log.
 */
export type Loaded = { docs: CaseDoc[]; xmin: number; seen: number[] };
export type Changes = { xmin: number; changes: { id: number; castingId: number }[] };

const xminOf = sql<string>`pg_snapshot_xmin(pg_current_snapshot())::text`;

export async function loadCases(shopId: string, ids?: number[]): Promise<Loaded> {
  const only = (col: PgColumn): SQL | undefined => (ids ? inArray(col, ids) : undefined);
  const causeTitles = new Map([...BUILT_IN_RULE_SET.causes, ...(await causesOf(shopId))].map((c) => [c.id, c.title]));
  return db.transaction(
    async (tx) => {
      const [{ xmin }] = await tx.select({ xmin: xminOf }).from(sql`(select 1) as one`);
      const castingRows = await tx
        .select({
          id: castings.id,
          meltId: castings.meltId,
          partName: castings.partName,
          pattern: castings.pattern,
          outcome: castings.outcome,
          notes: castings.notes,
          createdBy: castings.createdBy,
          minSectionMm: castings.minSectionMm,
          pouredOn: melts.pouredOn,
          process: melts.process,
          degassing: melts.degassing,
          pourTempC: melts.pourTempC,
          meltNotes: melts.notes,
          alloy: alloys.designation,
          alloyFamily: alloys.family,
          liquidusC: alloys.liquidusC,
        })
        .from(castings)
        .innerJoin(melts, eq(melts.id, castings.meltId))
        .innerJoin(alloys, eq(alloys.id, melts.alloyId))
        .where(and(eq(castings.shopId, shopId), only(castings.id)));
      const marks = await tx
        .select({
          castingId: defectMarks.castingId,
          type: defectMarks.type,
          location: defectMarks.location,
          severity: defectMarks.severity,
          note: defectMarks.note,
        })
        .from(defectMarks)
        .where(and(eq(defectMarks.shopId, shopId), only(defectMarks.castingId)))
        .orderBy(asc(defectMarks.id));
      const commentRows = await tx
        .select({ castingId: comments.castingId, body: comments.body })
        .from(comments)
        .where(and(eq(comments.shopId, shopId), only(comments.castingId)))
        .orderBy(asc(comments.createdAt), asc(comments.id));
      const r = diagnosisSnapshots.result;
      const diagnoses = await tx
        .selectDistinctOn([diagnosisSnapshots.castingId], {
          castingId: diagnosisSnapshots.castingId,
          topId: sql<string | null>`${r}->'causes'->0->>'id'`,
          topTitle: sql<string | null>`${r}->'causes'->0->>'title'`,
          secondTitle: sql<string | null>`${r}->'causes'->1->>'title'`,
          fixes: sql<unknown>`${r}->'causes'->0->'fixes'`,
        })
        .from(diagnosisSnapshots)
        .where(and(eq(diagnosisSnapshots.shopId, shopId), only(diagnosisSnapshots.castingId)))
        .orderBy(diagnosisSnapshots.castingId, desc(diagnosisSnapshots.createdAt), desc(diagnosisSnapshots.id));
      // The newest confirmation counts (mentor-schema.ts).
      const confirmationRows = await tx
        .selectDistinctOn([confirmations.castingId], {
          castingId: confirmations.castingId,
          causeId: confirmations.causeId,
          causeText: confirmations.causeText,
        })
        .from(confirmations)
        .where(and(eq(confirmations.shopId, shopId), only(confirmations.castingId)))
        .orderBy(confirmations.castingId, desc(confirmations.id));
      const fixes = await tx
        .select({ castingId: fixesTried.castingId, fix: fixesTried.fix, worked: fixesTried.worked })
        .from(fixesTried)
        .where(and(eq(fixesTried.shopId, shopId), only(fixesTried.castingId)))
        .orderBy(asc(fixesTried.id));
      const seen = await tx
        .select({ id: searchChanges.id })
        .from(searchChanges)
        .where(and(eq(searchChanges.shopId, shopId), sql`${searchChanges.xid} >= ${xmin}::bigint`));
      const docs = caseDocs({
        castings: castingRows,
        marks,
        comments: commentRows,
        diagnoses,
        confirmations: confirmationRows,
        fixes,
        causeTitles,
      });
      return { docs, xmin: Number(xmin), seen: seen.map((s) => s.id) };
    },
    { isolationLevel: "repeatable read", accessMode: "read only" },
  );
}

/** One indexed lookup: the log rows of transactions that may have committed since `watermark`. */
export async function changesSince(shopId: string, watermark: number): Promise<Changes> {
  const rows = await db
    .select({ xmin: xminOf, id: searchChanges.id, castingId: searchChanges.castingId })
    .from(sql`(select 1) as one`)
    .leftJoin(searchChanges, and(eq(searchChanges.shopId, shopId), sql`${searchChanges.xid} >= ${watermark}::bigint`));
  const changes = rows.flatMap((r) =>
    r.id === null || r.castingId === null ? [] : [{ id: r.id, castingId: r.castingId }],
  );
  return { xmin: Number(rows[0].xmin), changes };
}

/** Log rows older than this are deleted; an index not refreshed for half as long rebuilds instead. */
export const CHANGE_LOG_KEEP_MS = 24 * 3600_000;
export async function pruneChangeLog() {
  await db.delete(searchChanges).where(lt(searchChanges.loggedAt, new Date(Date.now() - CHANGE_LOG_KEEP_MS)));
}
