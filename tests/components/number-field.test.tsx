import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { useState } from "react";
import { afterEach, describe, expect, it } from "vitest";
import { NumberField } from "@/components/ui/number-field";

afterEach(cleanup);

function Controlled(props: { unit?: string; whole?: boolean; signed?: boolean; fractions?: boolean; error?: string }) {
  const [value, setValue] = useState("");
  return (
    <>
      <NumberField label="Pour temperature" value={value} onChangeText={setValue} {...props} />
      <p data-testid="echo">{value}</p>
    </>
  );
}

describe("NumberField", () => {
  it("names the box with its unit, shows the unit beside it and hands typed text back", () => {
    render(<Controlled unit="°C" />);
    const box = screen.getByLabelText("Pour temperature (°C)");
    expect(screen.getByText("°C")).toBeTruthy();
    fireEvent.change(box, { target: { value: "1180" } });
    expect(screen.getByTestId("echo").textContent).toBe("1180");
    expect((box as HTMLInputElement).value).toBe("1180");
  });

  it("asks for a decimal keypad, or a whole-number one for counts", () => {
    render(<Controlled unit="°C" />);
    expect(screen.getByLabelText("Pour temperature (°C)").getAttribute("inputmode")).toBe("decimal");
    cleanup();
    render(<Controlled whole />);
    expect(screen.getByLabelText("Pour temperature").getAttribute("inputmode")).toBe("numeric");
  });

  it("asks for a keyboard with a minus, slash and inch mark where iOS's number pads have none", () => {
    // iOS's decimal and numeric pads lack "-" and "/": signed numbers and inch fractions get the text keyboard.
    render(<Controlled unit="°F" signed />);
    const air = screen.getByLabelText("Pour temperature (°F)");
    expect(air.getAttribute("inputmode")).toBe("text");
    fireEvent.change(air, { target: { value: "-4" } });
    expect(screen.getByTestId("echo").textContent).toBe("-4");
    cleanup();
    render(<Controlled unit="in" fractions />);
    const wall = screen.getByLabelText("Pour temperature (in)");
    expect(wall.getAttribute("inputmode")).toBe("text");
    expect(wall.getAttribute("placeholder")).toBe("e.g. 1 1/2");
    fireEvent.change(wall, { target: { value: '1-1/2"' } });
    expect(screen.getByTestId("echo").textContent).toBe('1-1/2"');
  });

  it("shows the error as an alert and marks the box invalid only when there is one", () => {
    render(<Controlled unit="°F" />);
    expect(screen.queryByRole("alert")).toBeNull();
    expect(screen.getByLabelText("Pour temperature (°F)").getAttribute("aria-invalid")).toBe("false");
    cleanup();
    render(<Controlled unit="°F" error="Enter a temperature between 32 and 3600 °F" />);
    expect(screen.getByRole("alert").textContent).toBe("Enter a temperature between 32 and 3600 °F");
    expect(screen.getByLabelText("Pour temperature (°F)").getAttribute("aria-invalid")).toBe("true");
  });
});
