import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

/** Text of each page of a PDF, via pdfjs-dist (Mozilla's PDF reader), for tests. */
export async function extractPdfText(pdf: Buffer): Promise<string[]> {
  const task = getDocument({ data: new Uint8Array(pdf), disableFontFace: true, useSystemFonts: false, isEvalSupported: false });
  const doc = await task.promise;
  try {
    const pages: string[] = [];
    for (let i = 1; i <= doc.numPages; i++) {
      const page = await doc.getPage(i);
      const content = await page.getTextContent();
      pages.push(content.items.map((item) => ("str" in item ? item.str + (item.hasEOL ? "\n" : "") : "")).join(""));
    }
    return pages;
  } finally {
    await doc.destroy();
  }
}
