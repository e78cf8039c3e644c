import { sql } from "drizzle-orm";
import { comparableCause } from "../../rules/backtest";
import { caseCounts, confirmedFirings, tallyFirings, type Firing, type Tally } from "../../rules/calibration";
import { compiledRuleSet } from "../../rules/engine";
import { firedRules } from "../../rules/backtest";
import type { RuleSet } from "../../rules/kb-schema";

/** The rule sets a calibration is worked out with: every rule (fired), and the ones in use (suggested). */
export type CalibrationRules = { everyRule: RuleSet; ruleSet: RuleSet };
/** Rows and tallies are kept per pair of rule sets: a rule published or switched off changes it. */
export const calibrationVersion = (r: CalibrationRules) => `${r.everyRule.version}/${r.ruleSet.version}`;
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

/** Brings the shop's rows up to date with its rules; says how many cases it worked out again. */
export async function refreshCalibration(shopId: string, rules: CalibrationRules): Promise<number> {
  const version = calibrationVersion(rules);
  const pending = (
    await db.execute(sql`SELECT casting_id AS "castingId", changes FROM calibration_cases
      WHERE shop_id = ${shopId} AND (computed <> changes OR rule_set_version <> ${version})
      ORDER BY casting_id`)
  ).rows as Pending[];
  for (let i = 0; i < pending.length; i += BATCH) await refreshRows(shopId, rules, pending.slice(i, i + BATCH));
  return pending.length;
}

async function refreshRows(shopId: string, rules: CalibrationRules, rows: Pending[]) {
  const rs = rules.everyRule;
  const ids = rows.map((r) => r.castingId);
  const cases = await storedCases(shopId, { castingIds: ids });
  // A stored case carries its newest confirmation; only castings that are no case need theirs read.
  const confirmed = new Map<number, { causeId: string | null; causeText?: string | null }>();
  for (const c of cases) if (c.confirmed) confirmed.set(c.castingId, c.confirmed);
  const asCases = new Set(cases.map((c) => c.castingId));
  const others = ids.filter((id) => !asCases.has(id));
  if (others.length) for (const [id, k] of await latestConfirmations(shopId, others)) confirmed.set(id, k);
  const compiled = compiledRuleSet(rs);
  const fired = new Map<number, Set<string>>();
  for (const c of cases) fired.set(c.castingId, await firedRules(c.case, c.alloy, compiled));
  const kept = rows.filter((r) => confirmed.has(r.castingId));
  const gone = rows.filter((r) => !confirmed.has(r.castingId));
  if (kept.length) {
    const values = kept.map((r) => {
      const k = confirmed.get(r.castingId)!;
      const causeId = comparableCause({ causeId: k.causeId, causeText: k.causeText }, rs.causes);
      const on = fired.get(r.castingId);
      // Not a rulebook cause, or no case to run: the row is kept (it is still confirmed) but counts nothing.
      const counts = causeId && on ? caseCounts({ causeId, fired: on }, rs.rules, rules.ruleSet.rules) : null;
      return { castingId: r.castingId, changes: r.changes, causeId, counts: JSON.stringify(counts) };
    });
    const column = (key: "castingId" | "changes" | "causeId" | "counts") => sql.param(values.map((v) => v[key]));
    await db.execute(sql`
      UPDATE calibration_cases k SET cause_id = u.cause_id, fired = ${textArray(sql`u.counts -> 'fired'`)},
        agreed = ${textArray(sql`u.counts -> 'agreed'`)}, suggested = ${textArray(sql`u.counts -> 'suggested'`)},
        rule_set_version = ${calibrationVersion(rules)}, computed = u.changes
      FROM unnest(${column("castingId")}::int[], ${column("changes")}::int[], ${column("causeId")}::text[],
          ${column("counts")}::jsonb[]) AS u(casting_id, changes, cause_id, counts)
      WHERE k.casting_id = u.casting_id AND k.changes = u.changes`);
  }
  // A casting whose confirmations were all taken back counts no more.
  if (gone.length)
    await db.execute(sql`
      DELETE FROM calibration_cases k USING unnest(${sql.param(gone.map((r) => r.castingId))}::int[],
          ${sql.param(gone.map((r) => r.changes))}::int[]) AS u(casting_id, changes)
      WHERE k.casting_id = u.casting_id AND k.changes = u.changes`);
}

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
