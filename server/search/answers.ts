import { sql } from "drizzle-orm";
import { LRUCache } from "lru-cache";
import type { SearchAnswer } from "../../lib/search-schemas";
import { db } from "../db";

/**
 * Search answers a server keeps, each under the versions it was computed at: the shop's documents
 * version (`search_document_versions`, raised at commit by each transaction that writes documents) and
 * the shop's revision (`shop_revisions`, raised by its causes, whose titles an answer shows). Every
 * request reads both in one statement, with the names of the people a kept answer shows (a name
 * can change without either version moving), and uses the kept answer only when both versions are
 * the ones it was computed at: so every server gives the answer PostgreSQL would give now, and a
 * person paging, toggling a chip back or coming back to the casebook costs about one indexed read.
 * The versions are read before the answer is computed, so an answer is never kept under a version
 * newer than the documents it read. Bounded (lru-cache): the answer used longest ago goes first.
 */
export type Versions = { documents: number; revision: number; names: Map<string, string> };
type Kept = Omit<Versions, "names"> & { answer: SearchAnswer; people: string[] };
/** About 30-40 KB an answer of 20 cases, 300 answers: a few MB at most. */
const kept = new LRUCache<string, Kept>({ max: 300 });

export const answerKey = (shopId: string, params: unknown) => `${shopId}\u0000${JSON.stringify(params)}`;

export const keptAnswer = (key: string) => kept.get(key);

/** The shop's versions now, and the names of `people` (a kept answer's). */
export async function versionsOf(shopId: string, people: string[]): Promise<Versions> {
  const [row] = (
    await db.execute(sql`SELECT
      coalesce((SELECT version FROM search_document_versions WHERE shop_id = ${shopId}), 0)::float8 AS documents,
      coalesce((SELECT revision FROM shop_revisions WHERE shop_id = ${shopId}), 0)::float8 AS revision,
      (SELECT coalesce(json_object_agg(id, name), '{}') FROM "user" WHERE id = ANY(${sql.param(people)}::text[])) AS names`)
  ).rows as { documents: number; revision: number; names: Record<string, string> }[];
  return { documents: row.documents, revision: row.revision, names: new Map(Object.entries(row.names)) };
}

/** The kept answer when it still holds at `now`, with the people's names as they are now. */
export function stillHolds(k: Kept | undefined, now: Versions): SearchAnswer | null {
  if (!k || k.documents !== now.documents || k.revision !== now.revision) return null;
  const items = k.answer.items.map((i) => ({
    ...i,
    createdBy: { id: i.createdBy.id, name: now.names.get(i.createdBy.id) ?? "" },
  }));
  return { ...k.answer, items };
}

export function keep(key: string, at: Versions, answer: SearchAnswer) {
  kept.set(key, {
    documents: at.documents,
    revision: at.revision,
    answer,
    people: [...new Set(answer.items.map((i) => i.createdBy.id))],
  });
}
