import { and, desc, eq, exists, inArray, sql } from "drizzle-orm";
import { db } from "../db";
import { alloys, castings, confirmations, defectMarks, melts } from "../../db/schema";
import type { StoredCase } from "../../rules/backtest";
import { toAlloySpec } from "../alloys/service";
import { caseFromCasting } from "../diagnosis/stored-case";
import { marksOf } from "../marks/service";
import { toMelt } from "../melts/service";

/** A rule trial reads at most this many of the newest cases (a small shop's years of pours). */
export const CASE_LIMIT = 2000;

/** The newest confirmation per casting: what a mentor last said caused it. */
export async function latestConfirmations(shopId: string, castingIds?: number[]) {
  const rows = await db
    .selectDistinctOn([confirmations.castingId])
    .from(confirmations)
    .where(and(eq(confirmations.shopId, shopId), castingIds ? inArray(confirmations.castingId, castingIds) : undefined))
    .orderBy(confirmations.castingId, desc(confirmations.id));
  return new Map(rows.map((r) => [r.castingId, r]));
}

/**
 * The shop's marked castings as diagnosis cases, built as the diagnosis service builds one
 * (server/diagnosis/stored-case.ts), each with the alloy row its melt points at and the confirmed cause.
 * A casting whose stored values the contract cannot read is left out, as it could not be diagnosed either.
 * Without `castingIds`, the newest CASE_LIMIT.
 */
export async function storedCases(
  shopId: string,
  opts: { confirmedOnly?: boolean; castingIds?: number[] } = {},
): Promise<StoredCase[]> {
  const marked = exists(
    db
      .select({ one: sql`1` })
      .from(defectMarks)
      .where(eq(defectMarks.castingId, castings.id)),
  );
  const confirmed = exists(
    db
      .select({ one: sql`1` })
      .from(confirmations)
      .where(eq(confirmations.castingId, castings.id)),
  );
  const rows = await db
    .select({ c: castings, m: melts, a: alloys })
    .from(castings)
    .innerJoin(melts, eq(melts.id, castings.meltId))
    .innerJoin(alloys, eq(alloys.id, melts.alloyId))
    .where(
      and(
        eq(castings.shopId, shopId),
        marked,
        opts.confirmedOnly ? confirmed : undefined,
        opts.castingIds ? inArray(castings.id, opts.castingIds) : undefined,
      ),
    )
    .orderBy(desc(melts.pouredOn), desc(castings.id))
    // The castings asked for by id all come back (the calibration reads them a batch at a time).
    .limit(opts.castingIds ? opts.castingIds.length : CASE_LIMIT);
  const ids = rows.map((r) => r.c.id);
  const [marks, confirmedBy] = await Promise.all([marksOf(ids), latestConfirmations(shopId, ids)]);
  const marksBy = new Map<number, typeof marks>();
  for (const mk of marks) marksBy.set(mk.castingId, [...(marksBy.get(mk.castingId) ?? []), mk]);
  const out: StoredCase[] = [];
  for (const { c, m, a } of rows) {
    const melt = toMelt({ m, alloy: a.designation, byName: "" });
    let kase;
    try {
      kase = caseFromCasting(c, melt, marksBy.get(c.id) ?? []);
    } catch {
      continue;
    }
    const conf = confirmedBy.get(c.id);
    out.push({
      castingId: c.id,
      meltId: c.meltId,
      partName: c.partName,
      pouredOn: m.pouredOn,
      case: kase,
      alloy: toAlloySpec(a),
      confirmed: conf ? { causeId: conf.causeId, causeText: conf.causeText } : null,
    });
  }
  return out;
}
