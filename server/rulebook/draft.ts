import { checkRule, ruleSchema, type KbCause, type KbRule } from "../../rules/kb-schema";
import { draftToRule, ruleDraftInput, type RuleDraftParsed } from "../../lib/rulebook-schemas";
import { fieldErrors, HttpError, notFound, parseOr400 } from "../http/errors";
import { allCausesOf } from "./cause-titles";
import { versionsOf, type VersionRow } from "./context";

/**
 * A rule as the form sends it, checked twice (the form's schema, then the knowledge base's own
 * checkRule), each problem on its field; and the shop's own rule behind an id like "shop-12".
 */
export const bad = (fields: Record<string, string>) => new HttpError(400, "Some values need fixing.", fields);

/** The number in a shop rule's id ("shop-12"); undefined for any other id. */
export function shopRuleIdOf(ruleId: string): number | undefined {
  const m = /^shop-(\d{1,9})$/.exec(ruleId);
  return m ? Number(m[1]) : undefined;
}

/** The shop's rule's versions, or a 404 (built-in ids and other shops' rules alike). */
export async function ownVersions(shopId: string, ruleId: string): Promise<{ n: number; vs: VersionRow[] }> {
  const n = shopRuleIdOf(ruleId);
  const vs = n === undefined ? undefined : (await versionsOf(shopId, n)).get(n);
  if (!vs?.length) throw notFound("No such rule written in this shop");
  return { n: n!, vs };
}

const slug = (s: string) =>
  s
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .slice(0, 40) || "cause";

/** The cause a draft names: a known one, or a new one with an id of its own ("shop-<words>"). */
async function causeFor(shopId: string, d: RuleDraftParsed): Promise<KbCause> {
  const known = await allCausesOf(shopId);
  if (d.cause.kind === "existing") {
    const wanted = d.cause.id;
    const found = known.find((c) => c.id === wanted);
    if (!found) throw bad({ "cause.id": "not a cause in this rulebook: choose one from the list" });
    return found;
  }
  return { id: newCauseId(d.cause.title, known), title: d.cause.title, fixes: d.cause.fixes };
}

/** A new shop cause's id: "shop-<words of its title>", numbered when the rulebook already has it. */
export function newCauseId(title: string, known: { id: string }[]) {
  const base = `shop-${slug(title)}`;
  let id = base;
  for (let i = 2; known.some((c) => c.id === id); i++) id = `${base}-${i}`;
  return id;
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
      const key = at
        ? `conditions.${at[1]}.value`
        : p.includes(" cause:")
          ? "cause.id"
          : p.includes(" because:")
            ? "because"
            : "conditions";
      fields[key] ??= p.replace(/^rule "[^"]*" /, "");
    }
    throw bad(fields);
  }
  return rule;
}

export async function prepare(shopId: string, body: unknown, ruleId: string) {
  const d = parseOr400(ruleDraftInput, body);
  const cause = await causeFor(shopId, d);
  const causeIds = new Set((await allCausesOf(shopId)).map((c) => c.id));
  return { rule: checkedRule(d, ruleId, cause, causeIds), cause, isNew: !causeIds.has(cause.id) };
}
