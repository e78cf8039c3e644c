import { siText } from "../../rules/quantity-text";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "../db";
import { ruleSwitches, user } from "../../db/schema";
import type { RuleDetail, RuleRow, Rulebook, RuleVersion, Trial } from "../../lib/rulebook-schemas";
import { backtest } from "../../rules/backtest";
import { weightFactorOf } from "../../rules/calibration";
import type { KbRule } from "../../rules/kb-schema";
import { BUILT_IN_RULE_FILES, BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { contradictions } from "../../rules/satisfiable";
import { notFound } from "../http/errors";
import { iso, personRef } from "../notebook/shared";
import { storedCases } from "./cases";
import { shopLearning, versionInUse, type ShopLearning, type VersionRow } from "./context";
import { ownVersions, prepare, shopRuleIdOf } from "./draft";

/** Reading the rulebook: every rule with where it comes from and its record here; trying a draft on past cases. */
const FAMILY_OF = new Map(
  BUILT_IN_RULE_FILES.flatMap(({ json }) => {
    const f = json as { title: string; rules: { id: string }[] };
    return f.rules.map((r) => [r.id, f.title.split(":")[0]] as const);
  }),
);
const BUILT_IN_CAUSE_IDS = new Set(BUILT_IN_RULE_SET.causes.map((c) => c.id));

function row(l: ShopLearning, rule: KbRule, status: RuleRow["status"], inUse: boolean): RuleRow {
  const record = l.ruleRecords.get(rule.id) ?? null;
  const cause = l.base.causes.find((c) => c.id === rule.cause);
  return {
    id: rule.id,
    source: status === "built-in" ? "built-in" : "shop",
    family: FAMILY_OF.get(rule.id) ?? "Written here",
    explains: rule.explains.map((e) => e.type),
    locations: [...new Set(rule.explains.flatMap((e) => e.locations ?? []))],
    cause: { id: rule.cause, title: cause?.title ?? rule.cause },
    effect: rule.effect,
    weight: rule.weight,
    conditions: rule.conditions,
    status,
    inUse,
    switchedOff: l.off.has(rule.id),
    record,
    factor: weightFactorOf(record ?? undefined),
  };
}

export const latest = (vs: VersionRow[]) => vs[vs.length - 1];

export async function rulebook(shopId: string): Promise<Rulebook> {
  const l = await shopLearning(shopId);
  const shopRows = [...l.versions.values()].map((vs) => row(l, latest(vs).rule, latest(vs).status, !!versionInUse(vs)));
  const builtIn = BUILT_IN_RULE_SET.rules.map((r) => row(l, r, "built-in", !l.off.has(r.id)));
  return {
    rules: [...shopRows.reverse(), ...builtIn],
    causes: l.base.causes.map((c) => ({
      id: c.id,
      title: c.title,
      fixes: c.fixes.map(siText),
      fixTemplates: c.fixes,
      shop: !BUILT_IN_CAUSE_IDS.has(c.id),
    })),
    confirmedCases: l.confirmedCases,
  };
}

async function names(ids: string[]) {
  const rows = ids.length
    ? await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, ids))
    : [];
  return (id: string) => personRef(id, rows.find((r) => r.id === id)?.name ?? "");
}

export async function ruleDetail(shopId: string, ruleId: string): Promise<RuleDetail> {
  const l = await shopLearning(shopId);
  const n = shopRuleIdOf(ruleId);
  const vs = n !== undefined ? l.versions.get(n) : undefined;
  const rule = vs ? latest(vs).rule : BUILT_IN_RULE_SET.rules.find((r) => r.id === ruleId);
  if (!rule) throw notFound("No such rule");
  const switches = await db
    .select()
    .from(ruleSwitches)
    .where(and(eq(ruleSwitches.shopId, shopId), eq(ruleSwitches.ruleId, ruleId)))
    .orderBy(desc(ruleSwitches.id));
  const who = await names([...(vs ?? []).map((v) => v.createdBy), ...switches.map((s) => s.createdBy)]);
  const versions: RuleVersion[] = (vs ?? [])
    .map((v) => ({
      version: v.version,
      status: v.status,
      rule: v.rule,
      createdBy: who(v.createdBy),
      createdAt: iso(v.createdAt),
    }))
    .reverse();
  const base = row(l, rule, vs ? latest(vs).status : "built-in", vs ? !!versionInUse(vs) : !l.off.has(rule.id));
  return {
    ...base,
    rule,
    causeFixes: l.base.causes.find((c) => c.id === rule.cause)?.fixes ?? [],
    sources: rule.sources,
    versions,
    switches: switches.map((s) => ({ off: s.off, createdBy: who(s.createdBy), createdAt: iso(s.createdAt) })),
    contradictions: contradictions(rule.conditions),
  };
}

/** Runs a draft (saved or not) on the shop's past cases; replacing the rule's version in use when it has one. */
export async function tryRule(shopId: string, body: { draft: unknown; ruleId?: string }): Promise<Trial> {
  const ruleId = body.ruleId ?? "shop-draft";
  if (body.ruleId) await ownVersions(shopId, body.ruleId);
  const draft = await prepare(shopId, body.draft, ruleId);
  const [l, cases] = await Promise.all([shopLearning(shopId), storedCases(shopId)]);
  const result = await backtest({
    cases,
    base: l.ruleSet,
    rule: draft.rule,
    cause: draft.cause,
    weightFactor: l.weightFactor,
  });
  const wanted = new Set(result.changed.map((c) => c.confirmed?.id));
  const titles = Object.fromEntries(
    [...l.base.causes, draft.cause].filter((c) => wanted.has(c.id)).map((c) => [c.id, c.title]),
  );
  return { ...result, contradictions: contradictions(draft.rule.conditions), causeTitles: titles };
}
