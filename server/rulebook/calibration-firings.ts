import { sql } from "drizzle-orm";
import { firedRules } from "../../rules/backtest";
import type { FiringSet } from "../../rules/calibration";
import { compiledRuleSet, type CompiledRuleSet } from "../../rules/engine";
import type { KbRule, RuleSet } from "../../rules/kb-schema";
import { contentHash } from "../../rules/knowledge-base";
import { db } from "../db";
import { storedCases } from "./cases";

/**
 * Which rules fire on each case of a batch of calibration rows, running the engine only where the
 * kept firings cannot say: a row whose case changed (or that was never worked out) runs every rule;
 * a row whose case is as it was keeps its firings of the rules that are unchanged (same firing key,
 * rules/calibration.ts) and runs only the new ones, and only if the case has a mark they explain.
 * A switch off or on changes no firing key, so it runs nothing and reads no case.
 */
export type CalibrationRow = {
  castingId: number;
  changes: number;
  computed: number;
  firedKeys: string[] | null;
  firedWith: string | null;
};
/** Per casting, the firing keys of the rules that fired, or null when the casting is no case to run. */
export type BatchFirings = { keys: Map<number, string[] | null>; casesRun: number };

export async function batchFirings(
  shopId: string,
  everyRule: RuleSet,
  firing: FiringSet,
  rows: CalibrationRow[],
): Promise<BatchFirings> {
  const known = await keySets(
    shopId,
    rows.filter((r) => r.computed === r.changes && r.firedWith).map((r) => r.firedWith!),
  );
  const keys = new Map<number, string[] | null>();
  // Per casting, the rules to run: every rule, or those whose key its kept firings were not read against.
  const toRun = new Map<number, KbRule[]>();
  for (const r of rows) {
    const was = r.computed === r.changes && r.firedWith ? known.get(r.firedWith) : undefined;
    if (!was) {
      toRun.set(r.castingId, everyRule.rules);
      continue;
    }
    keys.set(r.castingId, r.firedKeys && r.firedKeys.filter((k) => firing.ruleOf.has(k)));
    const fresh = firing.keys.filter((k) => !was.has(k)).map((k) => firing.ruleOf.get(k)!);
    if (r.firedKeys && fresh.length) toRun.set(r.castingId, fresh);
  }
  await leaveOutUnmarked(toRun, everyRule);
  const cases = toRun.size ? await storedCases(shopId, { castingIds: [...toRun.keys()] }) : [];
  const byId = new Map(cases.map((c) => [c.castingId, c]));
  const compiled = new Map<string, CompiledRuleSet>();
  for (const [castingId, rules] of toRun) {
    const c = byId.get(castingId);
    // No marks, or values the contract cannot read: no case, it counts nothing.
    if (!c) {
      keys.set(castingId, null);
      continue;
    }
    const which = rules === everyRule.rules ? "" : rules.map((r) => r.id).join(" ");
    if (!compiled.has(which)) compiled.set(which, compileOnly(everyRule, rules, which));
    const ran = [...(await firedRules(c.case, c.alloy, compiled.get(which)!))].map((id) => firing.keyOf.get(id)!);
    keys.set(castingId, [...new Set([...(keys.get(castingId) ?? []), ...ran])].sort());
  }
  return { keys, casesRun: cases.length };
}

/** The rules alone, compiled (the engine cache keeps them by this version). */
const compileOnly = (everyRule: RuleSet, rules: KbRule[], which: string) =>
  which === ""
    ? compiledRuleSet(everyRule)
    : compiledRuleSet({
        version: contentHash(`${which}\n${everyRule.version}`),
        causes: everyRule.causes,
        rules,
      });

/** A new rule for gas porosity cannot fire on a case marked only with a misrun: such a case is not read. */
async function leaveOutUnmarked(toRun: Map<number, KbRule[]>, everyRule: RuleSet) {
  const partial = [...toRun].filter(([, rules]) => rules !== everyRule.rules).map(([id]) => id);
  if (!partial.length) return;
  const marked = (
    await db.execute(sql`SELECT casting_id AS "castingId", array_agg(DISTINCT type::text)::text[] AS types FROM defect_marks
      WHERE casting_id = ANY(${sql.param(partial)}::int[]) GROUP BY casting_id`)
  ).rows as { castingId: number; types: string[] }[];
  const typesOf = new Map(marked.map((m) => [m.castingId, new Set(m.types)]));
  for (const id of partial) {
    const types = typesOf.get(id);
    const rules = toRun.get(id)!.filter((r) => r.explains.some((e) => types?.has(e.type)));
    if (rules.length) toRun.set(id, rules);
    else toRun.delete(id);
  }
}

/** The key sets kept firings were read against, by their version. */
async function keySets(shopId: string, versions: string[]): Promise<Map<string, Set<string>>> {
  const wanted = [...new Set(versions)];
  if (!wanted.length) return new Map();
  const rows = (
    await db.execute(sql`SELECT firing_version AS version, keys FROM calibration_rule_keys
      WHERE shop_id = ${shopId} AND firing_version = ANY(${sql.param(wanted)}::text[])`)
  ).rows as { version: string; keys: string[] }[];
  return new Map(rows.map((r) => [r.version, new Set(r.keys)]));
}
