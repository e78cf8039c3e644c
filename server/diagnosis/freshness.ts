import { and, desc, eq } from "drizzle-orm";
import { db } from "../db";
import { diagnosisSnapshots } from "../../db/schema";
import type { DiagnosisFreshness } from "../../lib/notebook-schemas";
import { changedCaseFields } from "../../rules/case-changes";
import { castingInShop } from "../castings/lookup";
import { HttpError } from "../http/errors";
import { marksOf } from "../marks/service";
import { getMelt } from "../melts/service";
import { caseFromCasting } from "./stored-case";

/**
 * Whether the casting's latest diagnosis still answers for it: the case it read (kept in the
 * snapshot) against the case the stored casting, its melt and its marks give now. Timestamps alone
 * would flag a changed note or part name, which no rule reads.
 */
export async function diagnosisFreshness(shopId: string, castingId: number): Promise<DiagnosisFreshness> {
  const casting = await castingInShop(shopId, castingId);
  const [snap] = await db
    .select({ id: diagnosisSnapshots.id, input: diagnosisSnapshots.input })
    .from(diagnosisSnapshots)
    .where(and(eq(diagnosisSnapshots.shopId, shopId), eq(diagnosisSnapshots.castingId, castingId)))
    .orderBy(desc(diagnosisSnapshots.createdAt), desc(diagnosisSnapshots.id))
    .limit(1);
  if (!snap) return { snapshotId: null, stale: false, changed: [] };
  const melt = await getMelt(shopId, casting.meltId);
  let now: Record<string, unknown>;
  try {
    // Through JSON, as the stored input was: absent fields stay absent on both sides.
    now = JSON.parse(JSON.stringify(caseFromCasting(casting, melt, await marksOf([castingId]))));
  } catch (e) {
    // No marks left, or a value the contract cannot read: the old answer no longer fits either way.
    if (e instanceof HttpError) return { snapshotId: snap.id, stale: true, changed: Object.keys(e.fields ?? {}) };
    throw e;
  }
  const changed = changedCaseFields(snap.input as Record<string, unknown>, now);
  return { snapshotId: snap.id, stale: changed.length > 0, changed };
}
