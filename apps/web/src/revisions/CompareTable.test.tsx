import { describe, expect, it } from "vitest";
import { fireEvent, render, screen } from "@testing-library/react";
import type { ValueChangeJson } from "@spanwright/contracts";
import { CompareTable } from "./CompareTable";
import { unitsFor } from "./reactionUnits";

const v = (label: string, before: number | null, after: number | null): ValueChangeJson => {
  const change = before !== null && after !== null ? after - before : null;
  const changePct = change !== null && before ? (100 * change) / Math.abs(before) : null;
  return { x: 0, label, kind: "combination", id: "C1", quantity: "fy", before, after, change, changePct, flagged: change === null || Math.abs(changePct ?? 0) > 5 };
};

const values = [v("S1", 100_000, 103_000), v("S2", 50_000, 60_000), v("S3", null, 4_000)];

function severities(container: HTMLElement): string[] {
  return [...container.querySelectorAll("tbody tr")].map((tr) => tr.getAttribute("data-severity") ?? "");
}

describe("CompareTable", () => {
  it("highlights changes beyond the project threshold only", () => {
    const { container } = render(<CompareTable values={values} units={unitsFor("si")} thresholdPct={5} from={3} to={4} />);
    expect(severities(container)).toEqual(["within", "beyond", "added"]);
    expect(screen.getByText("+20.0 %")).toBeTruthy();
    expect(screen.getByText(/2 values changed by more than 5 %/)).toBeTruthy();
  });

  it("follows the project's threshold: at 2 % the 3 % change highlights too", () => {
    const { container } = render(<CompareTable values={values} units={unitsFor("si")} thresholdPct={2} from={3} to={4} />);
    expect(severities(container)).toEqual(["beyond", "beyond", "added"]);
  });

  it("can show only the highlighted values", () => {
    const { container } = render(<CompareTable values={values} units={unitsFor("si")} thresholdPct={5} from={3} to={4} />);
    fireEvent.click(screen.getByRole("checkbox", { name: "Only changes beyond the threshold" }));
    expect(severities(container)).toEqual(["beyond", "added"]);
  });
});
