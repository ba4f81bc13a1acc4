import { createRequire } from "node:module";
import type PDFDocument from "pdfkit";

/**
 * Page geometry, fonts and the table primitive shared by the calculation report's sections.
 * Units are PDF points (1/72 in). Fonts are IBM Plex Sans (SIL OFL 1.1) from the
 * @fontsource/ibm-plex-sans npm package, WOFF files that pdfkit embeds and subsets: no network.
 */

/** A pdfkit document. */
export type Doc = InstanceType<typeof PDFDocument>;

export const PAGE = { width: 595.28, height: 841.89, left: 50, right: 50, top: 50, bottom: 72 } as const;
export const CONTENT_WIDTH = PAGE.width - PAGE.left - PAGE.right;
export const CONTENT_BOTTOM = PAGE.height - PAGE.bottom;

export const FONT = { regular: "plex", bold: "plex-semibold" } as const;

const require = createRequire(import.meta.url);
export const FONT_FILES = {
  [FONT.regular]: require.resolve("@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff"),
  [FONT.bold]: require.resolve("@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-600-normal.woff"),
};

/**
 * The Latin subset of the font has no superscript four or six; write them as powers so the PDF
 * never shows a missing-glyph box.
 */
export function pdfSafe(text: string): string {
  return text.replace(/⁴/g, "^4").replace(/⁶/g, "^6").replace(/⁻/g, "^-");
}

export interface TableColumn {
  header: string;
  width: number;
  align?: "left" | "right";
}

export interface TableSpec {
  columns: TableColumn[];
  rows: string[][];
  /** Rows to shade, e.g. uplift rows of the reaction table. */
  highlight?: (rowIndex: number) => boolean;
}

const ROW_HEIGHT = 13;
const CELL_PAD = 3;

function drawHeader(doc: Doc, columns: TableColumn[], y: number): number {
  let x = PAGE.left;
  doc.font(FONT.bold).fontSize(7.5).fillColor("#000");
  for (const c of columns) {
    doc.text(pdfSafe(c.header), x + CELL_PAD, y + 2, { width: c.width - 2 * CELL_PAD, align: c.align ?? "left", lineBreak: false });
    x += c.width;
  }
  const width = columns.reduce((s, c) => s + c.width, 0);
  doc.moveTo(PAGE.left, y + ROW_HEIGHT).lineTo(PAGE.left + width, y + ROW_HEIGHT).lineWidth(0.6).strokeColor("#000").stroke();
  return y + ROW_HEIGHT + 1;
}

/** Draws a table at doc.y, breaking onto new pages with the header repeated. */
export function drawTable(doc: Doc, table: TableSpec): void {
  let y = doc.y;
  if (y + 2 * ROW_HEIGHT > CONTENT_BOTTOM) {
    doc.addPage();
    y = PAGE.top;
  }
  y = drawHeader(doc, table.columns, y);
  table.rows.forEach((row, i) => {
    if (y + ROW_HEIGHT > CONTENT_BOTTOM) {
      doc.addPage();
      y = drawHeader(doc, table.columns, PAGE.top);
    }
    const width = table.columns.reduce((s, c) => s + c.width, 0);
    if (table.highlight?.(i)) doc.rect(PAGE.left, y, width, ROW_HEIGHT).fillColor("#f2e3c6").fill();
    let x = PAGE.left;
    doc.font(FONT.regular).fontSize(7.5).fillColor("#000");
    table.columns.forEach((c, j) => {
      doc.text(pdfSafe(row[j] ?? ""), x + CELL_PAD, y + 2, { width: c.width - 2 * CELL_PAD, align: c.align ?? "left", lineBreak: false });
      x += c.width;
    });
    y += ROW_HEIGHT;
  });
  doc.x = PAGE.left;
  doc.y = y + 8;
}

/** Splits the content width into columns by relative weights. */
export function columnsByWeight(specs: Array<[string, number, ("left" | "right")?]>): TableColumn[] {
  const total = specs.reduce((s, [, w]) => s + w, 0);
  return specs.map(([header, w, align]) => ({ header, width: (CONTENT_WIDTH * w) / total, ...(align ? { align } : {}) }));
}

export function heading(doc: Doc, text: string, room = 60): void {
  if (doc.y + room > CONTENT_BOTTOM) doc.addPage();
  doc.x = PAGE.left;
  doc.moveDown(0.4).font(FONT.bold).fontSize(11).fillColor("#000").text(pdfSafe(text), PAGE.left, doc.y);
  doc.moveDown(0.3);
}

export function paragraph(doc: Doc, text: string, size = 8.5): void {
  doc.font(FONT.regular).fontSize(size).fillColor("#000").text(pdfSafe(text), PAGE.left, doc.y, { width: CONTENT_WIDTH });
  doc.moveDown(0.3);
}
