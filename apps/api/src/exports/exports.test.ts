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

describe("calculation report PDF with member checks", () => {
  const iShape = { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 };
  const steel = { id: "s", name: "Steel (demo)", kind: "steel", E: 200e9, Fy: 345e6, typical: true, note: "typical values, confirm for your project", source: "demo" };

  it("prints the checks of the project section named by ?sectionId, with the code editions", async () => {
    const { engineer, viewer, projectPath, revisions } = await teamProject(t);
    const { section } = (await engineer.client.post(`${projectPath}/sections`, { name: "I-300 demo", shape: iShape, material: steel })).body;
    const res = await viewer.client.get(`${revisions}/1/report.pdf?sectionId=${section.id}`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    const all = (await extractPdfText(res.body as Buffer)).join("\n").replace(/[ \t]+/g, " ");
    expect(all).toContain("Member checks");
    expect(all).toContain("I-300 demo (i-shape, depth 300 mm), Steel (demo)");
    expect(all).toContain("AISC 360-22 LRFD");
    expect(all).toContain("Code editions used");
    // C1 = 1.2·10 + 1.6·5 = 20 kN/m over two 5 m spans: M_B = wL²/8 = 62.5 kN·m in each span's F2
    // row (continuous-beam coefficients, AISC Manual Table 3-23 case 29, from memory)
    expect(all.match(/^[12] C1 .*62\.50 kN·m .* pass$/gm)).toHaveLength(2);
  });

  it("has no checks without a section, and answers 404 for another project's section", async () => {
    const a = await teamProject(t);
    const b = await teamProject(t);
    const { section } = (await b.engineer.client.post(`${b.projectPath}/sections`, { name: "Elsewhere", shape: iShape, material: steel })).body;
    const plain = await a.viewer.client.get(`${a.revisions}/1/report.pdf`).buffer(true).parse(binary);
    expect((await extractPdfText(plain.body as Buffer)).join(" ")).not.toContain("Member checks");
    const foreign = await a.viewer.client.get(`${a.revisions}/1/report.pdf?sectionId=${section.id}`);
    expect(foreign.status).toBe(404);
    expect((await a.viewer.client.get(`${a.revisions}/1/report.pdf?sectionId=nope`)).status).toBe(400);
  });

  it("braces every ?lb metres: the basis line names Lb and the F2 capacity reaches φMp", async () => {
    const { engineer, viewer, projectPath, revisions } = await teamProject(t);
    const { section } = (await engineer.client.post(`${projectPath}/sections`, { name: "I-300 demo", shape: iShape, material: steel })).body;
    const text = async (query: string) => {
      const res = await viewer.client.get(`${revisions}/1/report.pdf?sectionId=${section.id}${query}`).buffer(true).parse(binary);
      expect(res.status).toBe(200);
      return (await extractPdfText(res.body as Buffer)).join("\n").replace(/[ \t]+/g, " ");
    };
    const [braced, unbraced] = [await text("&lb=1"), await text("")];
    expect(braced.replace(/\s+/g, " ")).toContain("every Lb = 1 m");
    expect(unbraced.replace(/\s+/g, " ")).toContain("braced at the supports only");
    // Lb = 1 m < Lp = 1.47 m: φMn = 0.9·Fy·Zx = 0.9·345 MPa·5.526e-4 m³ = 171.6 kN·m (AISC 360-22
    // F2-1, F2-5; hand check in memberChecks.test.ts); braced at the supports only (Lb = 5 m > Lp)
    // lateral-torsional buckling leaves it a little lower even with Cb from the moment diagram
    // one F2 row per unbraced segment: braces at 1, 2, 3, 4 m in each 5 m span give 5 per span
    expect(braced.match(/^[12] C1 Flexure.*171\.58 kN·m.* pass$/gm)).toHaveLength(10);
    expect(unbraced).not.toContain("171.58 kN·m");
  });

  it("prints the beam's saved design settings by default, each query parameter replacing its part", async () => {
    const { engineer, viewer, revisions, beamPath } = await teamProject(t);
    const designSettings = {
      section: { source: "typed", name: "I-300 saved", shape: iShape },
      material: steel,
      method: "ASD",
      lb: 1,
      cb: "unity",
      strengthIds: null,
      deflection: [{ limit: { kind: "ratio", ratio: 300 }, ids: ["L"] }],
      allowableBending: null,
      allowableShear: null,
    };
    expect((await engineer.client.patch(`${beamPath}/design-settings`, { designSettings })).status).toBe(200);
    const text = async (query: string) => {
      const res = await viewer.client.get(`${revisions}/1/report.pdf${query}`).buffer(true).parse(binary);
      expect(res.status).toBe(200);
      return (await extractPdfText(res.body as Buffer)).join("\n").replace(/\s+/g, " ");
    };
    const saved = await text("");
    expect(saved).toContain("I-300 saved (i-shape, depth 300 mm), Steel (demo)");
    expect(saved).toContain("AISC 360-22 ASD, Cb taken as 1.0");
    expect(saved).toContain("every Lb = 1 m");
    // the saved limit, not the fixed L/360 and L/240 of the IBC floor presets
    expect(saved).toContain("deflection L/300 for L");
    expect(saved).not.toContain("L/240");
    expect(saved).toContain("Code editions used");
    expect(saved).toContain("licensed engineer");
    const overridden = await text("?method=LRFD&lb=2.5");
    expect(overridden).toContain("AISC 360-22 LRFD, Cb taken as 1.0");
    expect(overridden).toContain("every Lb = 2.5 m");
  });

  it("says which saved project section was deleted instead of printing no checks silently", async () => {
    const { engineer, viewer, projectPath, revisions, beamPath } = await teamProject(t);
    const { section } = (await engineer.client.post(`${projectPath}/sections`, { name: "I-300 withdrawn", shape: iShape, material: steel })).body;
    const designSettings = { section: { source: "project", sectionId: section.id }, material: null, method: "LRFD", lb: null, cb: "equation-f1-1", strengthIds: null, deflection: null, allowableBending: null, allowableShear: null };
    expect((await engineer.client.patch(`${beamPath}/design-settings`, { designSettings })).status).toBe(200);
    expect((await engineer.client.delete(`${projectPath}/sections/${section.id}`)).status).toBe(204);
    const res = await viewer.client.get(`${revisions}/1/report.pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    const all = (await extractPdfText(res.body as Buffer)).join("\n").replace(/\s+/g, " ");
    expect(all).toContain("Member checks");
    expect(all).toContain('The project section "I-300 withdrawn" chosen in this beam\'s design settings has been deleted from the project, so no member checks are printed');
    expect(all).not.toContain("Code editions used");
  });

  it("refuses an lb that is not a positive number, naming the field", async () => {
    const { viewer, revisions } = await teamProject(t);
    for (const lb of ["0", "-2", "abc", "Infinity"]) {
      const res = await viewer.client.get(`${revisions}/1/report.pdf?lb=${lb}`);
      expect(res.status).toBe(400);
      expect(res.body.error.details.issues[0].path).toBe("lb");
    }
  });
});
