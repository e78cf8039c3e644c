import type { IFuseOptions } from "fuse.js";
import { SEARCH_TOKEN } from "../../lib/search-schemas";
import { SEARCH_KEYS, type SearchFields, type SearchKey } from "./case-doc";

/**
 * The page's own order: PostgreSQL picks and orders the candidates (every query word or a similar
 * word present, ts_rank by field weight), then Fuse.js scores just that page (a few dozen cases),
 * so within a page the case whose words match best comes first, and the marked words are
 * exactly what Fuse matched (marks.ts, one Fuse pass for both).
 */
/** What a case is (part, defect, cause) outranks how it was poured, which outranks what was written. */
const KEY_WEIGHTS: Record<SearchKey, number> = {
  part: 3,
  defects: 3,
  causes: 2,
  conditions: 1.5,
  notes: 1,
  comments: 1,
};
/** 0.34 lets a six-letter word carry two slips ("misrnu" -> misrun), a three-letter one a single slip. */
const THRESHOLD = 0.34;

export const FUSE_OPTIONS = {
  keys: SEARCH_KEYS.map((name) => ({ name, weight: KEY_WEIGHTS[name] })),
  useTokenSearch: true,
  tokenMatch: "all",
  tokenize: SEARCH_TOKEN,
  threshold: THRESHOLD,
  ignoreLocation: true,
  includeScore: true,
  includeMatches: true,
} satisfies IFuseOptions<SearchFields>;
