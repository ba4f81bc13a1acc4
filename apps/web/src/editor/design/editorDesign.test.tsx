import { describe, expect, it } from "vitest";
import { fireEvent, render, screen, within } from "@testing-library/react";
import type { ReactNode } from "react";
import { analyze, beamModelSchema } from "@spanwright/solver";
import { findMaterialPreset } from "@spanwright/solver/design";
import { simpleSpanDeadLive, wShape } from "../../test/designFixtures";
import { setSegmentSection } from "../commands/designCommands";
import type { BeamDocument } from "../model/BeamDocument";
import { fromExchange, toExchange, type ExchangeModel } from "../model/exchange";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import { CombinationsTable } from "../tables/CombinationsTable";
import { SegmentsTable } from "../tables/SegmentsTable";
import { EditorChecks } from "./EditorChecks";
import { SectionAtCursor } from "./SectionAtCursor";

// wShape: plates of a W410×46-like rolled shape (approximate, from memory); the expected numbers
// below are hand calculations on this invented demo beam, not table values.
const steel = findMaterialPreset("steel-a992")!;

/** Invented demo beam: one 6 m simple span, uniform dead 10 kN/m and live 15 kN/m. */
const demo = simpleSpanDeadLive({ span: 6, dead: 10e3, live: 15e3, I: 1e-4, combinations: [] });

function demoDocument(combinations: ExchangeModel["combinations"] = []): BeamDocument {
  const r = fromExchange({ ...demo, combinations });
  if (!r.ok) throw new Error(r.error.message);
  const withSection = setSegmentSection(r.doc, { segmentIds: [r.doc.segments[0]!.id], shape: wShape, material: steel });
  if (!withSection.ok) throw new Error(withSection.error.message);
  return { ...r.doc, ...withSection.change.patch.after };
}

function withStore(store: EditorStore, children: ReactNode) {
  return <EditorStoreContext.Provider value={store}>{children}</EditorStoreContext.Provider>;
}

const analysisOf = (doc: BeamDocument) => analyze(beamModelSchema.parse(toExchange(doc)));

describe("the Checks tab in the editor", () => {
  it("shows flexure, shear and deflection utilisation rows for a W-shape beam from the worker's analysis", () => {
    const doc = demoDocument([{ id: "LRFD2", factors: { D: 1.2, L: 1.6 } }]);
    render(<EditorChecks doc={doc} analysis={analysisOf(doc)} />);
    const table = screen.getByRole("table", { name: "Member checks" });
    const rows = within(table).getAllByRole("row").slice(1);
    expect(rows).toHaveLength(3);
    // Simple span, uniform load (statics): Mu = wu·L²/8, wu = 1.2·10 + 1.6·15 = 36 kN/m → 162 kN·m; Vu = wu·L/2 = 108 kN.
    expect(within(table).getByText("162 kN·m")).toBeTruthy();
    expect(within(table).getByText("108 kN")).toBeTruthy();
    for (const row of rows) {
      const ratio = Number(row.querySelector("[data-utilisation]")?.getAttribute("data-utilisation"));
      expect(ratio).toBeGreaterThan(0);
      expect(row.getAttribute("data-status")).toBe(ratio <= 1 ? "pass" : "fail");
    }
    // The stations were read from the analysis, not solved again on the main thread.
    expect(screen.queryByText(/read again/)).toBeNull();
    expect(screen.getByText(/do not replace, the judgement of a licensed engineer/)).toBeTruthy();
  });

  it("reads the brace points from the analysis when Lb is typed", () => {
    const doc = demoDocument([{ id: "LRFD2", factors: { D: 1.2, L: 1.6 } }]);
    render(<EditorChecks doc={doc} analysis={analysisOf(doc)} />);
    fireEvent.change(screen.getByLabelText("Unbraced length Lb (m)"), { target: { value: "2" } });
    const table = screen.getByRole("table", { name: "Member checks" });
    expect(within(table).getAllByText(/flexure/i)).toHaveLength(3);
  });

  it("asks for a section when no segment has one", () => {
    const r = fromExchange(demo);
    if (!r.ok) throw new Error(r.error.message);
    render(<EditorChecks doc={r.doc} analysis={analysisOf(r.doc)} />);
    expect(screen.getByText(/Choose a section and material for the beam first/)).toBeTruthy();
  });
});

describe("Generate from code… in the combinations table", () => {
  it("applies ASCE 7-22 LRFD 1.2D + 1.6L into the document as one undo step", async () => {
    const store = new EditorStore(demoDocument());
    render(withStore(store, <CombinationsTable />));
    fireEvent.click(screen.getByRole("button", { name: "Generate from code…" }));
    const dialog = await screen.findByRole("dialog"); // its own chunk (lazyDesign.ts)
    fireEvent.click(within(dialog).getByRole("button", { name: /Apply 2 combinations/ }));
    expect(screen.queryByRole("dialog")).toBeNull();
    const [D, L] = store.doc.loadCases;
    // ASCE/SEI 7-22 §2.3.1 combination 2 with D and L present: 1.2D + 1.6L.
    const lrfd2 = store.doc.combinations.find((k) => k.name === "LRFD2");
    expect(lrfd2?.factors).toEqual([{ caseId: D!.id, factor: 1.2 }, { caseId: L!.id, factor: 1.6 }]);
    expect(screen.getByLabelText("Combination LRFD2 factor on L")).toBeTruthy();
    store.undo();
    expect(store.doc.combinations).toEqual([]);
  });
});

describe("Section… in the segments table", () => {
  it("applies the default steel I-section to the segment, setting E and I from it", async () => {
    const r = fromExchange(demo);
    if (!r.ok) throw new Error(r.error.message);
    const store = new EditorStore(r.doc);
    render(withStore(store, <SegmentsTable />));
    fireEvent.click(screen.getByRole("button", { name: "Section of segment 1" }));
    fireEvent.click(within(await screen.findByRole("dialog")).getByRole("button", { name: "Apply to segment 1" }));
    const segment = store.doc.segments[0]!;
    expect(segment.section?.shape.kind).toBe("i-shape");
    expect(segment.E).toBe(steel.E);
    expect(segment.I).not.toBe(1e-4);
    store.undo();
    expect(store.doc.segments[0]!.I).toBe(1e-4);
  });
});

describe("the section view at a picked x", () => {
  it("shows the extreme fibre stresses M·c/I at midspan of the dead case", () => {
    const doc = demoDocument();
    render(<SectionAtCursor doc={doc} analysis={analysisOf(doc)} name="D" x={3} onX={() => {}} />);
    // M = wL²/8 = 10·36/8 = 45 kN·m (sagging); σ = M·(d/2)/I, doubly symmetric, bottom in tension.
    const I = doc.segments[0]!.I;
    const sigma = (45e3 * (wShape.d / 2)) / I;
    expect(Number(screen.getByTestId("stress-bottom").getAttribute("data-value"))).toBeCloseTo(sigma, -1);
  });
});
