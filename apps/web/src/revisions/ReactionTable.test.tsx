import { describe, expect, it } from "vitest";
import { fireEvent, render, screen, within } from "@testing-library/react";
import { ReactionTable } from "./ReactionTable";
import { KIP_N, unitsFor } from "./reactionUnits";
import { sampleReactionTable } from "./testTables";

function bodyRows() {
  const table = screen.getByRole("table");
  return within(table).getAllByRole("row").filter((r) => within(r).queryAllByRole("cell").length > 0);
}

describe("ReactionTable", () => {
  it("flags the support with uplift, in the warning and in the row", () => {
    render(<ReactionTable table={sampleReactionTable()} units={unitsFor("si")} />);
    expect(screen.getByText(/S3 pulls the beam down/)).toBeTruthy();
    const s3 = bodyRows().find((r) => r.textContent?.startsWith("S3"))!;
    expect(within(s3).getByText("uplift")).toBeTruthy();
    expect(within(s3).getAllByText("(uplift)")).toHaveLength(3);
  });

  it("shows values in the project's units: kip and kip·ft for a US project", () => {
    const table = sampleReactionTable();
    const rows = table.rows.map((r) => (r.kind === "case" && r.id === "D" && r.node === 1 ? { ...r, fy: 25 * KIP_N } : r));
    render(<ReactionTable table={{ ...table, rows }} units={unitsFor("us")} />);
    expect(screen.getByRole("button", { name: /D Fy \(kip\)/ })).toBeTruthy();
    expect(screen.getByRole("button", { name: /D Mz \(kip·ft\)/ })).toBeTruthy();
    const s2 = bodyRows().find((r) => r.textContent?.startsWith("S2"))!;
    expect(within(s2).getByText("25.000")).toBeTruthy();
  });

  it("sorts by a column and filters supports", () => {
    render(<ReactionTable table={sampleReactionTable()} units={unitsFor("si")} />);
    const header = screen.getByRole("button", { name: /^D Fy \(kN\)/ });
    fireEvent.click(header);
    fireEvent.click(header);
    // Second click sorts descending: S2 (50) before S1 (20) before S3 (10).
    expect(bodyRows().map((r) => r.textContent?.slice(0, 2))).toEqual(["S2", "S1", "S3"]);
    fireEvent.change(screen.getByRole("searchbox", { name: "Filter supports" }), { target: { value: "s1" } });
    expect(bodyRows().map((r) => r.textContent?.slice(0, 2))).toEqual(["S1"]);
  });

  it("hides a column group and keeps only uplift rows on request", () => {
    render(<ReactionTable table={sampleReactionTable()} units={unitsFor("si")} />);
    fireEvent.click(screen.getByRole("checkbox", { name: "Load cases (unfactored)" }));
    expect(screen.queryByRole("button", { name: /^D Fy/ })).toBeNull();
    fireEvent.click(screen.getByRole("checkbox", { name: "Uplift only" }));
    expect(bodyRows()).toHaveLength(1);
  });

  it("carries the caution", () => {
    render(<ReactionTable table={sampleReactionTable()} units={unitsFor("si")} />);
    expect(screen.getByText(/do not replace, the judgement of a licensed engineer/)).toBeTruthy();
  });
});
