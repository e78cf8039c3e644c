import { eq } from "drizzle-orm";
import { db } from "../../db/client";
import { alloys, diagnosisSnapshots, melts } from "../../db/schema";
import type { DiagnosisSnapshot } from "../../lib/notebook-schemas";
import { caseSchema } from "../../rules/case";
import { diagnose, type DiagnosisResult } from "../../rules/engine";
import { requireAlloy, toAlloySpec } from "../alloys/service";
import type { ShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";
import { toSnapshot } from "../castings/snapshots";
import { parseOr400 } from "../http/errors";
import { marksOf } from "../marks/service";
import { getMelt } from "../melts/service";
import { caseFromCasting } from "./stored-case";
import { shopDiagnosis } from "../rulebook/context";

/**
 * Every diagnosis uses the shop's rule set (built-ins + its published rules − built-ins it
 * switched off, via ruleSetFor), weights tuned by its confirmed cases, and gives each cause its record
 * here ("right in 7 of 9 confirmed cases"). All of that lives in server/rulebook/context.ts.
 */

/** A case as sent: the contract's checks, then the alloy against this shop's table (built-ins and its own). */
export async function diagnoseCase(shopId: string, body: unknown): Promise<DiagnosisResult> {
  const c = parseOr400(caseSchema, body);
  const alloy = await requireAlloy(shopId, c.alloy);
  const shop = await shopDiagnosis(shopId);
  return shop.withRecords(
    await diagnose(c, { alloy: toAlloySpec(alloy), ruleSet: shop.ruleSet, weightFactor: shop.weightFactor }),
  );
}

/** Runs the stored casting and keeps what it said, so the answer can be read again after the rules change. */
export async function diagnoseCasting(m: ShopMember, castingId: number): Promise<DiagnosisSnapshot> {
  const casting = await castingInShop(m.shopId, castingId);
  const melt = await getMelt(m.shopId, casting.meltId);
  const c = caseFromCasting(casting, melt, await marksOf([castingId]));
  // The melt points at its alloy row: use it, not the name, so a shop alloy is read exactly.
  const [{ alloy }] = await db
    .select({ alloy: alloys })
    .from(melts)
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .where(eq(melts.id, casting.meltId));
  const shop = await shopDiagnosis(m.shopId);
  const rs = shop.ruleSet;
  const result = shop.withRecords(
    await diagnose(c, { alloy: toAlloySpec(alloy), ruleSet: rs, weightFactor: shop.weightFactor }),
  );
  const [row] = await db
    .insert(diagnosisSnapshots)
    .values({
      shopId: m.shopId,
      castingId,
      ruleSetVersion: rs.version,
      input: c,
      result,
      createdBy: m.userId,
    })
    .returning();
  return toSnapshot(row, m.userName);
}
