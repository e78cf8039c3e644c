import { sql } from "drizzle-orm";
import { comparableCause } from "../../rules/backtest";
import { confirmedFirings, tallyFirings, type Firing, type Tally } from "../../rules/calibration";
import { compiledRuleSet } from "../../rules/engine";
import { firedRules } from "../../rules/backtest";
import type { RuleSet } from "../../rules/kb-schema";
import { db } from "../db";
import { latestConfirmations, storedCases } from "./cases";

/**
 * The shop's calibration, case by case (db/calibration-schema.ts). Triggers mark a confirmed
 * casting's row as changed in the transaction of any write that could change it; here the changed
 * rows (and every row, once, after the rule set changes) are worked out again, each for its own
 * casting, and written only if nothing changed it meanwhile (`changes` is still what was read).
 * The tallies then hold the whole shop's record, kept by a trigger on the rows.
 */
const BATCH = 500;

type Pending = { castingId: number; changes: number };

/** Brings the shop's rows up to date with `rs` (the rule set with every rule, switched off or not). */
export async function refreshCalibration(shopId: string, rs: RuleSet): Promise<number> {
  const pending = (
    await db.execute(sql`SELECT casting_id AS "castingId", changes FROM calibration_cases
      WHERE shop_id = ${shopId} AND (computed <> changes OR rule_set_version <> ${rs.version})
      ORDER BY casting_id`)
  ).rows as Pending[];
  for (let i = 0; i < pending.length; i += BATCH) await refreshRows(shopId, rs, pending.slice(i, i + BATCH));
  return pending.length;
}

async function refreshRows(shopId: string, rs: RuleSet, rows: Pending[]) {
  const ids = rows.map((r) => r.castingId);
  const [cases, confirmed] = await Promise.all([
    storedCases(shopId, { castingIds: ids }),
    latestConfirmations(shopId, ids),
  ]);
  const compiled = compiledRuleSet(rs);
  const fired = new Map<number, string[]>();
  for (const c of cases) fired.set(c.castingId, [...(await firedRules(c.case, c.alloy, compiled))].sort());
  const kept = rows.filter((r) => confirmed.has(r.castingId));
  const gone = rows.filter((r) => !confirmed.has(r.castingId));
  if (kept.length) {
    const causes = kept.map((r) => {
      const k = confirmed.get(r.castingId)!;
      return comparableCause({ causeId: k.causeId, causeText: k.causeText }, rs.causes);
    });
    await db.execute(sql`
      UPDATE calibration_cases k SET cause_id = v.cause_id, fired = v.fired, rule_set_version = ${rs.version},
        computed = v.changes
      FROM (SELECT * FROM unnest(${sql.param(kept.map((r) => r.castingId))}::int[],
          ${sql.param(kept.map((r) => r.changes))}::int[], ${sql.param(causes)}::text[],
          ${sql.param(kept.map((r) => JSON.stringify(fired.get(r.castingId) ?? null)))}::jsonb[])
        AS u(casting_id, changes, cause_id, fired_json)
        CROSS JOIN LATERAL (SELECT CASE WHEN jsonb_typeof(u.fired_json) = 'array'
          THEN ARRAY(SELECT jsonb_array_elements_text(u.fired_json)) END AS fired) f) v
      WHERE k.casting_id = v.casting_id AND k.changes = v.changes`);
  }
  // A casting whose confirmations were all taken back counts no more.
  if (gone.length)
    await db.execute(sql`
      DELETE FROM calibration_cases k USING unnest(${sql.param(gone.map((r) => r.castingId))}::int[],
          ${sql.param(gone.map((r) => r.changes))}::int[]) AS u(casting_id, changes)
      WHERE k.casting_id = u.casting_id AND k.changes = u.changes`);
}

/** The shop's tallies at rule set `version`. */
export async function calibrationTallies(shopId: string, version: string): Promise<Tally[]> {
  return (
    await db.execute(sql`SELECT cause_id AS "causeId", fired, cases FROM calibration_tallies
      WHERE shop_id = ${shopId} AND rule_set_version = ${version}`)
  ).rows as Tally[];
}

/**
 * The reference the tallies must equal: every confirmed case of the shop run again (what the
 * learning did before the tallies; tests/api/calibration-tallies.test.ts and the bench compare).
 */
export async function recomputedTallies(shopId: string, rs: RuleSet): Promise<Tally[]> {
  const firings: Firing[] = await confirmedFirings(
    await storedCases(shopId, { confirmedOnly: true, castingIds: await confirmedIds(shopId) }),
    rs,
  );
  return tallyFirings(firings);
}

async function confirmedIds(shopId: string): Promise<number[]> {
  const rows = (await db.execute(sql`SELECT DISTINCT casting_id AS id FROM confirmations WHERE shop_id = ${shopId}`))
    .rows as { id: number }[];
  return rows.map((r) => r.id);
}
