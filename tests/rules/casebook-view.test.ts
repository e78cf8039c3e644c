import { describe, expect, it } from "vitest";
import { NO_FILTERS, viewFromParams, viewToParams, type CasebookView } from "../../lib/casebook-filters";

/** The casebook screen keeps its question in the URL: what goes out must come back the same. */
describe("casebook view in the URL", () => {
  it("round-trips words, every filter, the order and the page", () => {
    const view: CasebookView = {
      words: "cold shut",
      filters: { ...NO_FILTERS, defect: ["misrun", "cold-shut"], process: ["lost-foam"], from: "2026-01-01" },
      sort: "date-asc",
      page: 3,
    };
    const params = viewToParams(view);
    expect(params).toMatchObject({ q: "cold shut", defect: "misrun,cold-shut", page: "3", to: undefined });
    expect(viewFromParams(params)).toEqual(view);
  });

  it("leaves defaults out of the URL, so setting them clears what was there", () => {
    const params = viewToParams({ words: "", filters: NO_FILTERS, page: 1 });
    expect(Object.values(params).every((v) => v === undefined)).toBe(true);
    expect(Object.keys(params)).toEqual(expect.arrayContaining(["q", "page", "defect", "by", "from"]));
  });

  it("reads an edited or damaged URL as the nearest sensible view instead of failing", () => {
    const view = viewFromParams({ page: "-2", sort: "loudest", defect: ",misrun,,", q: ["a", "b"] });
    expect(view).toEqual({ words: "a", filters: { ...NO_FILTERS, defect: ["misrun"] }, sort: undefined, page: 1 });
    expect(viewFromParams({ page: "2.5" }).page).toBe(1);
  });
});
