import { solve } from "@spanwright/solver";
import { DEFLECTION_LIMIT_PRESETS, DESIGN_CAUTION, checkDeflection, steelBeamChecks } from "@spanwright/solver/design";
import { beforeAll, describe, expect, it } from "vitest";
import { diagramStations, renderCalculationReport, type CalculationReportInput } from "./pdfReport.js";
import { extractPdfText } from "./testing/pdfText.js";
import { SPAN, twoSpanModel } from "./testing/twoSpanBeam.js";

// Invented project and people, for tests only.
const model = twoSpanModel();
const base: CalculationReportInput = {
  project: "Harbour Lane Depot",
  beam: "B2 grid C",
  revision: 3,
  author: "Ines Okafor",
  date: new Date("2026-11-30T10:00:00Z"),
  units: "si",
  model,
  result: solve(model),
};
const squash = (text: string) => text.replace(/\s+/g, " ");

/** Checks of a plate I-section (invented, d = 300 mm) under the dead load case, braced at the supports only. */
function demoChecks() {
  const dense = solve({ ...model, stations: diagramStations(model) });
  const floorLive = DEFLECTION_LIMIT_PRESETS.find((p) => p.id === "floor-live")!;
  return steelBeamChecks({
    shape: { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 },
    Fy: 345e6,
    method: "LRFD",
    spans: [
      { label: "1", x1: 0, x2: SPAN, kind: "span" },
      { label: "2", x1: SPAN, x2: 2 * SPAN, kind: "span" },
    ],
    bracePoints: [],
    strength: [{ id: "D", stations: dense.results.D!.stations! }],
    deflection: [{ id: "D", stations: dense.results.D!.stations!, limit: { kind: "preset", preset: floorLive } }],
  });
}

describe("renderCalculationReport with member checks", () => {
  let all: string;
  let raw: string;
  beforeAll(async () => {
    const checks = demoChecks();
    const pages = await extractPdfText(await renderCalculationReport({ ...base, checks, checksBasis: "I 300 x 150 plates, steel Fy = 345 MPa" }));
    raw = pages.join("\n");
    all = pages.map(squash).join(" ");
  }, 30_000);

  it("keeps each check row on one line (long clauses are shortened in the table)", () => {
    const rows = raw.split("\n").filter((line) => /^[12] D /.test(line));
    // per span: F2 flexure, G2 shear and the deflection row
    expect(rows).toHaveLength(6);
    for (const row of rows) expect(row).toMatch(/ (pass|FAIL)$/);
  });

  it("prints a Member checks section with the section, the caution and the code editions", () => {
    expect(all).toContain("Member checks");
    expect(all).toContain("Section and material: I 300 x 150 plates, steel Fy = 345 MPa.");
    expect(all).toContain(squash(DESIGN_CAUTION));
    expect(all).toContain("Code editions used");
    for (const edition of ["AISC 360-22", "IBC 2021", "ASCE/SEI 7-22"]) expect(all).toContain(edition);
  });

  it("prints the flexure demand at the interior support in kN·m with clause, utilisation and result", () => {
    // Two equal spans under w = 3 kN/m: M_B = wL²/8 = 3·36/8 = 13.5 kN·m, the largest moment of
    // each span (AISC Manual Table 3-23 case 29, from memory), so each span's F2 row shows 13.50.
    expect(all).toMatch(/1 D [^]*?§F2[^]*?13\.50 kN·m [\d.]+ kN·m 0\.\d{3} pass/);
    expect(all).toMatch(/§G2/);
    expect(all).toContain("Deflection (D)");
  });

  it("spells Greek letters and signs out so no glyph is missing from the report font", () => {
    expect(all).not.toMatch(/[φΩδστλ≤√]/u);
    expect(all).toMatch(/phi/);
    expect(all).toContain("delta <= L/360");
  });

  it("marks a failing check FAIL", async () => {
    // 20 mm against an absolute limit of 10 mm: utilisation 2.0
    const fail = checkDeflection({ length: SPAN, spanKind: "span", deflection: -0.02, limit: { kind: "absolute", value: 0.01 } });
    const text = (await extractPdfText(await renderCalculationReport({ ...base, checks: [{ span: "1", caseId: "D", check: fail }] }))).map(squash).join(" ");
    expect(text).toMatch(/20\.00 mm 10\.00 mm 2\.000 FAIL/);
  }, 30_000);

  it("leaves the section out when there are no checks", async () => {
    const text = (await extractPdfText(await renderCalculationReport(base))).map(squash).join(" ");
    expect(text).not.toContain("Member checks");
  }, 30_000);

  it("says why when checks were asked for but cannot be printed, without a table or code editions", async () => {
    const why = "The project section I-300 demo chosen in the design settings has been deleted; no member checks are printed.";
    const text = (await extractPdfText(await renderCalculationReport({ ...base, checksOmitted: why }))).map(squash).join(" ");
    expect(text).toContain("Member checks");
    expect(text).toContain(why);
    expect(text).not.toContain("Code editions used");
  }, 30_000);
});
