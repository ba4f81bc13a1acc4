import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { extractPdfText } from "@spanwright/handoff/testing/pdfText";
import { teamProject } from "../handoffs/teamFixture.js";
import { createTestApp, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** RFC 4180 records: enough for the exports (quoted fields may hold commas and doubled quotes). */
function parseCsv(text: string): Array<Record<string, string>> {
  const records: string[][] = [];
  let field = "";
  let record: string[] = [];
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') (field += '"'), i++;
      else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ",") record.push(field), (field = "");
    else if (c === "\n") record.push(field), records.push(record), (record = []), (field = "");
    else if (c !== "\r") field += c;
  }
  if (field || record.length) record.push(field), records.push(record);
  const [header, ...rows] = records;
  return rows.map((r) => Object.fromEntries(header!.map((h, i) => [h, r[i] ?? ""])));
}

const binary = (res: { on(e: string, f: (c?: Buffer) => void): void }, done: (e: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on("data", (c) => chunks.push(c!));
  res.on("end", () => done(null, Buffer.concat(chunks)));
};

describe("reaction table CSV", () => {
  it("SI variant parses back to exactly the stored solver reactions", async () => {
    const { viewer, revisions } = await teamProject(t);
    const res = await viewer.client.get(`${revisions}/1/reactions.csv?units=si`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^text\/csv/);
    expect(res.headers["content-disposition"]).toMatch(/^attachment; filename="?roof-beam-b2-rev-1-reactions-si\.csv"?$/);
    const records = parseCsv(res.text);
    const result = (await viewer.client.get(`${revisions}/1`)).body.revision.result;
    for (const id of ["D", "L", "C1"]) {
      for (const r of result.results[id].reactions as Array<{ node: number; fy: number; mz: number }>) {
        const rec = records.find((x) => x.id === id && Number(x.node) === r.node && x.row_kind !== "envelope");
        // shortest round-trip numbers: parsing gives the solver's doubles exactly
        expect([Number(rec?.fy_N), Number(rec?.mz_Nm)]).toEqual([r.fy, r.mz]);
      }
    }
    for (const r of result.envelopes["*"].reactions as Array<{ node: number; fyMax: number; fyMin: number }>) {
      const rec = records.find((x) => x.row_kind === "envelope" && x.id === "*" && Number(x.node) === r.node);
      expect([Number(rec?.fy_max_N), Number(rec?.fy_min_N)]).toEqual([r.fyMax, r.fyMin]);
    }
  });

  it("project variant carries the project's units in the header and values in them", async () => {
    const { viewer, revisions } = await teamProject(t, { unitSystem: "us" });
    const res = await viewer.client.get(`${revisions}/1/reactions.csv`);
    expect(res.headers["content-disposition"]).toContain("roof-beam-b2-rev-1-reactions.csv");
    const records = parseCsv(res.text);
    expect(Object.keys(records[0]!)).toContain("Fy [kip]");
    expect(Object.keys(records[0]!)).toContain("x [ft]");
    const result = (await viewer.client.get(`${revisions}/1`)).body.revision.result;
    const s2 = records.find((x) => x.Support === "S2" && x["Case or combination"]?.startsWith("D"));
    // 1 kip = 4448.2216152605 N (NIST SP 811 appendix B); the export rounds to 3 decimals
    expect(Number(s2?.["Fy [kip]"])).toBeCloseTo(result.results.D.reactions[1].fy / 4448.2216152605, 3);
  });

  it("refuses an unknown units value", async () => {
    const { viewer, revisions } = await teamProject(t);
    const res = await viewer.client.get(`${revisions}/1/reactions.csv?units=imperial`);
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues[0].path).toBe("units");
  });
});

describe("calculation report PDF", () => {
  it("has the title block, the reaction table, the caution and numbered pages", async () => {
    const { engineer, checker, revisions } = await teamProject(t);
    await checker.client.post(`${revisions}/1/check`, { comment: "ok" });
    const res = await engineer.client.get(`${revisions}/1/report.pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    expect(res.headers["content-disposition"]).toContain("roof-beam-b2-rev-1-report.pdf");
    const body = res.body as Buffer;
    expect(body.subarray(0, 5).toString()).toBe("%PDF-");
    const pages = await extractPdfText(body);
    expect(pages.length).toBeGreaterThanOrEqual(2);
    const all = pages.join("\n");
    for (const text of ["Beam calculation report", "Harbour Workshop", "Roof beam B2", "Tobias Engineer", "Ines Checker", "Support reactions", "Deflections"]) {
      expect(all).toContain(text);
    }
    // the caution and "Page i of n" on every page
    pages.forEach((page, i) => {
      expect(page).toContain("do not replace, the judgement of a licensed engineer");
      expect(page).toContain(`Page ${i + 1} of ${pages.length}`);
    });
  });

  it("answers 404 for a revision that does not exist", async () => {
    const { viewer, revisions } = await teamProject(t);
    expect((await viewer.client.get(`${revisions}/5/report.pdf`)).status).toBe(404);
  });
});
