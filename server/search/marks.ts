import Fuse from "fuse.js";
import type { Marked, MarkedField } from "../../lib/search-schemas";
import { SEARCH_KEYS, type SearchFields } from "./case-doc";
import { FUSE_OPTIONS } from "./rerank";

/**
 * The matched words of one page of results, marked for the screen. Fuse itself finds them, run on
 * just that page (a few dozen cases), so what is marked is exactly what Fuse matched.
 */
type Range = readonly [number, number];
/** Long texts are cut to a window around the first match so a card stays short. */
const SNIPPET_CHARS = 180;
const LONG: ReadonlySet<MarkedField> = new Set(["notes", "comments"]);

const WORD_CHAR = /[\p{L}\p{N}]/u;
/**
 * Fuse marks the letters it matched, which for a slip can be scattered ("minu" and "s" of
 * "minutes"); a person reads words, so each mark grows to the whole word it touches.
 */
export function wholeWords(text: string, ranges: readonly Range[]): Range[] {
  const grown = ranges.map(([s, e]) => {
    while (s > 0 && WORD_CHAR.test(text[s - 1]) && WORD_CHAR.test(text[s])) s--;
    while (e < text.length - 1 && WORD_CHAR.test(text[e + 1]) && WORD_CHAR.test(text[e])) e++;
    return [s, e] as const;
  });
  const out: [number, number][] = [];
  for (const [s, e] of grown.sort((a, b) => a[0] - b[0])) {
    const last = out[out.length - 1];
    if (last && s <= last[1] + 1) last[1] = Math.max(last[1], e);
    else out.push([s, e]);
  }
  return out;
}

export function markRuns(text: string, ranges: readonly Range[]): Marked {
  const out: Marked = [];
  let at = 0;
  for (const [start, end] of wholeWords(text, ranges)) {
    if (start < at) continue;
    if (start > at) out.push({ text: text.slice(at, start), hit: false });
    out.push({ text: text.slice(start, end + 1), hit: true });
    at = end + 1;
  }
  if (at < text.length) out.push({ text: text.slice(at), hit: false });
  return out;
}

export function snippet(text: string, ranges: readonly Range[]): Marked {
  if (text.length <= SNIPPET_CHARS) return markRuns(text, ranges);
  ranges = wholeWords(text, ranges);
  const first = Math.min(...ranges.map((r) => r[0]));
  let start = Math.max(0, first - 50);
  if (start > 0) start = text.lastIndexOf(" ", start) + 1;
  const end = Math.min(text.length, start + SNIPPET_CHARS);
  const inside = ranges
    .filter(([s]) => s >= start && s < end)
    .map(([s, e]) => [s - start, Math.min(e, end - 1) - start] as const);
  const runs = markRuns(text.slice(start, end), inside);
  if (start > 0) runs.unshift({ text: "…", hit: false });
  if (end < text.length) runs.push({ text: "…", hit: false });
  return runs;
}

/**
 * One Fuse pass over the page: each case's score (lower is better; 1 where Fuse found no match of
 * its own) and its fields with the words that matched `query` marked.
 */
export function markPage(
  page: SearchFields[],
  query: string,
): { scores: number[]; marked: Partial<Record<MarkedField, Marked>>[] } {
  const marked = page.map(() => ({}) as Partial<Record<MarkedField, Marked>>);
  const scores = page.map(() => 1);
  if (!page.length || !query.trim()) return { scores, marked };
  for (const result of new Fuse(page, FUSE_OPTIONS).search(query)) {
    scores[result.refIndex] = result.score ?? 1;
    for (const m of result.matches ?? []) {
      const key = m.key as MarkedField;
      if (!m.value || !SEARCH_KEYS.includes(key)) continue;
      marked[result.refIndex][key] = LONG.has(key) ? snippet(m.value, m.indices) : markRuns(m.value, m.indices);
    }
  }
  return { scores, marked };
}
