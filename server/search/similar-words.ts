import { sql } from "drizzle-orm";
import { LRUCache } from "lru-cache";
import { db } from "../db";
import { lookups, type QueryTerm } from "./query-words";

/**
 * Each widenable query word's similar words in this shop: the nearest 24 words by trigram
 * distance, straight from the GiST index on `search_words`, kept when within the word's slips.
 * A lookup costs about 11 ms a word at 100,000 cases, and people search the same words again and
 * again, so each server keeps what it found under the shop's vocabulary version
 * (`search_vocabularies`, raised at commit by each transaction that adds words). One statement reads
 * the version and looks up only the words this server has no answer for at that version: a
 * cached answer is used only when PostgreSQL says, in the same request, that the vocabulary is
 * the one it was found in, so two servers never disagree and nothing goes stale.
 */
type Found = { version: number; words: LRUCache<string, string[]> };
/** Per shop: the version the words were found at and the words. Bounded: an idle shop's words go first. */
const cache = new LRUCache<string, Found>({ max: 200 });
const newWords = () => new LRUCache<string, string[]>({ max: 2000 });

export async function similarWords(shopId: string, terms: QueryTerm[]): Promise<Map<string, string[]>> {
  const { words, slips } = lookups(terms);
  const out = new Map<string, string[]>();
  if (!words.length) return out;
  const mine = cache.get(shopId);
  // -1: never found here, so looked up whatever the version is.
  // Taken now: while the look-up runs, another request may add words to this shop's entry and push these out.
  const known = words.map((w) => mine?.words.get(w));
  const seenAt = known.map((k) => (k && mine ? mine.version : -1));
  const rows = (
    await db.execute(sql`
      WITH v AS (SELECT coalesce((SELECT version FROM search_vocabularies WHERE shop_id = ${shopId}), 0)::int AS version)
      SELECT v.version, q.w, q.c <> v.version AS looked, s.word
      FROM v CROSS JOIN unnest(${sql.param(words)}::text[], ${sql.param(slips)}::int[], ${sql.param(seenAt)}::int[]) AS q(w, k, c)
      LEFT JOIN LATERAL (
        SELECT n.word FROM (
          SELECT word FROM search_words WHERE q.c <> v.version AND shop_id = ${shopId} ORDER BY word <-> q.w LIMIT 24
        ) n
        WHERE levenshtein(n.word, q.w) <= q.k
      ) s ON true`)
  ).rows as { version: number; w: string; looked: boolean; word: string | null }[];
  const version = Number(rows[0].version);
  const found = new Map<string, string[]>();
  for (const r of rows) {
    if (!r.looked) continue;
    const list = found.get(r.w) ?? found.set(r.w, []).get(r.w)!;
    if (r.word !== null) list.push(r.word);
  }
  words.forEach((w, i) => out.set(w, found.get(w) ?? known[i]!));
  remember(shopId, version, mine, found);
  return out;
}

function remember(shopId: string, version: number, mine: Found | undefined, found: Map<string, string[]>) {
  // A new version makes every word found before it unknown again.
  const entry = mine && mine.version === version ? mine : { version, words: newWords() };
  for (const [w, list] of found) entry.words.set(w, list);
  cache.set(shopId, entry);
}
