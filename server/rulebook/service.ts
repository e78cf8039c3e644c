import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "../../db/client";
import { ruleSwitches, shopCauses, shopRules as shopRulesTable, shopRuleVersions, user } from "../../db/schema";
import { draftToRule, ruleDraftInput, type RuleDetail, type RuleDraftParsed, type RuleRow, type Rulebook, type RuleVersion, type SavedRule, type Trial } from "../../lib/rulebook-schemas";
import { backtest } from "../../rules/backtest";
import { ruleSetFor } from "../../rules/engine";
import { checkRule, ruleSchema, type KbCause, type KbRule } from "../../rules/kb-schema";
import { BUILT_IN_RULE_FILES, BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import type { RuleStatus } from "../../rules/rule-diff";
import { contradictions } from "../../rules/satisfiable";
import { weightFactorOf } from "../../rules/calibration";
import type { ShopMember } from "../auth/shop-access";
import { fieldErrors, HttpError, notFound, parseOr400 } from "../http/errors";
import { iso, personRef } from "../notebook/shared";
import { storedCases } from "./cases";
import { causesOf, shopLearning, shopRuleKey, shopRules, versionInUse, versionsOf, type ShopLearning, type VersionRow } from "./context";

/** The rulebook: every rule with where it comes from and its record here; shop rules written, tried, published, retired. */
const FAMILY_OF = new Map(
  BUILT_IN_RULE_FILES.flatMap(({ json }) => {
    const f = json as { title: string; rules: { id: string }[] };
    return f.rules.map((r) => [r.id, f.title.split(":")[0]] as const);
  }),
);
const BUILT_IN_IDS = new Set(BUILT_IN_RULE_SET.rules.map((r) => r.id));
const BUILT_IN_CAUSE_IDS = new Set(BUILT_IN_RULE_SET.causes.map((c) => c.id));
const bad = (fields: Record<string, string>) => new HttpError(400, "Some values need fixing.", fields);

function row(l: ShopLearning, rule: KbRule, status: RuleRow["status"], inUse: boolean): RuleRow {
  const record = l.ruleRecords.get(rule.id) ?? null;
  const cause = l.base.causes.find((c) => c.id === rule.cause);
  return {
    id: rule.id, source: status === "built-in" ? "built-in" : "shop", family: FAMILY_OF.get(rule.id) ?? "Written here",
    explains: rule.explains.map((e) => e.type), locations: [...new Set(rule.explains.flatMap((e) => e.locations ?? []))],
    cause: { id: rule.cause, title: cause?.title ?? rule.cause }, effect: rule.effect, weight: rule.weight,
    status, inUse, switchedOff: l.off.has(rule.id), record, factor: weightFactorOf(record ?? undefined),
  };
}

const latest = (vs: VersionRow[]) => vs[vs.length - 1];

export async function rulebook(shopId: string): Promise<Rulebook> {
  const l = await shopLearning(shopId);
  const shopRows = [...l.versions.values()].map((vs) => row(l, latest(vs).rule, latest(vs).status as RuleStatus, !!versionInUse(vs)));
  const builtIn = BUILT_IN_RULE_SET.rules.map((r) => row(l, r, "built-in", !l.off.has(r.id)));
  return {
    rules: [...shopRows.reverse(), ...builtIn],
    causes: l.base.causes.map((c) => ({ id: c.id, title: c.title, fixes: c.fixes, shop: !BUILT_IN_CAUSE_IDS.has(c.id) })),
    confirmedCases: l.confirmedCases,
  };
}

/** "shop-12" of this shop, or a 404 (another shop's rule does not exist here). */
function shopRuleIdOf(ruleId: string): number | undefined {
  const m = /^shop-(\d{1,9})$/.exec(ruleId);
  return m ? Number(m[1]) : undefined;
}

async function names(ids: string[]) {
  const rows = ids.length ? await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, ids)) : [];
  return (id: string) => personRef(id, rows.find((r) => r.id === id)?.name ?? "");
}

export async function ruleDetail(shopId: string, ruleId: string): Promise<RuleDetail> {
  const l = await shopLearning(shopId);
  const n = shopRuleIdOf(ruleId);
  const vs = n !== undefined ? l.versions.get(n) : undefined;
  const rule = vs ? latest(vs).rule : BUILT_IN_RULE_SET.rules.find((r) => r.id === ruleId);
  if (!rule) throw notFound("No such rule");
  const switches = await db.select().from(ruleSwitches)
    .where(and(eq(ruleSwitches.shopId, shopId), eq(ruleSwitches.ruleId, ruleId))).orderBy(desc(ruleSwitches.id));
  const who = await names([...(vs ?? []).map((v) => v.createdBy), ...switches.map((s) => s.createdBy)]);
  const versions: RuleVersion[] = (vs ?? []).map((v) => ({
    version: v.version, status: v.status as RuleStatus, rule: v.rule, createdBy: who(v.createdBy), createdAt: iso(v.createdAt),
  })).reverse();
  const base = row(l, rule, vs ? (latest(vs).status as RuleStatus) : "built-in", vs ? !!versionInUse(vs) : !l.off.has(rule.id));
  return {
    ...base, rule, causeFixes: l.base.causes.find((c) => c.id === rule.cause)?.fixes ?? [], sources: rule.sources, versions,
    switches: switches.map((s) => ({ off: s.off, createdBy: who(s.createdBy), createdAt: iso(s.createdAt) })),
    contradictions: contradictions(rule.conditions),
  };
}

const slug = (s: string) => s.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 40) || "cause";

/** The cause a draft names: a known one, or a new one with an id of its own ("shop-<words>"). */
async function causeFor(shopId: string, d: RuleDraftParsed): Promise<KbCause> {
  const known = [...BUILT_IN_RULE_SET.causes, ...(await causesOf(shopId))];
  if (d.cause.kind === "existing") {
    const wanted = d.cause.id;
    const found = known.find((c) => c.id === wanted);
    if (!found) throw bad({ "cause.id": "not a cause in this rulebook: choose one from the list" });
    return found;
  }
  const base = `shop-${slug(d.cause.title)}`;
  let id = base;
  for (let i = 2; known.some((c) => c.id === id); i++) id = `${base}-${i}`;
  return { id, title: d.cause.title, fixes: d.cause.fixes };
}

/** The form's checks again, then the knowledge base's own (checkRule), each problem on its field. */
function checkedRule(d: RuleDraftParsed, ruleId: string, cause: KbCause, causeIds: Set<string>): KbRule {
  const parsed = ruleSchema.safeParse(draftToRule(d, ruleId, cause.id));
  if (!parsed.success) throw bad(fieldErrors(parsed.error));
  const rule = parsed.data;
  const problems = checkRule(rule, new Set([...causeIds, cause.id]));
  if (problems.length) {
    const fields: Record<string, string> = {};
    for (const p of problems) {
      const at = /conditions\.all\[(\d+)\]/.exec(p);
      const key = at ? `conditions.${at[1]}.value` : p.includes(" cause:") ? "cause.id" : p.includes(" because:") ? "because" : "conditions";
      fields[key] ??= p.replace(/^rule "[^"]*" /, "");
    }
    throw bad(fields);
  }
  return rule;
}

async function prepare(shopId: string, body: unknown, ruleId: string) {
  const d = parseOr400(ruleDraftInput, body);
  const cause = await causeFor(shopId, d);
  const causeIds = new Set([...BUILT_IN_RULE_SET.causes, ...(await causesOf(shopId))].map((c) => c.id));
  return { rule: checkedRule(d, ruleId, cause, causeIds), cause, isNew: !causeIds.has(cause.id) };
}

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];
async function addVersion(tx: Tx, m: ShopMember, shopRuleId: number, status: RuleStatus, rule: KbRule) {
  const [last] = await tx.select({ version: shopRuleVersions.version }).from(shopRuleVersions)
    .where(eq(shopRuleVersions.shopRuleId, shopRuleId)).orderBy(desc(shopRuleVersions.version)).limit(1);
  await tx.insert(shopRuleVersions).values({ shopId: m.shopId, shopRuleId, version: (last?.version ?? 0) + 1, status, rule, createdBy: m.userId });
}
const saveCause = (tx: Tx, m: ShopMember, c: KbCause) =>
  tx.insert(shopCauses).values({ shopId: m.shopId, causeId: c.id, title: c.title, fixes: c.fixes, createdBy: m.userId });

async function saved(shopId: string, ruleId: string): Promise<SavedRule> {
  const d = await ruleDetail(shopId, ruleId);
  return { ...d, warnings: d.contradictions };
}

export async function createRule(m: ShopMember, body: unknown): Promise<SavedRule> {
  const draft = await prepare(m.shopId, body, "shop-0");
  const id = await db.transaction(async (tx) => {
    if (draft.isNew) await saveCause(tx, m, draft.cause);
    const [r] = await tx.insert(shopRulesTable).values({ shopId: m.shopId, createdBy: m.userId }).returning();
    await addVersion(tx, m, r.id, "draft", { ...draft.rule, id: shopRuleKey(r.id) });
    return r.id;
  });
  return saved(m.shopId, shopRuleKey(id));
}

/** The shop's rule's versions, or a 404 (built-in ids and other shops' rules alike). */
async function ownVersions(shopId: string, ruleId: string): Promise<{ n: number; vs: VersionRow[] }> {
  const n = shopRuleIdOf(ruleId);
  const vs = n === undefined ? undefined : (await versionsOf(shopId, n)).get(n);
  if (!vs?.length) throw notFound("No such rule written in this shop");
  return { n: n!, vs };
}

export async function updateRule(m: ShopMember, ruleId: string, body: unknown): Promise<SavedRule> {
  const { n } = await ownVersions(m.shopId, ruleId);
  const draft = await prepare(m.shopId, body, ruleId);
  await db.transaction(async (tx) => {
    if (draft.isNew) await saveCause(tx, m, draft.cause);
    await addVersion(tx, m, n, "draft", draft.rule);
  });
  return saved(m.shopId, ruleId);
}

export async function publishRule(m: ShopMember, ruleId: string): Promise<SavedRule> {
  const { n, vs } = await ownVersions(m.shopId, ruleId);
  const last = latest(vs);
  if (last.status === "published") throw new HttpError(409, "This version is already published.");
  const impossible = contradictions(last.rule.conditions);
  if (impossible.length)
    throw bad({ conditions: `These conditions can never all be true, so the rule would never fire: ${impossible.map((c) => c.message).join("; ")}` });
  // The whole set must still build with it (ids unique, causes known) before anyone's diagnosis depends on it.
  const l = await shopRules(m.shopId);
  ruleSetFor(l.base, [...l.inUse.filter((r) => r.id !== ruleId), last.rule], l.off);
  await db.transaction((tx) => addVersion(tx, m, n, "published", last.rule));
  return saved(m.shopId, ruleId);
}

export async function retireRule(m: ShopMember, ruleId: string): Promise<SavedRule> {
  const { n, vs } = await ownVersions(m.shopId, ruleId);
  const last = latest(vs);
  if (last.status === "retired") throw new HttpError(409, "This rule is already retired.");
  await db.transaction((tx) => addVersion(tx, m, n, "retired", last.rule));
  return saved(m.shopId, ruleId);
}

/** Built-in rules are switched off (or on) per shop; a shop rule is retired instead. */
export async function switchBuiltIn(m: ShopMember, ruleId: string, off: boolean): Promise<RuleDetail> {
  if (!BUILT_IN_IDS.has(ruleId)) throw notFound("No such built-in rule");
  await db.insert(ruleSwitches).values({ shopId: m.shopId, ruleId, off, createdBy: m.userId });
  return ruleDetail(m.shopId, ruleId);
}

/** Runs a draft (saved or not) on the shop's past cases; replacing the rule's version in use when it has one. */
export async function tryRule(shopId: string, body: { draft: unknown; ruleId?: string }): Promise<Trial> {
  const ruleId = body.ruleId ?? "shop-draft";
  if (body.ruleId) await ownVersions(shopId, body.ruleId);
  const draft = await prepare(shopId, body.draft, ruleId);
  const [l, cases] = await Promise.all([shopLearning(shopId), storedCases(shopId)]);
  const result = await backtest({ cases, base: l.ruleSet, rule: draft.rule, cause: draft.cause, weightFactor: l.weightFactor });
  const wanted = new Set(result.changed.map((c) => c.confirmed?.id));
  const titles = Object.fromEntries([...l.base.causes, draft.cause].filter((c) => wanted.has(c.id)).map((c) => [c.id, c.title]));
  return { ...result, contradictions: contradictions(draft.rule.conditions), causeTitles: titles };
}
