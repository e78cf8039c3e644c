import Fuse from "fuse.js";
import type { CauseOption } from "./rulebook-schemas";

/**
 * Finding a cause of the rulebook by a few typed words, forgiving slips ("shrinkege", "wet sand"):
 * Fuse.js over the titles, each query word matched on its own. Titles only: the fixes name remedies,
 * and a mentor looks for what went wrong.
 */
const OPTIONS = {
  keys: ["title"],
  threshold: 0.35,
  ignoreLocation: true,
  useExtendedSearch: false,
  minMatchCharLength: 2,
};

export function causeFinder(causes: CauseOption[]) {
  const fuse = new Fuse(causes, OPTIONS);
  return (query: string, limit = 6): CauseOption[] => {
    const words = query
      .trim()
      .split(/\s+/)
      .filter((w) => w.length >= 2);
    if (!words.length) return [];
    // Every word must match: the causes each word finds, kept in the order of the first word's scores.
    const sets = words.map((w) => new Set(fuse.search(w).map((r) => r.item.id)));
    return fuse
      .search(words[0])
      .map((r) => r.item)
      .filter((c) => sets.every((s) => s.has(c.id)))
      .slice(0, limit);
  };
}
