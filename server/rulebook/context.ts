import { LRUCache } from "lru-cache";
import { and, asc, desc, eq } from "drizzle-orm";
import { db } from "../db";
import { ruleSwitches, shopCauses, shopRevisions, shopRuleVersions } from "../../db/schema";
import {
  causeRecordsOf,
  confirmedCasesOf,
  ruleRecordsOf,
  weightFactors,
  type CauseRecord,
  type RuleRecord,
} from "../../rules/calibration";
import { ruleSetFor, type DiagnosisResult } from "../../rules/engine";
import type { CauseWithRecord } from "../../lib/review-schemas";
import { checkRule, type KbCause, type KbRule, type RuleSet } from "../../rules/kb-schema";
import { BUILT_IN_RULE_SET, ruleSetVersion } from "../../rules/knowledge-base";
import { calibrationTallies, refreshCalibration } from "./calibration";

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

/** The shop's revision: raised by triggers in every transaction that changes what a diagnosis reads. */
export async function shopRevision(shopId: string): Promise<number> {
  const [row] = await db
    .select({ revision: shopRevisions.revision })
    .from(shopRevisions)
    .where(eq(shopRevisions.shopId, shopId));
  return row?.revision ?? 0;
}

/**
 * The rules, and their records from the shop's tallies (server/rulebook/calibration.ts): only the
 * confirmed cases changed since the last computation are run again, not every confirmed case.
 */
async function computeLearning(shopId: string): Promise<ShopLearning> {
  const rules = await shopRules(shopId);
  await refreshCalibration(shopId, rules);
  const tallies = await calibrationTallies(shopId, rules);
  const records = ruleRecordsOf(tallies, rules.everyRule.rules);
  return {
    ...rules,
    confirmedCases: confirmedCasesOf(tallies),
    ruleRecords: records,
    causeRecords: causeRecordsOf(tallies),
    weightFactor: weightFactors(records),
  };
}

/** Works out one confirmed casting's calibration row with the shop's current rules (after a confirmation). */
export async function calibrateCasting(shopId: string, castingId: number) {
  return refreshCalibration(shopId, await shopRules(shopId), { castingIds: [castingId] });
}

/**
 * Per shop, the learning at one revision, as a promise: requests that arrive together while it is being
 * worked out share the one computation. The revision is read before the rows, so a write that lands in
 * between can only make the kept answer newer than its revision (then recomputed once), never older.
 */
const SHOPS_KEPT = 64;
const learningKept = new LRUCache<string, { revision: number; learning: Promise<ShopLearning> }>({ max: SHOPS_KEPT });
let computations = 0;
/** How many times the learning was worked out in this process (tests and the bench read it). */
export const learningComputations = () => computations;

/** The shop's rules with their records among its confirmed cases, and the weight factors those give. */
export async function shopLearning(shopId: string): Promise<ShopLearning> {
  const revision = await shopRevision(shopId);
  const kept = learningKept.get(shopId);
  if (kept && kept.revision === revision) return kept.learning;
  // A request that read its revision before a newer one was kept leaves the newer one in place.
  if (kept && kept.revision > revision) return kept.learning;
  computations++;
  const learning = computeLearning(shopId);
  learningKept.set(shopId, { revision, learning });
  // A failed computation (the database went away) is not kept: the next request tries again.
  learning.catch(() => {
    if (learningKept.get(shopId)?.learning === learning) learningKept.delete(shopId);
  });
  return learning;
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
