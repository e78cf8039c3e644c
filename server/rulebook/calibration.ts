import { sql } from "drizzle-orm";
import { comparableCause } from "../../rules/backtest";
import {
  caseCounts,
  confirmedFirings,
  firingSet,
  tallyFirings,
  type Firing,
  type FiringSet,
  type Tally,
} from "../../rules/calibration";
import type { RuleSet } from "../../rules/kb-schema";
import { db } from "../db";
import { batchFirings, type CalibrationRow } from "./calibration-firings";
import { latestConfirmations, storedCases } from "./cases";

/** The rule sets a calibration is worked out with: every rule (fired), and the ones in use (suggested). */
export type CalibrationRules = { everyRule: RuleSet; ruleSet: RuleSet };
/** Rows and tallies are kept per pair of rule sets: a rule published or switched off changes it. */
export const calibrationVersion = (r: CalibrationRules) => `${r.everyRule.version}/${r.ruleSet.version}`;

/**
 * The shop's calibration, case by case (db/calibration-schema.ts). Triggers mark a confirmed
 * casting's row as changed in the transaction of any write that could change it; here the changed
 * rows (and, after the rules change, the rows read with the old ones) are worked out again, each for
 * its own casting: a case that did not change keeps its firings of unchanged rules, so a publish runs
 * only the new rule and a switch runs none (server/rulebook/calibration-firings.ts).
 *
 * One rebuild per shop at a time (drizzle/*_calibration_one_rebuild.sql): each batch is a transaction
 * that first takes the shop's advisory lock, then locks its rows in casting order, skipping any that
 * another transaction is changing (those are marked changed again when it commits). A second server
 * rebuilding the same shop waits for the batch, finds its rows done and goes on; a confirmation that
 * lands meanwhile works out its own row between two batches, not after the whole shop.
 */
const BATCH = 500;

/** How many rows were worked out again, and on how many cases the engine ran. */
export type Refreshed = { rows: number; casesRun: number };
let casesRunHere = 0;
/** Cases the engine ran on for the calibration in this process (tests read it around a rule change). */
export const calibrationCasesRun = () => casesRunHere;

/** Brings the shop's rows (or only `castingIds`' rows) up to date with its rules, `batchSize` rows a transaction. */
export async function refreshCalibration(
  shopId: string,
  rules: CalibrationRules,
  { castingIds, batchSize = BATCH }: { castingIds?: number[]; batchSize?: number } = {},
): Promise<Refreshed> {
  const version = calibrationVersion(rules);
  const firing = firingSet(rules.everyRule);
  await db.execute(sql`INSERT INTO calibration_rule_keys (shop_id, firing_version, keys)
    VALUES (${shopId}, ${firing.version}, ${sql.param(firing.keys)}::text[]) ON CONFLICT DO NOTHING`);
  const pending = (
    await db.execute(sql`SELECT casting_id AS "castingId" FROM calibration_cases
      WHERE shop_id = ${shopId} AND (computed <> changes OR rule_set_version <> ${version})
        ${castingIds ? sql`AND casting_id = ANY(${sql.param(castingIds)}::int[])` : sql``}
      ORDER BY casting_id`)
  ).rows.map((r) => (r as { castingId: number }).castingId);
  const done: Refreshed = { rows: 0, casesRun: 0 };
  for (let i = 0; i < pending.length; i += batchSize) {
    const batch = await refreshBatch(shopId, rules, firing, pending.slice(i, i + batchSize));
    done.rows += batch.rows;
    done.casesRun += batch.casesRun;
    casesRunHere += batch.casesRun;
  }
  if (done.rows && !castingIds) await forgetUnusedKeySets(shopId, firing.version);
  return done;
}

function refreshBatch(shopId: string, rules: CalibrationRules, firing: FiringSet, ids: number[]): Promise<Refreshed> {
  const version = calibrationVersion(rules);
  return db.transaction(async (tx) => {
    await tx.execute(sql`SELECT pg_advisory_xact_lock(calibration_lock_key(${shopId}))`);
    // Read again under the lock: another server may have done these rows while this one waited.
    const rows = (
      await tx.execute(sql`SELECT casting_id AS "castingId", changes, computed, fired_keys AS "firedKeys",
          fired_with AS "firedWith"
        FROM calibration_cases WHERE casting_id = ANY(${sql.param(ids)}::int[]) AND shop_id = ${shopId}
          AND (computed <> changes OR rule_set_version <> ${version})
        ORDER BY casting_id FOR UPDATE SKIP LOCKED`)
    ).rows as CalibrationRow[];
    if (!rows.length) return { rows: 0, casesRun: 0 };
    const rs = rules.everyRule;
    const [firings, confirmed] = await Promise.all([
      batchFirings(shopId, rs, firing, rows),
      latestConfirmations(
        shopId,
        rows.map((r) => r.castingId),
      ),
    ]);
    // The batch's rows move their counts set-based (calibration_tally_rows), not row by row.
    const batch = sql.param(rows.map((r) => r.castingId));
    await tx.execute(sql`SELECT set_config('casebook.calibration_batch', 'on', true)`);
    await tx.execute(sql`SELECT calibration_tally_rows(${shopId}, ${batch}::int[], -1)`);
    const kept = rows.filter((r) => confirmed.has(r.castingId));
    const gone = rows.filter((r) => !confirmed.has(r.castingId));
    if (kept.length) {
      const values = kept.map((r) => {
        const k = confirmed.get(r.castingId)!;
        const causeId = comparableCause({ causeId: k.causeId, causeText: k.causeText }, rs.causes);
        const keys = firings.keys.get(r.castingId) ?? null;
        const fired = keys && new Set(keys.map((key) => firing.ruleOf.get(key)!.id));
        // Not a rulebook cause, or no case to run: the row is kept (it is still confirmed) but counts nothing.
        const counts = causeId && fired ? caseCounts({ causeId, fired }, rs.rules, rules.ruleSet.rules) : null;
        return { ...r, causeId, counts: JSON.stringify(counts), keys: JSON.stringify(keys) };
      });
      const column = (key: "castingId" | "changes" | "causeId" | "counts" | "keys") =>
        sql.param(values.map((v) => v[key]));
      await tx.execute(sql`
        UPDATE calibration_cases k SET cause_id = u.cause_id, fired = ${textArray(sql`u.counts -> 'fired'`)},
          agreed = ${textArray(sql`u.counts -> 'agreed'`)}, suggested = ${textArray(sql`u.counts -> 'suggested'`)},
          fired_keys = ${textArray(sql`u.keys`)}, fired_with = ${firing.version},
          rule_set_version = ${version}, computed = u.changes
        FROM unnest(${column("castingId")}::int[], ${column("changes")}::int[], ${column("causeId")}::text[],
            ${column("counts")}::jsonb[], ${column("keys")}::jsonb[]) AS u(casting_id, changes, cause_id, counts, keys)
        WHERE k.casting_id = u.casting_id AND k.changes = u.changes`);
    }
    // A casting whose confirmations were all taken back counts no more.
    if (gone.length)
      await tx.execute(
        sql`DELETE FROM calibration_cases WHERE casting_id = ANY(${sql.param(gone.map((r) => r.castingId))}::int[])`,
      );
    await tx.execute(sql`SELECT calibration_tally_rows(${shopId}, ${batch}::int[], 1)`);
    await tx.execute(sql`SELECT set_config('casebook.calibration_batch', 'off', true)`);
    return { rows: rows.length, casesRun: firings.casesRun };
  });
}

/** Key sets no row was read against any more (older versions of the rules). */
const forgetUnusedKeySets = (shopId: string, current: string) =>
  db.execute(sql`DELETE FROM calibration_rule_keys k WHERE k.shop_id = ${shopId} AND k.firing_version <> ${current}
    AND NOT EXISTS (SELECT 1 FROM calibration_cases c WHERE c.shop_id = k.shop_id AND c.fired_with = k.firing_version)`);

/** A JSON array of strings (or null) as text[]. */
const textArray = (json: ReturnType<typeof sql>) =>
  sql`CASE WHEN jsonb_typeof(${json}) = 'array' THEN ARRAY(SELECT jsonb_array_elements_text(${json})) END`;

/** The shop's tallies for its current rules. */
export async function calibrationTallies(shopId: string, rules: CalibrationRules): Promise<Tally[]> {
  return (
    await db.execute(sql`SELECT kind, item, cases FROM calibration_tallies
      WHERE shop_id = ${shopId} AND rule_set_version = ${calibrationVersion(rules)}`)
  ).rows as Tally[];
}

/**
 * The reference the tallies must equal: every confirmed case of the shop run again (what the
 * learning did before the tallies; tests/api/calibration-tallies.test.ts and the bench compare).
 */
export async function recomputedTallies(shopId: string, rules: CalibrationRules): Promise<Tally[]> {
  const firings: Firing[] = await confirmedFirings(
    await storedCases(shopId, { confirmedOnly: true, castingIds: await confirmedIds(shopId) }),
    rules.everyRule,
  );
  return tallyFirings(firings, rules.everyRule.rules, rules.ruleSet.rules);
}

async function confirmedIds(shopId: string): Promise<number[]> {
  const rows = (await db.execute(sql`SELECT DISTINCT casting_id AS id FROM confirmations WHERE shop_id = ${shopId}`))
    .rows as { id: number }[];
  return rows.map((r) => r.id);
}
