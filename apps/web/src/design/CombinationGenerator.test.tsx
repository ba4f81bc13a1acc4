import { describe, expect, it, vi } from "vitest";
import { fireEvent, render, screen, within } from "@testing-library/react";
import { CombinationGenerator } from "./CombinationGenerator";

const cases = [
  { id: "D", category: "dead" as const },
  { id: "L", category: "live" as const },
];

describe("CombinationGenerator", () => {
  it("previews ASCE 7-22 LRFD combination 2 as 1.2D + 1.6L for dead and live cases, and applies it", () => {
    const onApply = vi.fn();
    render(<CombinationGenerator cases={cases} onApply={onApply} />);
    const table = screen.getByRole("table", { name: "Generated combinations" });
    // ASCE/SEI 7-22 §2.3.1 combination 2: 1.2D + 1.6L + 0.5(Lr or S or R); with only D and L present.
    const row = within(table).getByText("1.2 D + 1.6 L").closest("tr");
    expect(row).not.toBeNull();
    expect(within(row as HTMLElement).getByText("ASCE/SEI 7-22 §2.3.1 combination 2")).toBeTruthy();
    // §2.3.1 combination 1: 1.4D.
    expect(within(table).getByText("1.4 D")).toBeTruthy();
    expect(screen.getByText(/Live-load reduction .* is not applied/)).toBeTruthy();

    fireEvent.click(screen.getByRole("button", { name: /Apply 2 combinations/ }));
    const applied = onApply.mock.calls[0]?.[0] as { id: string; factors: Record<string, number> }[];
    expect(applied.find((c) => c.id === "LRFD2")?.factors).toEqual({ D: 1.2, L: 1.6 });
  });

  it("switches to ASD, where ASCE/SEI 7-22 §2.4.1 combination 2 is D + L", () => {
    render(<CombinationGenerator cases={cases} onApply={() => {}} />);
    fireEvent.change(screen.getByLabelText("Preset"), { target: { value: "asce7-22-allowable" } });
    const table = screen.getByRole("table", { name: "Generated combinations" });
    expect(within(table).queryByText("1.2 D + 1.6 L")).toBeNull();
    expect(within(table).getByText("1 D + 1 L")).toBeTruthy();
  });
});
