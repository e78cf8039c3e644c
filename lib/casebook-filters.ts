import type { Outcome } from "./notebook-schemas";
import { SEARCH_SORTS, type SearchRequest, type SearchSort } from "./search-schemas";
import type { DefectType, Process } from "../rules/case";

/** The filters as the screen holds them: several values of one filter are alternatives. */
export type CasebookFilters = {
  defect: string[];
  alloy: string[];
  process: string[];
  outcome: string[];
  cause: string[];
  by: string[];
  from: string;
  to: string;
};
export const NO_FILTERS: CasebookFilters = {
  defect: [],
  alloy: [],
  process: [],
  outcome: [],
  cause: [],
  by: [],
  from: "",
  to: "",
};
export type ListKey = Exclude<keyof CasebookFilters, "from" | "to">;

export const isDay = (s: string) =>
  /^\d{4}-\d{2}-\d{2}$/.test(s) &&
  !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) &&
  new Date(`${s}T00:00:00Z`).toISOString().startsWith(s);
/** What the API gets: a half-typed date stays out until it is a real day. */
export function filterQuery(f: CasebookFilters): SearchRequest {
  return {
    defect: f.defect as DefectType[],
    alloy: f.alloy,
    process: f.process as Process[],
    outcome: f.outcome as Outcome[],
    cause: f.cause,
    by: f.by,
    from: isDay(f.from) ? f.from : undefined,
    to: isDay(f.to) ? f.to : undefined,
  };
}
export const activeCount = (f: CasebookFilters) =>
  f.defect.length +
  f.alloy.length +
  f.process.length +
  f.outcome.length +
  f.cause.length +
  f.by.length +
  (f.from ? 1 : 0) +
  (f.to ? 1 : 0);

/**
 * What the casebook screen shows, as its URL holds it (`/?q=porosity&defect=gas-porosity,shrinkage&page=2`):
 * a reload, a bookmark or a link sent to a mentor opens the same page of the same question. Lists travel
 * as "a,b" like the API's own query; anything unreadable falls back to the default instead of failing.
 */
export type CasebookView = { words: string; filters: CasebookFilters; sort?: SearchSort; page: number };
export type RouteParams = Record<string, string | string[] | undefined>;

const LIST_KEYS: ListKey[] = ["defect", "alloy", "process", "outcome", "cause", "by"];
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v) ?? "";
const listOf = (v: string | string[] | undefined) =>
  first(v)
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);

export function viewFromParams(p: RouteParams): CasebookView {
  const filters = { ...NO_FILTERS, from: first(p.from), to: first(p.to) };
  for (const key of LIST_KEYS) filters[key] = listOf(p[key]);
  const page = Number(first(p.page));
  return {
    words: first(p.q),
    filters,
    sort: SEARCH_SORTS.find((s) => s === first(p.sort)),
    page: Number.isInteger(page) && page >= 1 ? page : 1,
  };
}

/** Every key is present, empty ones as undefined, so setting them clears what the URL held before. */
export function viewToParams(v: CasebookView): Record<string, string | undefined> {
  const out: Record<string, string | undefined> = {
    q: v.words || undefined,
    sort: v.sort,
    page: v.page > 1 ? String(v.page) : undefined,
    from: v.filters.from || undefined,
    to: v.filters.to || undefined,
  };
  for (const key of LIST_KEYS) out[key] = v.filters[key].join(",") || undefined;
  return out;
}

/** Cases on one casebook page. */
export const CASEBOOK_PAGE_SIZE = 20;

/**
 * The search a casebook view asks: "best match" is the order only when there are words to match, and
 * is left out otherwise (the server's default, newest first). The sign-in fetches the first page of an
 * empty view with this too, so its answer waits in the cache under the key the screen then asks for.
 */
export function searchRequestFor(view: CasebookView): SearchRequest {
  const { words, filters, sort, page } = view;
  return {
    q: words,
    ...filterQuery(filters),
    sort: words ? sort : sort === "relevance" ? undefined : sort,
    page,
    pageSize: CASEBOOK_PAGE_SIZE,
  };
}
