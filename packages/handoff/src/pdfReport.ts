import PDFDocument from "pdfkit";
import { solve } from "@spanwright/solver";
import { CODE_EDITIONS, DESIGN_CAUTION } from "@spanwright/solver/design";
import type { BeamModel, SolveResult } from "./exchange.js";
import { drawBeam, drawDiagram, type DiagramCurve } from "./pdfDrawings.js";
import { CONTENT_WIDTH, FONT, FONT_FILES, PAGE, columnsByWeight, drawTable, heading, paragraph, pdfSafe, type Doc } from "./pdfLayout.js";
import {
  drawDeflections,
  drawExtremes,
  drawLoadTables,
  drawMemberChecks,
  drawModelTables,
  drawReactionTable,
  type ReportCheckRow,
  type ReportCodeEdition,
} from "./pdfSections.js";
import { buildReactionTable } from "./reactionTable.js";
import { formatShort, type UnitSystem } from "./units.js";

export const CAUTION =
  "These results support, and do not replace, the judgement of a licensed engineer and the governing local building code.";

export interface CalculationReportInput {
  project: string;
  beam: string;
  revision: number | string;
  author: string;
  checker?: string | null;
  /** Date of the revision; also the PDF's creation date, so the same input gives the same bytes. */
  date: Date;
  units: UnitSystem;
  model: BeamModel;
  result: SolveResult;
  /**
   * The model solved again with dense `stations` (see `diagramStations`) for the diagrams. When
   * absent the report solves it itself with @spanwright/solver.
   */
  sampled?: SolveResult;
  /**
   * Member checks (rows as `steelBeamChecks` or the deflection and stress checks of
   * @spanwright/solver/design give them). Without them the report has no "Member checks" section.
   */
  checks?: readonly ReportCheckRow[];
  /** Which section and material the checks are for. */
  checksBasis?: string;
  /**
   * Why member checks that were asked for are missing (e.g. their section was deleted): printed
   * under a "Member checks" heading when there are no check rows, so the report never drops them
   * silently.
   */
  checksOmitted?: string;
  /** Code editions the checks cite; defaults to the design package's `CODE_EDITIONS`. */
  codeEditions?: readonly ReportCodeEdition[];
}

/**
 * Stations for diagrams: `count` evenly spaced points plus every node and load position, each also
 * a hair to its left, so jumps at supports and point loads draw as vertical steps.
 */
export function diagramStations(model: BeamModel, count = 240): number[] {
  const x0 = model.nodes[0]?.x ?? 0;
  const x1 = model.nodes[model.nodes.length - 1]?.x ?? x0;
  const eps = 1e-7 * (x1 - x0 || 1);
  const marks = new Set<number>(Array.from({ length: count + 1 }, (_, i) => x0 + ((x1 - x0) * i) / count));
  const jumps = [...model.nodes.map((n) => n.x)];
  for (const lc of model.loadCases) {
    for (const l of lc.loads) {
      if (l.type === "point" || l.type === "moment") jumps.push(l.x);
      if (l.type === "distributed") jumps.push(l.x1, l.x2);
    }
  }
  for (const x of jumps) {
    marks.add(x);
    if (x - eps > x0) marks.add(x - eps);
  }
  return [...marks].filter((x) => x >= x0 && x <= x1).sort((a, b) => a - b);
}

function drawTitleBlock(doc: Doc, input: CalculationReportInput): void {
  doc.font(FONT.bold).fontSize(16).fillColor("#000").text("Beam calculation report", PAGE.left, PAGE.top);
  doc.font(FONT.regular).fontSize(9).text(pdfSafe(input.model.title ?? ""), { width: CONTENT_WIDTH });
  doc.moveDown(0.5);
  drawTable(doc, {
    columns: columnsByWeight([["Project", 3], ["Beam", 2.5], ["Revision", 1], ["Author", 2], ["Checker", 2], ["Date", 1.6]]),
    rows: [[input.project, input.beam, String(input.revision), input.author, input.checker ?? "not checked", input.date.toISOString().slice(0, 10)]],
  });
  const theory = input.model.theory === "timoshenko" ? "Timoshenko (shear deformation included)" : "Euler-Bernoulli";
  paragraph(doc, `Units: ${input.units === "si" ? "SI (kN, kN·m, m)" : "US customary (kip, kip·ft, ft)"}. Beam theory: ${theory}. Solved exactly by the matrix stiffness method.`);
}

interface DiagramSet {
  title: string;
  xs: number[];
  V: DiagramCurve[];
  M: DiagramCurve[];
  uy: DiagramCurve[];
}

function diagramSets(model: BeamModel, sampled: SolveResult): DiagramSet[] {
  const sets: DiagramSet[] = [];
  const envelopeIds = model.combinations.length > 0 ? [...model.combinations.map((c) => c.id), "*"] : [];
  for (const id of envelopeIds) {
    const st = sampled.envelopes[id]?.stations;
    if (!st || st.length === 0) continue;
    const title = id === "*" ? "Envelope of all combinations" : `Combination ${id} (envelope over pattern loading)`;
    const pair = (a: number[], b: number[]): DiagramCurve[] => [{ values: a }, { values: b, dashed: true }];
    sets.push({
      title,
      xs: st.map((s) => s.x),
      V: pair(st.map((s) => s.Vmax), st.map((s) => s.Vmin)),
      M: pair(st.map((s) => s.Mmax), st.map((s) => s.Mmin)),
      uy: pair(st.map((s) => s.uyMax), st.map((s) => s.uyMin)),
    });
  }
  if (sets.length > 0) return sets;
  for (const lc of model.loadCases) {
    const st = sampled.results[lc.id]?.stations;
    if (!st || st.length === 0) continue;
    sets.push({ title: `Load case ${lc.id}`, xs: st.map((s) => s.x), V: [{ values: st.map((s) => s.V) }], M: [{ values: st.map((s) => s.M) }], uy: [{ values: st.map((s) => s.uy) }] });
  }
  return sets;
}

function drawDiagramPages(doc: Doc, input: CalculationReportInput, sampled: SolveResult): void {
  const u = input.units;
  for (const set of diagramSets(input.model, sampled)) {
    doc.addPage();
    heading(doc, `Diagrams: ${set.title}`);
    paragraph(doc, "Solid line: maximum; dashed: minimum. Shear and deflection positive upward, bending moment positive sagging, drawn upward.");
    drawBeam(doc, input.model, u);
    drawDiagram(doc, { title: "Shear V", xs: set.xs, curves: set.V, label: (v) => formatShort(u, "force", v, 4) });
    drawDiagram(doc, { title: "Bending moment M", xs: set.xs, curves: set.M, label: (v) => formatShort(u, "moment", v, 4) });
    drawDiagram(doc, { title: "Deflection uy", xs: set.xs, curves: set.uy, label: (v) => formatShort(u, "deflection", v, 4) });
  }
}

function drawFooters(doc: Doc, input: CalculationReportInput): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // Writing below the bottom margin would make pdfkit start a new page.
    const margin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const y = PAGE.height - PAGE.bottom + 16;
    doc.moveTo(PAGE.left, y - 4).lineTo(PAGE.width - PAGE.right, y - 4).lineWidth(0.4).strokeColor("#888").stroke();
    doc.font(FONT.regular).fontSize(7).fillColor("#000");
    doc.text(CAUTION, PAGE.left, y, { width: CONTENT_WIDTH, lineBreak: false });
    const tag = pdfSafe(`${input.project} / ${input.beam} / revision ${input.revision}`);
    doc.text(tag, PAGE.left, y + 11, { width: CONTENT_WIDTH / 2, lineBreak: false });
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, PAGE.left + CONTENT_WIDTH / 2, y + 11, { width: CONTENT_WIDTH / 2, align: "right", lineBreak: false });
    doc.page.margins.bottom = margin;
  }
}

/** The calculation report as PDF bytes: same input, same bytes. */
export async function renderCalculationReport(input: CalculationReportInput): Promise<Buffer> {
  const sampled = input.sampled ?? solve({ ...input.model, stations: diagramStations(input.model) });
  const doc: Doc = new PDFDocument({
    size: "A4",
    margins: { top: PAGE.top, bottom: PAGE.bottom, left: PAGE.left, right: PAGE.right },
    bufferPages: true,
    info: {
      Title: pdfSafe(`${input.project}: ${input.beam}, revision ${input.revision}`),
      Author: input.author,
      Subject: "Beam calculation report",
      Creator: "Spanwright",
      CreationDate: input.date,
      ModDate: input.date,
    },
  });
  for (const [name, file] of Object.entries(FONT_FILES)) doc.registerFont(name, file);
  const chunks: Buffer[] = [];
  doc.on("data", (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  const u = input.units;
  drawTitleBlock(doc, input);
  heading(doc, "Model");
  drawBeam(doc, input.model, u);
  drawModelTables(doc, input.model, u);
  drawLoadTables(doc, input.model, u);
  drawReactionTable(doc, buildReactionTable(input.model, input.result), u);
  drawExtremes(doc, input.model, input.result, u);
  drawDeflections(doc, input.model, input.result, u);
  if (input.checks && input.checks.length > 0) {
    drawMemberChecks(doc, { rows: input.checks, codeEditions: input.codeEditions ?? CODE_EDITIONS, caution: DESIGN_CAUTION, ...(input.checksBasis ? { basis: input.checksBasis } : {}) }, u);
  } else if (input.checksOmitted) {
    heading(doc, "Member checks");
    paragraph(doc, input.checksOmitted);
  }
  drawDiagramPages(doc, input, sampled);
  drawFooters(doc, input);
  doc.end();
  return finished;
}
