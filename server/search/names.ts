import { and, eq, inArray, isNull, or } from "drizzle-orm";
import { alloys, member, searchDocuments, user } from "../../db/schema";
import type { SearchParams } from "../../lib/search-schemas";
import { db } from "../db";
import { HttpError } from "../http/errors";
import { causeTitles } from "../rulebook/cause-titles";
import { alloyKey } from "./case-doc";

const unknown = (field: string, values: string[], what: string) =>
  new HttpError(400, "Some filter values are not known here.", {
    [field]: `${values.map((v) => `"${v}"`).join(", ")} ${values.length > 1 ? "are" : "is"} not ${what} of this shop`,
  });

/** Every cause title the shop's rulebook knows (built-in and its own), by id. */
export { causeTitles };

/**
 * Alloys, causes and people must be ones this shop knows; a stranger's id is refused like a typo.
 * `titles` is a promise so that the search's other first reads need not wait for it.
 */
export async function checkNames(shopId: string, p: SearchParams, titles: Promise<Map<string, string>>) {
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
    const known = await titles;
    const bad = p.cause.filter((c) => !known.has(c));
    if (bad.length) throw unknown("cause", bad, "a cause in the rulebook");
  }
  if (p.by?.length) {
    const rows = await db.select({ id: member.userId }).from(member).where(eq(member.organizationId, shopId));
    const members = new Set(rows.map((r) => r.id));
    const others = p.by.filter((b) => !members.has(b));
    // Someone who has left the shop still logged its cases.
    const former = others.length
      ? await db
          .selectDistinct({ id: searchDocuments.createdBy })
          .from(searchDocuments)
          .where(and(eq(searchDocuments.shopId, shopId), inArray(searchDocuments.createdBy, others)))
      : [];
    const bad = others.filter((b) => !former.some((f) => f.id === b));
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
