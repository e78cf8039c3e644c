import { NO_FILTERS, viewToParams, type CasebookFilters } from "./casebook-filters";
import type { TrendsQuery } from "./trends-schemas";

/** The charts whose bars open the castings behind them in the casebook. */
export type TrendChart = "process" | "alloy" | "scrap-month" | "rework-month" | "cause";

/** The last day of a month "YYYY-MM" (day 0 of the next month is the last of this one). */
function lastDayOf(month: string): string {
  const [y, m] = month.split("-").map(Number);
  return new Date(Date.UTC(y, m, 0)).toISOString().slice(0, 10);
}
const later = (a: string, b?: string) => (b && b > a ? b : a);
const earlier = (a: string, b?: string) => (b && b < a ? b : a);

/**
 * The casebook address that lists the castings a bar counts, within the trends' own filters
 * (`/?process=green-sand&from=2026-03-01`). Undefined for a bar the casebook cannot narrow to
 * (a superheat band, a cause named only in words).
 */
export function casebookHrefFor(chart: TrendChart, key: string | null, q: TrendsQuery): string | undefined {
  if (!key) return undefined;
  const f: CasebookFilters = {
    ...NO_FILTERS,
    process: q.process ? [q.process] : [],
    alloy: q.alloy ? [q.alloy] : [],
    from: q.from ?? "",
    to: q.to ?? "",
  };
  if (chart === "process") f.process = [key];
  if (chart === "alloy") f.alloy = [key];
  if (chart === "cause") f.cause = [key];
  if (chart === "scrap-month" || chart === "rework-month") {
    if (!/^\d{4}-\d{2}$/.test(key)) return undefined;
    f.outcome = [chart === "scrap-month" ? "scrap" : "rework"];
    f.from = later(`${key}-01`, q.from);
    f.to = earlier(lastDayOf(key), q.to);
  }
  const params = Object.entries(viewToParams({ words: "", filters: f, page: 1 })).filter(
    (e): e is [string, string] => e[1] !== undefined,
  );
  return `/?${new URLSearchParams(params)}`;
}
