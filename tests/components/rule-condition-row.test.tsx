import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { RuleConditionRow } from "@/components/rulebook/rule-condition-row";
import type { RowState } from "@/hooks/use-rule-draft";
import type { Units } from "@/lib/units";

afterEach(cleanup);

const METRIC: Units = { temperature: "C", length: "mm", mass: "kg" };
const IMPERIAL: Units = { temperature: "F", length: "in", mass: "lb" };
const row = (patch: Partial<RowState>): RowState => ({
  key: 1,
  fact: "pourTempC",
  comparison: "",
  low: "",
  high: "",
  values: [],
  yes: null,
  ...patch,
});

function renderRow(r: RowState, units = METRIC, extra: { onRemove?: () => void } = {}) {
  const onChange = vi.fn();
  render(<RuleConditionRow index={0} row={r} units={units} errors={{}} onChange={onChange} {...extra} />);
  return onChange;
}

describe("RuleConditionRow", () => {
  it("offers the comparisons a number allows, in words, and reports the one chosen", () => {
    const onChange = renderRow(row({}));
    const choices = screen.getAllByRole("radio").map((r) => r.textContent);
    expect(choices).toEqual(expect.arrayContaining(["is below", "is above", "is between"]));
    expect(choices).not.toContain("is one of");
    fireEvent.click(screen.getByRole("radio", { name: "is between" }));
    expect(onChange).toHaveBeenCalledWith({ comparison: "between" });
    // No value box until a comparison is chosen.
    expect(screen.queryByLabelText(/^Value/)).toBeNull();
  });

  it("asks for one value in the person's temperature unit for below and above", () => {
    const onChange = renderRow(row({ comparison: "below" }));
    fireEvent.change(screen.getByLabelText("Value (°C)"), { target: { value: "650" } });
    expect(onChange).toHaveBeenCalledWith({ low: "650" });
    cleanup();
    renderRow(row({ comparison: "above" }), IMPERIAL);
    expect(screen.getByLabelText("Value (°F)")).toBeTruthy();
  });

  it("asks for a range from and to for between", () => {
    const onChange = renderRow(row({ comparison: "between", low: "640" }));
    expect((screen.getByLabelText("From (°C)") as HTMLInputElement).value).toBe("640");
    fireEvent.change(screen.getByLabelText("To (°C)"), { target: { value: "720" } });
    expect(onChange).toHaveBeenCalledWith({ high: "720" });
    expect(screen.queryByLabelText("Value (°C)")).toBeNull();
  });

  it("offers the fact's own values for one-of, and no number box", () => {
    renderRow(row({ fact: "process", comparison: "one-of" }));
    expect(screen.getByLabelText("Values")).toBeTruthy();
    expect(screen.queryByLabelText(/^Value \(/)).toBeNull();
  });

  it("removes the condition only where removing is allowed", () => {
    const onRemove = vi.fn();
    renderRow(row({}), METRIC, { onRemove });
    fireEvent.click(screen.getByRole("button", { name: "Remove condition 1" }));
    expect(onRemove).toHaveBeenCalledOnce();
    cleanup();
    renderRow(row({}));
    expect(screen.queryByRole("button", { name: "Remove condition 1" })).toBeNull();
  });
});
