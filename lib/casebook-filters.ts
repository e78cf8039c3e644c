import type { Outcome } from "./notebook-schemas";
import type { SearchRequest } from "./search-schemas";
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
