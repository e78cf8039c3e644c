import { eq, inArray, isNull, or } from "drizzle-orm";
import { db } from "../../db/client";
import { alloys, member, user } from "../../db/schema";
import type { SearchParams } from "../../lib/search-schemas";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { HttpError } from "../http/errors";
import { causesOf } from "../rulebook/context";
import { alloyKey, defectBit } from "./case-doc";
import type { IndexedCase, ShopIndex } from "./index-cache";

/**
 * The exact filters. The four with chips (defect, alloy, process, outcome) report which of them a
 * case fails, so one pass over the shop counts each chip with every other filter applied.
 * Within a filter the values are alternatives; filters combine with "and". The cause filter reads
 * the mentor's confirmed cause, or the latest diagnosis's first cause where none is confirmed.
 */
export const FACETS = ["defect", "alloy", "process", "outcome"] as const;
export type Facet = (typeof FACETS)[number];
export type CaseFilter = { failed: (c: IndexedCase) => number; other: (c: IndexedCase) => boolean };

export function caseFilter(p: SearchParams): CaseFilter {
  const defects = p.defect?.length ? p.defect.reduce((m, t) => m | defectBit(t), 0) : 0;
  const alloyKeys = p.alloy?.length ? new Set(p.alloy.map(alloyKey)) : null;
  const processes = p.process?.length ? new Set<string>(p.process) : null;
  const outcomes = p.outcome?.length ? new Set<string>(p.outcome) : null;
  const causes = p.cause?.length ? new Set(p.cause) : null;
  const people = p.by?.length ? new Set(p.by) : null;
  const { from, to } = p;
  return {
    failed: (c) =>
      (defects && !(c.defectMask & defects) ? 1 : 0) |
      (alloyKeys && !alloyKeys.has(c.alloyKey) ? 2 : 0) |
      (processes && !processes.has(c.process) ? 4 : 0) |
      (outcomes && !(c.outcome && outcomes.has(c.outcome)) ? 8 : 0),
    other: (c) =>
      (!causes || (!!c.cause?.id && causes.has(c.cause.id))) &&
      (!people || people.has(c.createdBy)) &&
      (!from || c.pouredOn >= from) &&
      (!to || c.pouredOn <= to),
  };
}

const unknown = (field: string, values: string[], what: string) =>
  new HttpError(400, "Some filter values are not known here.", { [field]: `${values.map((v) => `"${v}"`).join(", ")} ${values.length > 1 ? "are" : "is"} not ${what} of this shop` });

/** Alloys, causes and people must be ones this shop knows; a stranger's id is refused like a typo. */
export async function checkNames(shopId: string, index: ShopIndex, p: SearchParams) {
  if (p.alloy?.length) {
    const rows = await db.select({ d: alloys.designation }).from(alloys).where(or(isNull(alloys.shopId), eq(alloys.shopId, shopId)));
    // Every melt names a row of the alloy table, so the table lists every alloy a case can have.
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
    const bad = p.by.filter((b) => !members.has(b) && !index.cases.some((c) => c.createdBy === b));
    if (bad.length) throw unknown("by", bad, "a person");
  }
}

/** Names for the people on a page of results. */
export async function namesOf(ids: string[]): Promise<Map<string, string>> {
  const wanted = [...new Set(ids)];
  const rows = wanted.length ? await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, wanted)) : [];
  return new Map(rows.map((r) => [r.id, r.name]));
}
