import { and, desc, eq } from "drizzle-orm";
import { db } from "../../db/client";
import { diagnosisSnapshots, user } from "../../db/schema";
import type { DiagnosisSnapshot } from "../../lib/notebook-schemas";
import type { DiagnosisResult } from "../../rules/engine";
import { iso, personRef } from "../notebook/shared";

// Reading a casting's stored diagnoses lives with the casting (its page shows the latest), so
// server/diagnosis depends on server/castings and never the other way round.
type SnapshotRow = typeof diagnosisSnapshots.$inferSelect;
export const toSnapshot = (s: SnapshotRow, byName: string): DiagnosisSnapshot => ({
  id: s.id,
  createdAt: iso(s.createdAt),
  createdBy: personRef(s.createdBy, byName),
  ruleSetVersion: s.ruleSetVersion,
  result: s.result as DiagnosisResult,
});

/** The newest snapshot of this shop's casting, or null when it was never diagnosed. */
export async function latestSnapshot(shopId: string, castingId: number): Promise<DiagnosisSnapshot | null> {
  const [row] = await db
    .select({ s: diagnosisSnapshots, byName: user.name })
    .from(diagnosisSnapshots)
    .innerJoin(user, eq(user.id, diagnosisSnapshots.createdBy))
    .where(and(eq(diagnosisSnapshots.shopId, shopId), eq(diagnosisSnapshots.castingId, castingId)))
    .orderBy(desc(diagnosisSnapshots.createdAt), desc(diagnosisSnapshots.id))
    .limit(1);
  return row ? toSnapshot(row.s, row.byName) : null;
}
