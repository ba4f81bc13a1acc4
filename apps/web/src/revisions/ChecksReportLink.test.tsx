import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen } from "@testing-library/react";
import { findMaterialPreset } from "@spanwright/solver/design";
import { renderWithProviders, stubFetch } from "../test/renderWithProviders";
import { ChecksReportLink, parseUnbracedLength } from "./ChecksReportLink";

afterEach(() => {
  vi.unstubAllGlobals();
});

const P = "6a0f3c52-8d1e-4b7a-9c2f-1e5d7b3a9c40";
const B = "c4d2e8f1-7a3b-4c5d-9e6f-2a1b3c4d5e6f";
const when = "2026-11-30T09:00:00.000Z";
const steel = findMaterialPreset("steel-a992")!;

/** Invented library entries of an imaginary warehouse mezzanine: two welded I-sections. */
const section = (id: string, name: string, d: number) => ({
  id, projectId: P, name,
  shape: { kind: "i-shape", d, bf: 0.15, tf: 0.01, tw: 0.006 },
  material: steel,
  // Values the server would compute (plates, fillets ignored); not read by the link.
  sectionProperties: { kind: "i-shape", A: 4.68e-3, I: 7.41e-5, depth: d, yTop: d / 2, Stop: 4.94e-4, Sbot: 4.94e-4, Z: 5.53e-4, yPlastic: d / 2, Q: 2.76e-4, bNA: 0.006, shearArea: 1.8e-3, shearFactor: null, shearAreaBasis: "d·tw" },
  createdBy: { id: "u1", name: "Odile Marsh" },
  createdAt: when,
  updatedAt: when,
});
const first = section("0b6c1e52-3f4a-4d8b-9a7c-5e2f1d3c4b5a", "Mezzanine I-300", 0.3);
const second = section("1c7d2f63-4a5b-4e9c-8b8d-6f3a2e4d5c6b", "Mezzanine I-360", 0.36);

/** Invented saved design settings: the first section, ASD, braces every 2 m. */
const saved = { section: { source: "project", sectionId: first.id }, material: null, method: "ASD", lb: 2, cb: "equation-f1-1", strengthIds: null, deflection: null, allowableBending: null, allowableShear: null };

function renderLink(units: "si" | "us", designSettings: unknown = null, beamStatus = 200) {
  const beam = {
    beam: { id: B, projectId: P, name: "B-12", latestVersion: 3, createdAt: when, updatedAt: when },
    revision: {
      version: 3, author: { id: "u1", name: "Odile Marsh" }, createdAt: when, changeSummary: "", status: "draft", checkedBy: null, checkedAt: null, checkComment: null,
      model: { format: "spanwright.beam/1", nodes: [{ x: 0, support: { type: "pinned" } }, { x: 5, support: { type: "pinned" } }], segments: [{ E: 200e9, I: 7.41e-5 }], loadCases: [], combinations: [] },
      result: { format: "spanwright.result/1", results: {}, envelopes: {} },
    },
    designSettings,
  };
  vi.stubGlobal("fetch", stubFetch({
    [`GET /api/projects/${P}/sections`]: { status: 200, body: { sections: [first, second] } },
    [`GET /api/projects/${P}/beams/${B}`]: beamStatus === 200 ? { status: 200, body: beam } : { status: beamStatus, body: { error: { code: "internal", message: "the beam could not be read" } } },
  }));
  renderWithProviders(<ChecksReportLink projectId={P} beamId={B} version={3} units={units} />);
}

const hrefOf = () => new URL(screen.getByRole("link", { name: "PDF report with member checks" }).getAttribute("href")!, "http://x");

describe("ChecksReportLink", () => {
  it("carries the chosen section, the method and Lb converted to metres", async () => {
    renderLink("us");
    fireEvent.change(await screen.findByLabelText("Section"), { target: { value: second.id } });
    fireEvent.change(screen.getByLabelText("Method"), { target: { value: "ASD" } });
    fireEvent.change(screen.getByLabelText(/Unbraced length Lb/), { target: { value: "10" } });
    const url = hrefOf();
    expect(url.pathname).toBe(`/api/projects/${P}/beams/${B}/revisions/3/report.pdf`);
    expect(url.searchParams.get("sectionId")).toBe(second.id);
    expect(url.searchParams.get("method")).toBe("ASD");
    // 10 ft = 10 · 0.3048 m = 3.048 m exactly (NIST SP 811, appendix B)
    expect(Number(url.searchParams.get("lb"))).toBeCloseTo(3.048, 12);
  });

  it("leaves lb out when empty (braced at the supports only) and withholds the link for Lb ≤ 0", async () => {
    renderLink("si");
    await screen.findByLabelText("Section");
    const url = hrefOf();
    // Nothing saved: the link must name a section; LRFD and eq. F1-1 are the report's own defaults.
    expect([...url.searchParams.keys()]).toEqual(["sectionId"]);
    expect(url.searchParams.get("sectionId")).toBe(first.id);
    expect(screen.getByText(/empty: at the supports only/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/Unbraced length Lb/), { target: { value: "0" } });
    expect(screen.queryByRole("link", { name: "PDF report with member checks" })).toBeNull();
    expect(screen.getByText("Lb must be greater than zero.")).toBeTruthy();
  });
});

describe("ChecksReportLink on a beam with saved design settings", () => {
  it("says an empty Lb is the saved one and leaves it out of the link, so the report reads it", async () => {
    renderLink("si", saved);
    const field = (await screen.findByLabelText(/Unbraced length Lb/)) as HTMLInputElement;
    expect(field.placeholder).toBe("saved: 2 m");
    expect(screen.getByText(/empty: the beam's saved Lb of 2 m/)).toBeTruthy();
    expect(screen.queryByText(/at the supports only$/)).toBeNull();
    expect(hrefOf().searchParams.has("lb")).toBe(false);
    fireEvent.change(field, { target: { value: "3" } });
    expect(Number(hrefOf().searchParams.get("lb"))).toBe(3);
  });

  it("shows the saved Lb in the project's units", async () => {
    renderLink("us", saved);
    // 2 m / 0.3048 m/ft = 6.5617 ft (NIST SP 811, appendix B), shown to 4 significant digits
    expect(((await screen.findByLabelText(/Unbraced length Lb/)) as HTMLInputElement).placeholder).toBe("saved: 6.562 ft");
  });
});

describe("ChecksReportLink starting from the saved section, material, method and Cb", () => {
  it("links the report as saved (no query) and names only what the user changes", async () => {
    renderLink("si", { ...saved, cb: "unity" });
    const sectionField = (await screen.findByLabelText("Section")) as HTMLSelectElement;
    expect(sectionField.value).toBe(first.id);
    expect(sectionField.selectedOptions[0]?.textContent).toBe("Mezzanine I-300 (saved)");
    expect((screen.getByLabelText("Method") as HTMLSelectElement).value).toBe("ASD");
    expect((screen.getByLabelText("Cb") as HTMLSelectElement).value).toBe("unity");
    expect(hrefOf().search).toBe("");

    fireEvent.change(screen.getByLabelText("Method"), { target: { value: "LRFD" } });
    expect([...hrefOf().searchParams.entries()]).toEqual([["method", "LRFD"]]);
    fireEvent.change(screen.getByLabelText("Cb"), { target: { value: "equation-f1-1" } });
    fireEvent.change(sectionField, { target: { value: second.id } });
    expect([...hrefOf().searchParams.entries()]).toEqual([["sectionId", second.id], ["method", "LRFD"], ["cb", "equation-f1-1"]]);
    // back to the saved ones: the link is the plain report again
    fireEvent.change(sectionField, { target: { value: first.id } });
    fireEvent.change(screen.getByLabelText("Method"), { target: { value: "ASD" } });
    fireEvent.change(screen.getByLabelText("Cb"), { target: { value: "unity" } });
    expect(hrefOf().search).toBe("");
  });

  it("keeps the saved material with the saved section and says another section is checked in its own", async () => {
    // Invented: the saved section checked in a steel whose Fy the engineer raised from mill certificates.
    renderLink("si", { ...saved, material: { ...steel, name: "A992, Fy from mill certificates (demo)", Fy: 380e6 } });
    expect(await screen.findByText("Material: A992, Fy from mill certificates (demo), saved with the beam.")).toBeTruthy();
    expect(hrefOf().searchParams.has("sectionId")).toBe(false);
    fireEvent.change(screen.getByLabelText("Section"), { target: { value: second.id } });
    expect(screen.getByText(/Material: the section's own, .*saved A992, Fy from mill certificates \(demo\) goes with the saved section only/)).toBeTruthy();
  });

  it("offers a saved typed section, which the link leaves to the report", async () => {
    renderLink("si", { ...saved, section: { source: "typed", name: "Edge beam I-360", shape: { kind: "i-shape", d: 0.36, bf: 0.17, tf: 0.0127, tw: 0.008 } }, material: steel });
    const sectionField = (await screen.findByLabelText("Section")) as HTMLSelectElement;
    expect(sectionField.selectedOptions[0]?.textContent).toBe("Edge beam I-360 (saved, typed for this beam)");
    expect(hrefOf().search).toBe("");
    fireEvent.change(sectionField, { target: { value: first.id } });
    expect([...hrefOf().searchParams.entries()]).toEqual([["sectionId", first.id]]);
  });

  it("names a project section when the saved one has been deleted, and says so", async () => {
    renderLink("si", { ...saved, section: { source: "project", sectionId: "2d8e3a74-5b6c-4fad-9c9e-7a4b3f5e6d7c" } });
    await screen.findByLabelText("Section");
    expect(screen.getByText(/project section saved with this beam has been deleted/)).toBeTruthy();
    // the saved ASD still applies, so only the section is named
    expect([...hrefOf().searchParams.entries()]).toEqual([["sectionId", first.id]]);
  });

  it("names every part when the beam's settings cannot be read", async () => {
    renderLink("si", null, 500);
    await screen.findByLabelText("Section");
    expect([...hrefOf().searchParams.entries()]).toEqual([["sectionId", first.id], ["method", "LRFD"], ["cb", "equation-f1-1"]]);
  });
});

describe("parseUnbracedLength", () => {
  it("reads the project's units and explicit units into metres", () => {
    expect(parseUnbracedLength("2.5", "si")).toEqual({ ok: true, lb: 2.5 });
    expect(parseUnbracedLength("2500 mm", "us")).toEqual({ ok: true, lb: 2.5 });
    expect(parseUnbracedLength("  ", "si")).toEqual({ ok: true, lb: null });
    expect(parseUnbracedLength("abc", "si").ok).toBe(false);
  });
});
