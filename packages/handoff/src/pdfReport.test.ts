import { solve } from "@spanwright/solver";
import { beforeAll, describe, expect, it } from "vitest";
import type { BeamModel } from "./exchange.js";
import { CAUTION, diagramStations, renderCalculationReport, type CalculationReportInput } from "./pdfReport.js";
import { extractPdfText } from "./testing/pdfText.js";
import { twoSpanModel } from "./testing/twoSpanBeam.js";

// Invented project and people, for tests only.
const model = twoSpanModel();
const input: CalculationReportInput = {
  project: "Harbour Lane Depot",
  beam: "B2 grid C",
  revision: 3,
  author: "Ines Okafor",
  checker: "Tomas Lind",
  date: new Date("2026-11-30T10:00:00Z"),
  units: "si",
  model,
  result: solve(model),
};

const squash = (text: string) => text.replace(/\s+/g, " ");

describe("renderCalculationReport", () => {
  let pdf: Buffer;
  let pages: string[];
  beforeAll(async () => {
    pdf = await renderCalculationReport(input);
    pages = (await extractPdfText(pdf)).map(squash);
  }, 30_000);

  it("writes a PDF with the tables first and one diagram page per combination and the envelope", () => {
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    // Tables fit on the first two pages; then C1, C2 and the all-combinations envelope.
    expect(pages.length).toBe(5);
    expect(pages.slice(-3).map((p) => p.match(/Diagrams: [^.]*?(?= Solid)/)?.[0])).toEqual([
      "Diagrams: Combination C1 (envelope over pattern loading)",
      "Diagrams: Combination C2 (envelope over pattern loading)",
      "Diagrams: Envelope of all combinations",
    ]);
  });

  it("puts the title block on the first page", () => {
    for (const text of ["Beam calculation report", "Harbour Lane Depot", "B2 grid C", "Ines Okafor", "Tomas Lind", "2026-11-30"]) {
      expect(pages[0]).toContain(text);
    }
  });

  it("carries the caution and the page number on every page", () => {
    pages.forEach((page, i) => {
      expect(page).toContain(CAUTION);
      expect(page).toContain(`Page ${i + 1} of ${pages.length}`);
    });
  });

  it("contains every section of the report", () => {
    const all = pages.join(" ");
    for (const text of ["Model", "Load cases", "Load combinations", "Support reactions", "Extremes of shear and bending moment", "Deflections", "Shear V", "Bending moment M", "Deflection uy"]) {
      expect(all).toContain(text);
    }
  });

  it("prints the reactions in kN", () => {
    const all = pages.join(" ");
    // Two equal spans, UDL 3 kN/m: R = 0.375 wL = 6.75 kN, 1.25 wL = 22.5 kN
    // (AISC Manual Table 3-23 case 29, from memory).
    expect(all).toMatch(/S1 0\.000 D \(dead\) 6\.75 0\.00/);
    expect(all).toMatch(/S2 6\.000 D \(dead\) 22\.50 0\.00/);
    // Wind 4 kN/m upward: S1 pulls the beam down by 0.375 × 4 × 6 = 9 kN, flagged.
    expect(all).toMatch(/S1 0\.000 W \(wind\) -9\.00 0\.00 uplift/);
  });

  it("gives the same bytes for the same input", async () => {
    const again = await renderCalculationReport(input);
    expect(again.equals(pdf)).toBe(true);
  }, 30_000);
});

describe("renderCalculationReport in US customary units", () => {
  it("labels columns in kip, kip·ft and ft", async () => {
    const pages = (await extractPdfText(await renderCalculationReport({ ...input, units: "us", checker: null }))).map(squash);
    const all = pages.join(" ");
    expect(all).toContain("Fy [kip]");
    expect(all).toContain("Mz [kip·ft]");
    expect(all).toContain("x [ft]");
    expect(all).toContain("not checked");
    // 22.5 kN / 4.4482216152605 kN per kip = 5.06 kip (NIST SP 811 B.8).
    expect(all).toMatch(/S2 19\.685 D \(dead\) 5\.06/);
  }, 30_000);
});

describe("renderCalculationReport for a beam without combinations", () => {
  it("draws every support and load type and gives one diagram page per load case", async () => {
    // Invented demo beam: fixed end, hinge, spring, overhang, every load type.
    const varied: BeamModel = {
      format: "spanwright.beam/1",
      title: "Canopy edge beam",
      nodes: [
        { x: 0, support: { type: "fixed" } },
        { x: 4, support: { type: "pinned" } },
        { x: 6.5, hinge: true },
        { x: 9, support: { type: "spring", ky: 5e7 } },
        { x: 11 },
      ],
      segments: Array.from({ length: 4 }, () => ({ E: 2.0e11, I: 8.0e-5 })),
      loadCases: [
        { id: "D", category: "dead", loads: [
          { type: "distributed", x1: 0, x2: 11, qy1: -2000, qy2: -2000 },
          { type: "point", x: 10.5, fy: -5000 },
          { type: "moment", x: 2, mz: 3000 },
        ] },
        { id: "Q", category: "live", pattern: true, loads: [{ type: "distributed", x1: 1, x2: 8, qy1: -1000, qy2: -4000 }] },
        { id: "S1", category: "settlement", loads: [{ type: "settlement", node: 1, uy: -0.005 }] },
      ],
      combinations: [],
    };
    const pages = (await extractPdfText(await renderCalculationReport({ ...input, model: varied, result: solve(varied) }))).map(squash);
    const all = pages.join(" ");
    for (const text of ["fixed", "spring ky 50000 kN/m", "yes", "settlement", "-1 kN/m to -4 kN/m", "3 kN·m"]) expect(all).toContain(text);
    expect(pages.filter((p) => p.includes("Diagrams: Load case"))).toHaveLength(3);
    pages.forEach((page) => expect(page).toContain(CAUTION));
  }, 30_000);
});

describe("diagramStations", () => {
  it("samples evenly and adds a station just left of every jump", () => {
    const m = twoSpanModel();
    m.loadCases[0]!.loads.push({ type: "point", x: 3, fy: -1000 });
    const xs = diagramStations(m, 12);
    expect(xs[0]).toBe(0);
    expect(xs[xs.length - 1]).toBe(12);
    expect(xs).toContain(3);
    expect(xs.some((x) => x < 3 && x > 3 - 1e-5)).toBe(true);
    expect([...xs].sort((a, b) => a - b)).toEqual(xs);
  });
});
