import { describe, expect, it, vi } from "vitest";
import { fireEvent, render, screen } from "@testing-library/react";
import { QuantityInput } from "./QuantityInput";

describe("QuantityInput", () => {
  it("shows SI values in display units and commits typed values in SI", () => {
    const onCommit = vi.fn();
    render(<QuantityInput value={6} kind="position" units="us" onCommit={onCommit} label="x" />);
    const input = screen.getByLabelText("x (ft)") as HTMLInputElement;
    expect(input.value).toBe("19.68503937");
    fireEvent.change(input, { target: { value: "12'-6\"" } });
    fireEvent.keyDown(input, { key: "Enter" });
    expect(onCommit).toHaveBeenCalledWith(12 * 0.3048 + 6 * 0.0254);
  });

  it("flags a value of the wrong dimension and does not commit it", () => {
    const onCommit = vi.fn();
    render(<QuantityInput value={-3000} kind="distributed" units="si" onCommit={onCommit} label="q" />);
    const input = screen.getByLabelText("q (kN/m)");
    fireEvent.change(input, { target: { value: "5 kN" } });
    fireEvent.blur(input);
    expect(onCommit).not.toHaveBeenCalled();
    expect(input.getAttribute("aria-invalid")).toBe("true");
  });
});
