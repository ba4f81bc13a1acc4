import { describe, expect, it } from "vitest";
import { fireEvent, render, screen, within } from "@testing-library/react";
import { MATERIAL_PRESETS, propertiesOfValidShape, type IShape } from "@spanwright/solver/design";
import { solve } from "@spanwright/solver";
import { ChecksPanel } from "./ChecksPanel";
import { defaultChoices, type CheckChoices } from "./checkChoices";
import { stationsForChecks } from "./computeBeamChecks";
import type { DesignModel } from "./designModel";

// Plates of a W410×46-like rolled shape (approximate, from memory); the test's numbers are hand
// calculations on the plates, not table values.
const shape: IShape = { kind: "i-shape", d: 0.403, bf: 0.14, tf: 0.0112, tw: 0.007 };
const I = propertiesOfValidShape(shape).I;
const E = 200e9;
const steel = MATERIAL_PRESETS.find((m) => m.id === "steel-a992")!;

const loadCases = [
  { id: "D", category: "dead" as const, loads: [{ type: "distributed", x1: 0, x2: 6, qy1: -10e3, qy2: -10e3 }] },
  { id: "L", category: "live" as const, loads: [{ type: "distributed", x1: 0, x2: 6, qy1: -15e3, qy2: -15e3 }] },
];

/** Invented demo beam: one 6 m simple span, uniform dead 10 kN/m and live 15 kN/m. */
const model: DesignModel & { format: string } = {
  format: "spanwright.beam/1",
  nodes: [
    { x: 0, support: { type: "pinned" } },
    { x: 6, support: { type: "pinned" } },
  ],
  segments: [{ E, I }],
  loadCases,
  combinations: [{ id: "LRFD2", factors: { D: 1.2, L: 1.6 } }],
};

function rowOf(title: RegExp): HTMLElement {
  const table = screen.getByRole("table", { name: "Member checks" });
  const row = within(table).getByText(title).closest("tr");
  if (!row) throw new Error(`no row ${String(title)}`);
  return row as HTMLElement;
}

function cells(row: HTMLElement): string[] {
  return [...row.querySelectorAll("td")].map((td) => td.textContent ?? "");
}

describe("ChecksPanel", () => {
  it("lists flexure, shear and deflection per span with demand, capacity and utilisation", () => {
    render(<ChecksPanel model={model} units="si" shape={shape} material={steel} solveModel={solve} />);
    const table = screen.getByRole("table", { name: "Member checks" });
    const rows = within(table).getAllByRole("row").slice(1);
    expect(rows).toHaveLength(3);

    // Simple span under uniform load (statics): Mu = wu·L²/8 with wu = 1.2·10 + 1.6·15 = 36 kN/m → 162 kN·m.
    const flexure = cells(rowOf(/flexure/i));
    expect(flexure).toContain("162 kN·m");
    expect(flexure.join(" ")).toMatch(/AISC 360-22 §F2/);
    // Vu = wu·L/2 = 108 kN.
    const shear = cells(rowOf(/shear/i));
    expect(shear).toContain("108 kN");

    // Live-load deflection 5wL⁴/(384EI) (simple span, uniform load) against L/360 = 16.67 mm.
    const deflection = rowOf(/Deflection/);
    const delta = (5 * 15e3 * 6 ** 4) / (384 * E * I);
    const u = Number(deflection.querySelector("[data-utilisation]")?.getAttribute("data-utilisation"));
    expect(u).toBeCloseTo(delta / (6 / 360), 3);
    expect(cells(deflection)).toContain(`${Number((delta * 1000).toPrecision(4))} mm`);
    expect(cells(deflection)).toContain("16.67 mm");

    for (const row of rows) {
      const status = row.getAttribute("data-status");
      const ratio = Number(row.querySelector("[data-utilisation]")?.getAttribute("data-utilisation"));
      expect(status).toBe(ratio <= 1 ? "pass" : "fail");
    }
    expect(screen.getByText(/do not replace, the judgement of a licensed engineer/)).toBeTruthy();
    expect(screen.getByText("AISC 360-22")).toBeTruthy();
  });

  it("splits the span into unbraced segments when Lb is typed", () => {
    render(<ChecksPanel model={model} units="si" shape={shape} material={steel} solveModel={solve} />);
    fireEvent.change(screen.getByLabelText("Unbraced length Lb (m)"), { target: { value: "2" } });
    const table = screen.getByRole("table", { name: "Member checks" });
    // Three 2 m segments of flexure, one shear and one deflection row.
    expect(within(table).getAllByText(/flexure/i)).toHaveLength(3);
    expect(within(table).getAllByRole("row")).toHaveLength(1 + 5);
  });

  it("checks a second deflection limit, L/240 dead + live, for the cases ticked under it", () => {
    render(<ChecksPanel model={model} units="si" shape={shape} material={steel} solveModel={solve} />);
    const total = screen.getAllByRole("group", { name: "Applies to" })[1]!;
    fireEvent.click(within(total).getByLabelText("LRFD2"));
    const table = screen.getByRole("table", { name: "Member checks" });
    const rows = within(table).getAllByText(/Deflection/).map((el) => el.closest("tr") as HTMLElement);
    expect(rows).toHaveLength(2);
    // IBC 2021 Table 1604.3 floor members, D + L: L/240 = 6000/240 = 25 mm.
    expect(cells(rows[1]!)).toContain("25 mm");
    expect(cells(rows[1]!).join(" ")).toMatch(/δ ≤ L\/240/);
  });

  it("uses a result that already has the check stations, and asks for them when it has not and no solver is given", () => {
    const { unmount } = render(<ChecksPanel model={model} units="si" shape={shape} material={steel} />);
    expect(screen.getByText(/lacks the stations the checks need/)).toBeTruthy();
    unmount();
    const result = solve({ ...model, stations: stationsForChecks(model, null) });
    render(<ChecksPanel model={model} result={result} units="si" shape={shape} material={steel} />);
    expect(within(screen.getByRole("table", { name: "Member checks" })).getByText("162 kN·m")).toBeTruthy();
  });

  it("starts from the choices given, takes Cb = 1.0 when chosen, and reports each change in SI", () => {
    const seen: CheckChoices[] = [];
    const initial = { ...defaultChoices(model), method: "ASD" as const, lb: 3 };
    render(<ChecksPanel model={model} units="si" shape={shape} material={steel} solveModel={solve} initial={initial} onChoicesChange={(c) => seen.push(c)} />);
    expect((screen.getByLabelText("Design method") as HTMLSelectElement).value).toBe("ASD");
    expect((screen.getByLabelText("Unbraced length Lb (m)") as HTMLInputElement).value).toBe("3");
    fireEvent.change(screen.getByLabelText("Cb (lateral-torsional buckling)"), { target: { value: "unity" } });
    expect(seen.at(-1)).toMatchObject({ method: "ASD", lb: 3, cb: "unity" });
    // Cb taken as 1.0 (AISC 360-22 §F1) is shown beside the F2 inputs of every flexure row
    const flexure = within(screen.getByRole("table", { name: "Member checks" })).getAllByText(/flexure/i);
    expect(flexure).toHaveLength(2);
  });
});
