import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen, within } from "@testing-library/react";
import type { LoadSchedulePreviewResponse } from "@spanwright/contracts";
import { renderWithProviders, stubFetch } from "../test/renderWithProviders";
import { canApplySchedule, LoadScheduleImport, sortScheduleErrors } from "./LoadScheduleImport";
import { unitsFor } from "./reactionUnits";

afterEach(() => {
  vi.unstubAllGlobals();
});

const PREVIEW = "POST /api/projects/p1/beams/b1/load-schedule/preview";

const withErrors: LoadSchedulePreviewResponse = {
  ok: false,
  preview: { rows: [{ row: 2, caseId: "L", load: { type: "point", x: 3, fy: -12_000 } }], cases: [{ id: "L", willCreate: false, loads: [] }] },
  errors: [
    { row: 4, column: "position", code: "out-of-range", message: "Position 14 m is beyond the beam end at 12 m." },
    { row: 3, column: "magnitude", code: "unknown-unit", message: "Unknown unit “kg”." },
  ],
};

const clean: LoadSchedulePreviewResponse = {
  ok: true,
  preview: {
    rows: [{ row: 2, caseId: "P", load: { type: "distributed", x1: 0, x2: 6, qy1: -3000, qy2: -3000 } }],
    cases: [{ id: "P", willCreate: true, loads: [] }],
  },
  errors: [],
};

function pickFile() {
  const input = screen.getByLabelText("Load schedule (CSV)");
  const file = new File(["case,type,position,magnitude\n"], "schedule.csv", { type: "text/csv" });
  fireEvent.change(input, { target: { files: [file] } });
}

describe("load schedule preview", () => {
  it("lists the problems line by line and keeps Apply disabled", async () => {
    vi.stubGlobal("fetch", stubFetch({ [PREVIEW]: { status: 200, body: withErrors } }));
    renderWithProviders(<LoadScheduleImport projectId="p1" beamId="b1" baseVersion={3} units={unitsFor("si")} />);
    pickFile();
    const table = (await screen.findByText("Problems by line")).closest("table")!;
    const lines = within(table).getAllByRole("row").slice(1).map((r) => r.textContent);
    expect(lines).toEqual(["3magnitudeUnknown unit “kg”.", "4positionPosition 14 m is beyond the beam end at 12 m."]);
    expect(screen.getByText(/2 problems in the file/)).toBeTruthy();
    expect((screen.getByRole("button", { name: "Apply as a new revision" }) as HTMLButtonElement).disabled).toBe(true);
  });

  it("shows the loads in project units and enables Apply for a clean file", async () => {
    vi.stubGlobal("fetch", stubFetch({ [PREVIEW]: { status: 200, body: clean } }));
    renderWithProviders(<LoadScheduleImport projectId="p1" beamId="b1" baseVersion={3} units={unitsFor("si")} />);
    pickFile();
    expect(await screen.findByText("distributed -3 kN/m from 0 m to 6 m")).toBeTruthy();
    expect(screen.getByText("(new case)")).toBeTruthy();
    expect((screen.getByRole("button", { name: "Apply as a new revision" }) as HTMLButtonElement).disabled).toBe(false);
  });

  it("explains a file refused as too large", async () => {
    vi.stubGlobal(
      "fetch",
      stubFetch({ [PREVIEW]: { status: 413, body: { error: { code: "file-too-large", message: "too large" } } } }),
    );
    renderWithProviders(<LoadScheduleImport projectId="p1" beamId="b1" baseVersion={3} units={unitsFor("si")} />);
    pickFile();
    expect(await screen.findByText("The file is larger than the upload limit.")).toBeTruthy();
  });

  it("sorts whole-file problems first and refuses an empty or failed preview", () => {
    expect(sortScheduleErrors([{ row: 5, column: null, code: "x", message: "" }, { row: 0, column: null, code: "y", message: "" }]).map((e) => e.row)).toEqual([0, 5]);
    expect(canApplySchedule(undefined)).toBe(false);
    expect(canApplySchedule(withErrors)).toBe(false);
    expect(canApplySchedule({ ...clean, preview: { rows: [], cases: [] } })).toBe(false);
    expect(canApplySchedule(clean)).toBe(true);
  });
});
