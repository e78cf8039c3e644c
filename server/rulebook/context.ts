import { LRUCache } from "lru-cache";
import { and, asc, desc, eq, sql } from "drizzle-orm";
import { db } from "../db";
import { ruleSwitches, shopCauses, shopRuleVersions } from "../../db/schema";
import {
  causeRecords,
  confirmedFirings,
  ruleRecords,
  weightFactors,
  type CauseRecord,
  type Firing,
  type RuleRecord,
} from "../../rules/calibration";
import { ruleSetFor, type DiagnosisResult } from "../../rules/engine";
import type { CauseWithRecord } from "../../lib/review-schemas";
import { checkRule, type KbCause, type KbRule, type RuleSet } from "../../rules/kb-schema";
import { BUILT_IN_RULE_SET, ruleSetVersion } from "../../rules/knowledge-base";
import { storedCases } from "./cases";

/**
 * The rules a shop diagnoses with (built-ins + its published rules − the built-ins it switched
 * off) and what its confirmed cases say about each rule and cause.
 */
export type VersionRow = typeof shopRuleVersions.$inferSelect;

export const shopRuleKey = (shopRuleId: number) => `shop-${shopRuleId}`;

/** The version a diagnosis uses: the newest published one, unless the rule was retired after it. */
export function versionInUse(versions: VersionRow[]): VersionRow | undefined {
  for (const v of [...versions].sort((a, b) => b.version - a.version)) {
    if (v.status === "retired") return undefined;
    if (v.status === "published") return v;
  }
  return undefined;
}

export async function causesOf(shopId: string): Promise<KbCause[]> {
  const rows = await db
    .select()
    .from(shopCauses)
    .where(eq(shopCauses.shopId, shopId))
    .orderBy(asc(shopCauses.createdAt));
  return rows.map((r) => ({ id: r.causeId, title: r.title, fixes: r.fixes }));
}

export async function versionsOf(shopId: string, shopRuleId?: number): Promise<Map<number, VersionRow[]>> {
  const rows = await db
    .select()
    .from(shopRuleVersions)
    .where(
      and(eq(shopRuleVersions.shopId, shopId), shopRuleId ? eq(shopRuleVersions.shopRuleId, shopRuleId) : undefined),
    )
    .orderBy(asc(shopRuleVersions.shopRuleId), asc(shopRuleVersions.version));
  const out = new Map<number, VersionRow[]>();
  for (const r of rows) out.set(r.shopRuleId, [...(out.get(r.shopRuleId) ?? []), r]);
  return out;
}

/** Built-in rule ids this shop has switched off (the newest switch row per rule counts). */
export async function switchedOff(shopId: string): Promise<Set<string>> {
  const rows = await db
    .selectDistinctOn([ruleSwitches.ruleId], { ruleId: ruleSwitches.ruleId, off: ruleSwitches.off })
    .from(ruleSwitches)
    .where(eq(ruleSwitches.shopId, shopId))
    .orderBy(ruleSwitches.ruleId, desc(ruleSwitches.id));
  return new Set(rows.filter((r) => r.off).map((r) => r.ruleId));
}

export type ShopRules = {
  /** Built-in rules with the built-in and shop causes: what shop rules are added to. */
  base: RuleSet;
  inUse: KbRule[];
  off: Set<string>;
  /** What diagnoses use. */
  ruleSet: RuleSet;
  /** Every built-in and every rule in use, switched off or not: the records are kept for all of them. */
  everyRule: RuleSet;
  versions: Map<number, VersionRow[]>;
};

export async function shopRules(shopId: string): Promise<ShopRules> {
  const [causes, versions, off] = await Promise.all([causesOf(shopId), versionsOf(shopId), switchedOff(shopId)]);
  const allCauses = [...BUILT_IN_RULE_SET.causes, ...causes];
  const base = {
    version: ruleSetVersion(allCauses, BUILT_IN_RULE_SET.rules),
    causes: allCauses,
    rules: BUILT_IN_RULE_SET.rules,
  };
  // A stored rule that no longer passes the knowledge base's checks (a fact renamed in a later
  // release, say) is left out rather than failing every diagnosis in the shop.
  const causeIds = new Set(allCauses.map((c) => c.id));
  const inUse = [...versions.values()]
    .map(versionInUse)
    .filter((v) => v !== undefined)
    .map((v) => v.rule)
    .filter((r) => checkRule(r, causeIds).length === 0);
  return { base, inUse, off, versions, ruleSet: ruleSetFor(base, inUse, off), everyRule: ruleSetFor(base, inUse) };
}

export type ShopLearning = ShopRules & {
  confirmedCases: number;
  ruleRecords: Map<string, RuleRecord>;
  causeRecords: Map<string, CauseRecord>;
  weightFactor: (ruleId: string) => number;
};

/**
 * What the confirmed cases look like now: any new confirmation, or a changed or removed casting, melt
 * or mark, changes it. The firings are kept per shop until it changes (a few hundred cases take a
 * noticeable fraction of a second to run, and every diagnosis needs them).
 */
async function casesStamp(shopId: string): Promise<string> {
  const { rows } = await db.execute(sql`select
    (select count(*) || ':' || coalesce(max(id), 0) from confirmations where shop_id = ${shopId}) as c,
    (select max(updated_at)::text from castings where shop_id = ${shopId}) as k,
    (select max(updated_at)::text from melts where shop_id = ${shopId}) as m,
    (select count(*) || ':' || coalesce(max(updated_at)::text, '') from defect_marks where shop_id = ${shopId}) as d`);
  return JSON.stringify(rows[0]);
}
const FIRINGS_KEPT = 64;
const firingsKept = new LRUCache<string, { key: string; firings: Firing[] }>({ max: FIRINGS_KEPT });

async function firingsOf(shopId: string, everyRule: RuleSet): Promise<Firing[]> {
  const key = `${everyRule.version}|${await casesStamp(shopId)}`;
  const kept = firingsKept.get(shopId);
  if (kept?.key === key) return kept.firings;
  const firings = await confirmedFirings(await storedCases(shopId, { confirmedOnly: true }), everyRule);
  firingsKept.set(shopId, { key, firings });
  return firings;
}

/** The shop's rules with their records among its confirmed cases, and the weight factors those give. */
export async function shopLearning(shopId: string): Promise<ShopLearning> {
  const rules = await shopRules(shopId);
  const firings = await firingsOf(shopId, rules.everyRule);
  const records = ruleRecords(firings, rules.everyRule.rules);
  return {
    ...rules,
    confirmedCases: firings.length,
    ruleRecords: records,
    causeRecords: causeRecords(firings, rules.ruleSet.rules),
    weightFactor: weightFactors(records),
  };
}

/**
 * What a diagnosis in this shop runs with (server/diagnosis/service.ts): the shop's rules, weights
 * tuned by its confirmed cases, and each ranked cause's record here ("right in 7 of 9").
 */
export async function shopDiagnosis(shopId: string) {
  const l = await shopLearning(shopId);
  return {
    ruleSet: l.ruleSet,
    weightFactor: l.weightFactor,
    withRecords: <R extends DiagnosisResult>(r: R): R & { causes: CauseWithRecord[] } => ({
      ...r,
      causes: r.causes.map((c) => ({ ...c, record: l.causeRecords.get(c.id) ?? { confirmed: 0, right: 0 } })),
    }),
  };
}
