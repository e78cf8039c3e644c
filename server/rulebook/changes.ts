import { desc, eq } from "drizzle-orm";
import { db } from "../db";
import { ruleSwitches, shopCauses, shopRules as shopRulesTable, shopRuleVersions } from "../../db/schema";
import type { RuleDetail, SavedRule } from "../../lib/rulebook-schemas";
import { ruleSetFor } from "../../rules/engine";
import type { KbCause, KbRule } from "../../rules/kb-schema";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import type { RuleStatus } from "../../rules/rule-diff";
import { contradictions } from "../../rules/satisfiable";
import type { ShopMember } from "../auth/shop-access";
import { HttpError, notFound } from "../http/errors";
import { shopRuleKey, shopRules } from "./context";
import { bad, ownVersions, prepare } from "./draft";
import { latest, ruleDetail } from "./service";

/** Changing the rulebook: every save, publish and retire adds a version row; switches add a switch row. */
const BUILT_IN_IDS = new Set(BUILT_IN_RULE_SET.rules.map((r) => r.id));

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];
async function addVersion(tx: Tx, m: ShopMember, shopRuleId: number, status: RuleStatus, rule: KbRule) {
  // Simultaneous saves of one rule take turns on its row, so each reads the other's version number
  // (each statement sees what committed before it) instead of both writing the same one.
  await tx
    .select({ id: shopRulesTable.id })
    .from(shopRulesTable)
    .where(eq(shopRulesTable.id, shopRuleId))
    .for("update");
  const [last] = await tx
    .select({ version: shopRuleVersions.version })
    .from(shopRuleVersions)
    .where(eq(shopRuleVersions.shopRuleId, shopRuleId))
    .orderBy(desc(shopRuleVersions.version))
    .limit(1);
  await tx
    .insert(shopRuleVersions)
    .values({ shopId: m.shopId, shopRuleId, version: (last?.version ?? 0) + 1, status, rule, createdBy: m.userId });
}
const saveCause = (tx: Tx, m: ShopMember, c: KbCause) =>
  tx
    .insert(shopCauses)
    .values({ shopId: m.shopId, causeId: c.id, title: c.title, fixes: c.fixes, createdBy: m.userId })
    // Two saves naming the same new cause at once: the first one stores it, the other uses it.
    .onConflictDoNothing();

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
    throw bad({
      conditions: `These conditions can never all be true, so the rule would never fire: ${impossible.map((c) => c.message).join("; ")}`,
    });
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
