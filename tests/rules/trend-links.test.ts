import { describe, expect, it } from "vitest";
import { viewFromParams } from "../../lib/casebook-filters";
import { casebookHrefFor } from "../../lib/trend-links";

const opened = (href: string | undefined) =>
  viewFromParams(Object.fromEntries(new URL(href!, "http://x").searchParams));

describe("a trend bar opens the castings behind it in the casebook", () => {
  it("a month of scrap becomes that month's dates and the scrap outcome, kept within the trends' dates", () => {
    // February 2028 is a leap month: 29 days (Gregorian calendar).
    expect(opened(casebookHrefFor("scrap-month", "2028-02", {})).filters).toMatchObject({
      outcome: ["scrap"],
      from: "2028-02-01",
      to: "2028-02-29",
    });
    const within = opened(casebookHrefFor("rework-month", "2026-03", { from: "2026-03-10", process: "lost-foam" }));
    expect(within.filters).toMatchObject({
      outcome: ["rework"],
      from: "2026-03-10",
      to: "2026-03-31",
      process: ["lost-foam"],
    });
  });
  it("a process, alloy or cause bar filters by it and keeps the other filters", () => {
    expect(opened(casebookHrefFor("process", "green-sand", { alloy: "A356.0" })).filters).toMatchObject({
      process: ["green-sand"],
      alloy: ["A356.0"],
    });
    expect(opened(casebookHrefFor("cause", "cold-pour", {})).filters.cause).toEqual(["cold-pour"]);
  });
  it("a cause named only in words or an unreadable month opens nothing", () => {
    expect(casebookHrefFor("cause", null, {})).toBeUndefined();
    expect(casebookHrefFor("scrap-month", "not logged", {})).toBeUndefined();
  });
});
