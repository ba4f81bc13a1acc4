import type { BeamLoad, BeamModel, SupportSpec } from "./exchange.js";
import { CONTENT_WIDTH, FONT, PAGE, pdfSafe, type Doc } from "./pdfLayout.js";
import { formatShort, type Quantity, type UnitSystem } from "./units.js";

// Four significant digits keep drawing labels short enough to sit beside their symbols.
const formatShort4 = (u: UnitSystem, q: Quantity, si: number) => formatShort(u, q, si, 4);

/**
 * Vector drawings for the calculation report: the beam to scale with simple support, hinge and
 * load symbols, and diagrams as polylines. y on the page grows downward, so upward quantities are
 * drawn by subtracting from the baseline.
 */

const INK = "#1a1a1a";
const LOAD_INK = "#8a3b12";

function drawSupport(doc: Doc, support: SupportSpec, x: number, y: number): void {
  doc.lineWidth(0.8).strokeColor(INK);
  switch (support.type) {
    case "pinned":
      doc.polygon([x, y], [x - 6, y + 10], [x + 6, y + 10]).stroke();
      doc.moveTo(x - 9, y + 12).lineTo(x + 9, y + 12).stroke();
      return;
    case "fixed":
      doc.moveTo(x, y - 10).lineTo(x, y + 10).lineWidth(1.6).stroke();
      for (let k = -10; k < 10; k += 4) doc.moveTo(x, y + k).lineTo(x - 4, y + k + 4).lineWidth(0.5).stroke();
      return;
    case "guided":
      doc.rect(x - 6, y + 1, 12, 6).stroke();
      doc.moveTo(x - 9, y + 9).lineTo(x + 9, y + 9).stroke();
      doc.moveTo(x - 9, y - 9).lineTo(x + 9, y - 9).dash(1.5, { space: 1.5 }).stroke().undash();
      return;
    case "spring": {
      const points: Array<[number, number]> = [[x, y]];
      for (let k = 1; k <= 6; k++) points.push([x + (k % 2 === 0 ? -4 : 4), y + 2 * k]);
      points.push([x, y + 14]);
      doc.moveTo(points[0]![0], points[0]![1]);
      for (const [px, py] of points.slice(1)) doc.lineTo(px, py);
      doc.stroke();
      doc.moveTo(x - 8, y + 15).lineTo(x + 8, y + 15).stroke();
      return;
    }
    default: {
      const never: never = support;
      return never;
    }
  }
}

function arrow(doc: Doc, x: number, yTail: number, yHead: number): void {
  doc.moveTo(x, yTail).lineTo(x, yHead).stroke();
  const dir = yHead > yTail ? -1 : 1;
  doc.polygon([x, yHead], [x - 2.5, yHead + 5 * dir], [x + 2.5, yHead + 5 * dir]).fill();
}

function loadLabel(caseId: string, load: BeamLoad, u: UnitSystem): string {
  switch (load.type) {
    case "point":
      return `${caseId} ${formatShort4(u, "force", load.fy)}`;
    case "moment":
      return `${caseId} ${formatShort4(u, "moment", load.mz)}`;
    case "distributed":
      return load.qy1 === load.qy2
        ? `${caseId} ${formatShort4(u, "distributed", load.qy1)}`
        : `${caseId} ${formatShort4(u, "distributed", load.qy1)} to ${formatShort4(u, "distributed", load.qy2)}`;
    case "settlement":
      return `${caseId} settlement ${formatShort4(u, "deflection", load.uy)}`;
    default: {
      const never: never = load;
      return never;
    }
  }
}

/** Draws the beam to scale at doc.y; returns after it, with doc.y below the drawing. */
export function drawBeam(doc: Doc, model: BeamModel, u: UnitSystem): void {
  const x0 = model.nodes[0]?.x ?? 0;
  const length = (model.nodes[model.nodes.length - 1]?.x ?? x0) - x0 || 1;
  const left = PAGE.left + 20;
  const width = CONTENT_WIDTH - 40;
  const px = (x: number) => left + ((x - x0) / length) * width;
  const loads = model.loadCases.flatMap((lc) => lc.loads.map((load) => ({ caseId: lc.id, load })));
  const distributed = loads.filter((l) => l.load.type === "distributed");
  const top = doc.y + 10;
  // One band per distributed load, stacked above the beam, then a band for point loads.
  const bandHeight = 16;
  // 26 pt under the bands is the point-load zone.
  const beamY = top + distributed.length * bandHeight + 26 + 14;

  doc.font(FONT.regular).fontSize(6.5).lineWidth(0.6).strokeColor(LOAD_INK).fillColor(LOAD_INK);
  distributed.forEach(({ caseId, load }, i) => {
    if (load.type !== "distributed") return;
    const yBase = beamY - 26 - (i + 1) * bandHeight;
    const a = px(load.x1);
    const b = px(load.x2);
    doc.moveTo(a, yBase).lineTo(b, yBase).stroke();
    const up = load.qy1 + load.qy2 > 0;
    for (let k = 0; k <= 8; k++) {
      const x = a + ((b - a) * k) / 8;
      if (up) arrow(doc, x, yBase + bandHeight - 6, yBase);
      else arrow(doc, x, yBase, yBase + bandHeight - 6);
    }
    doc.text(pdfSafe(loadLabel(caseId, load, u)), a + 4, yBase + 1, { lineBreak: false });
  });
  for (const { caseId, load } of loads) {
    if (load.type === "point") {
      const x = px(load.x);
      const up = load.fy > 0;
      arrow(doc, x, up ? beamY + 22 : beamY - 22, up ? beamY + 2 : beamY - 2);
      doc.text(pdfSafe(loadLabel(caseId, load, u)), x + 3, up ? beamY + 18 : beamY - 24, { lineBreak: false });
    } else if (load.type === "moment") {
      const x = px(load.x);
      doc.circle(x, beamY, 7).stroke();
      doc.text(pdfSafe(loadLabel(caseId, load, u)), x + 9, beamY - 16, { lineBreak: false });
    }
  }

  doc.lineWidth(2).strokeColor(INK).moveTo(px(x0), beamY).lineTo(px(x0 + length), beamY).stroke();
  doc.fillColor(INK).fontSize(6.5);
  model.nodes.forEach((node, i) => {
    const x = px(node.x);
    if (node.support) drawSupport(doc, node.support, x, beamY + 1);
    if (node.hinge) doc.circle(x, beamY, 2.8).lineWidth(0.8).fillAndStroke("#fff", INK);
    doc.fillColor(INK).text(String(i), x - 3, beamY - 12, { lineBreak: false });
  });
  for (const { caseId, load } of loads) {
    if (load.type !== "settlement") continue;
    const node = model.nodes[load.node];
    if (node) doc.fillColor(LOAD_INK).text(pdfSafe(loadLabel(caseId, load, u)), px(node.x) - 10, beamY + 30, { lineBreak: false });
  }

  // Dimension line: node positions.
  const dimY = beamY + 42;
  doc.lineWidth(0.4).strokeColor(INK).fillColor(INK).moveTo(px(x0), dimY).lineTo(px(x0 + length), dimY).stroke();
  model.nodes.forEach((node, i) => {
    const x = px(node.x);
    doc.moveTo(x, dimY - 3).lineTo(x, dimY + 3).stroke();
    const next = model.nodes[i + 1];
    if (next) {
      const label = formatShort4(u, "length", next.x - node.x);
      doc.text(pdfSafe(label), (x + px(next.x)) / 2 - 30, dimY + 3, { width: 60, align: "center", lineBreak: false });
    }
  });
  doc.x = PAGE.left;
  doc.y = dimY + 18;
}

export interface DiagramCurve {
  values: number[];
  dashed?: boolean;
}

export interface DiagramSpec {
  title: string;
  xs: number[];
  curves: DiagramCurve[];
  /** Converts an SI value to display units for the labels. */
  label: (si: number) => string;
  height?: number;
}

/** A diagram: zero axis, polylines, the largest and smallest value labelled. Placed at doc.y. */
export function drawDiagram(doc: Doc, spec: DiagramSpec): void {
  const height = spec.height ?? 110;
  const top = doc.y;
  const left = PAGE.left + 20;
  const width = CONTENT_WIDTH - 40;
  const xMin = spec.xs[0] ?? 0;
  const xMax = spec.xs[spec.xs.length - 1] ?? 1;
  const all = spec.curves.flatMap((c) => c.values);
  const peak = Math.max(1e-30, ...all.map(Math.abs));
  const mid = top + 14 + (height - 14) / 2;
  const half = (height - 14) / 2 - 6;
  const px = (x: number) => left + ((x - xMin) / (xMax - xMin || 1)) * width;
  const py = (v: number) => mid - (v / peak) * half;

  doc.font(FONT.bold).fontSize(8.5).fillColor(INK).text(pdfSafe(spec.title), PAGE.left, top, { lineBreak: false });
  doc.lineWidth(0.5).strokeColor("#888").moveTo(px(xMin), mid).lineTo(px(xMax), mid).stroke();
  for (const curve of spec.curves) {
    doc.lineWidth(0.9).strokeColor(INK);
    if (curve.dashed) doc.dash(3, { space: 2 });
    doc.moveTo(px(xMin), mid);
    spec.xs.forEach((x, i) => doc.lineTo(px(x), py(curve.values[i] ?? 0)));
    doc.lineTo(px(xMax), mid).stroke();
    if (curve.dashed) doc.undash();
  }
  const findExtreme = (pick: (a: number, b: number) => boolean) => {
    let best = { v: 0, x: xMin };
    for (const curve of spec.curves) curve.values.forEach((v, i) => (pick(v, best.v) ? (best = { v, x: spec.xs[i] ?? 0 }) : undefined));
    return best;
  };
  doc.font(FONT.regular).fontSize(6.5).fillColor(INK);
  for (const e of [findExtreme((a, b) => a > b), findExtreme((a, b) => a < b)]) {
    if (e.v === 0) continue;
    doc.text(pdfSafe(spec.label(e.v)), Math.min(px(e.x) + 2, left + width - 60), py(e.v) + (e.v > 0 ? -9 : 2), { lineBreak: false });
  }
  doc.x = PAGE.left;
  doc.y = top + height + 6;
}
