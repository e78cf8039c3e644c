import { eq, inArray, isNull, or } from "drizzle-orm";
import { db } from "../db";
import { alloys, member, user } from "../../db/schema";
import type { SearchParams } from "../../lib/search-schemas";
import { PROCESSES } from "../../rules/case";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { HttpError } from "../http/errors";
import { causesOf } from "../rulebook/context";
import { alloyKey, defectBit } from "./case-doc";
import { dayNumber, OUTCOME_CODES, type Names } from "./names";
import type { ShopIndex } from "./shop-index";

/**
 * The exact filters, read from the index's columns by slot. The five with chips (defect, alloy,
 * process, outcome, cause) report which of them a case fails (one bit each), so one pass over the
 * shop counts each chip with every other filter applied. Several values of one filter are
 * alternatives; filters combine with "and". The cause is the mentor's confirmed cause, or the
 * latest diagnosis's first cause where none is confirmed.
 */
export type SlotFilter = { failed: (slot: number) => number; other: (slot: number) => boolean };

const flags = (names: Names, wanted: string[]) => {
  const f = new Uint8Array(names.list.length);
  for (const w of wanted) f[names.find(w) ?? 0] = 1;
  f[0] = 0; // a case with none never matches a value asked for
  return f;
};
const bitsOf = <T>(values: T[] | undefined, all: readonly T[]) =>
  (values ?? []).reduce((m, v) => m | (1 << all.indexOf(v)), 0);

export function slotFilter(index: ShopIndex, p: SearchParams): SlotFilter {
  const defects = (p.defect ?? []).reduce((m, t) => m | defectBit(t), 0);
  const alloyOk = p.alloy?.length ? flags(index.alloys, p.alloy.map(alloyKey)) : null;
  const processes = bitsOf(p.process, PROCESSES);
  const outcomes = bitsOf(p.outcome, OUTCOME_CODES);
  const causeOk = p.cause?.length ? flags(index.causes, p.cause) : null;
  const personOk = p.by?.length ? flags(index.people, p.by) : null;
  const from = p.from ? dayNumber(p.from) : -Infinity;
  const to = p.to ? dayNumber(p.to) : Infinity;
  const { defects: dm, alloy, process, outcome, cause, person, day } = index;
  return {
    failed: (s) =>
      (defects && !(dm[s] & defects) ? 1 : 0) |
      (alloyOk && !alloyOk[alloy[s]] ? 2 : 0) |
      (processes && !((processes >> process[s]) & 1) ? 4 : 0) |
      (outcomes && !((outcomes >> outcome[s]) & 1) ? 8 : 0) |
      (causeOk && !causeOk[cause[s]] ? 16 : 0),
    other: (s) => (!personOk || personOk[person[s]] === 1) && day[s] >= from && day[s] <= to,
  };
}

const unknown = (field: string, values: string[], what: string) =>
  new HttpError(400, "Some filter values are not known here.", {
    [field]: `${values.map((v) => `"${v}"`).join(", ")} ${values.length > 1 ? "are" : "is"} not ${what} of this shop`,
  });

/** Alloys, causes and people must be ones this shop knows; a stranger's id is refused like a typo. */
export async function checkNames(shopId: string, index: ShopIndex, p: SearchParams) {
  if (p.alloy?.length) {
    // Every melt names a row of the alloy table, so the table lists every alloy a case can have.
    const rows = await db
      .select({ d: alloys.designation })
      .from(alloys)
      .where(or(isNull(alloys.shopId), eq(alloys.shopId, shopId)));
    const known = new Set(rows.map((r) => alloyKey(r.d)));
    const bad = p.alloy.filter((a) => !known.has(alloyKey(a)));
    if (bad.length) throw unknown("alloy", bad, "an alloy");
  }
  if (p.cause?.length) {
    const known = new Set([...BUILT_IN_RULE_SET.causes, ...(await causesOf(shopId))].map((c) => c.id));
    const bad = p.cause.filter((c) => !known.has(c));
    if (bad.length) throw unknown("cause", bad, "a cause in the rulebook");
  }
  if (p.by?.length) {
    const rows = await db.select({ id: member.userId }).from(member).where(eq(member.organizationId, shopId));
    const members = new Set(rows.map((r) => r.id));
    // Someone who has left the shop still logged its cases.
    const bad = p.by.filter((b) => !members.has(b) && index.people.find(b) === undefined);
    if (bad.length) throw unknown("by", bad, "a person");
  }
}

/** Names for the people on a page of results. */
export async function namesOf(ids: string[]): Promise<Map<string, string>> {
  const wanted = [...new Set(ids)];
  const rows = wanted.length
    ? await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, wanted))
    : [];
  return new Map(rows.map((r) => [r.id, r.name]));
}
