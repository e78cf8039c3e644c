import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { useState } from "react";
import { afterEach, describe, expect, it } from "vitest";
import { DateField } from "@/components/ui/date-field";
import { addDays, dayInWords, localDay } from "@/lib/dates";

afterEach(cleanup);

function Controlled({ start = "" }: { start?: string }) {
  const [value, setValue] = useState(start);
  return (
    <>
      <DateField label="Poured on" value={value} onChange={setValue} testID="poured-on" />
      <p data-testid="echo">{value}</p>
    </>
  );
}

describe("DateField", () => {
  it("takes a typed day and says it in words beside the box", () => {
    render(<Controlled />);
    fireEvent.change(screen.getByLabelText("Poured on"), { target: { value: "2026-03-14" } });
    expect(screen.getByTestId("echo").textContent).toBe("2026-03-14");
    // 14 March 2026 is a Saturday (any calendar).
    expect(screen.getByTestId("poured-on-words").textContent).toBe("Saturday 14 March 2026");
  });

  it("says nothing in words for half a date or a day that does not exist", () => {
    render(<Controlled start="2026-02-3" />);
    expect(screen.queryByTestId("poured-on-words")).toBeNull();
    fireEvent.change(screen.getByLabelText("Poured on"), { target: { value: "2026-02-31" } });
    expect(screen.queryByTestId("poured-on-words")).toBeNull();
  });

  it("sets the day from the calendar, which offers nothing before year 1 or after tomorrow", () => {
    render(<Controlled start="2026-03-14" />);
    const calendar = screen.getByLabelText("Poured on, from a calendar") as HTMLInputElement;
    expect(calendar.type).toBe("date");
    expect(calendar.value).toBe("2026-03-14");
    expect(calendar.min).toBe("0001-01-01");
    expect(calendar.max).toBe(addDays(localDay(), 1));
    fireEvent.change(calendar, { target: { value: "2026-04-02" } });
    expect(screen.getByTestId("echo").textContent).toBe("2026-04-02");
    expect((screen.getByLabelText("Poured on") as HTMLInputElement).value).toBe("2026-04-02");
  });
});

describe("days in words", () => {
  it("names today, yesterday and tomorrow", () => {
    expect(dayInWords("2026-12-03", "2026-12-03")).toBe("Thursday 3 December 2026, today");
    expect(dayInWords("2026-12-02", "2026-12-03")).toBe("Wednesday 2 December 2026, yesterday");
    expect(dayInWords("2027-01-01", "2026-12-31")).toBe("Friday 1 January 2027, tomorrow");
    expect(dayInWords("2024-02-29", "2026-12-03")).toBe("Thursday 29 February 2024");
    expect(dayInWords("2025-02-29")).toBeUndefined();
  });
});
