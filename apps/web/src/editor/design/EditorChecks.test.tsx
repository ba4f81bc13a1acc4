import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import { analyze, beamModelSchema } from "@spanwright/solver";
import { findMaterialPreset } from "@spanwright/solver/design";
import { simpleSpanDeadLive, wShape } from "../../test/designFixtures";
import { renderRoutes, stubFetch } from "../../test/renderWithProviders";
import { setSegmentSection } from "../commands/designCommands";
import type { BeamDocument } from "../model/BeamDocument";
import { fromExchange, toExchange } from "../model/exchange";
import { EditorChecks } from "./EditorChecks";

afterEach(() => {
  vi.unstubAllGlobals();
});

const projectId = "6a0f3c52-8d1e-4b7a-9c2f-1e5d7b3a9c40";
const beamId = "c4d2e8f1-7a3b-4c5d-9e6f-2a1b3c4d5e6f";
const sectionId = "0b6c1e52-3f4a-4d8b-9a7c-5e2f1d3c4b5a";
const when = "2026-11-30T09:00:00.000Z";
const steel = findMaterialPreset("steel-a992")!;

/** Invented demo beam: one 6 m simple span, uniform dead 10 kN/m and live 15 kN/m, 1.2D + 1.6L. */
const demo = simpleSpanDeadLive({ span: 6, dead: 10e3, live: 15e3, I: 1e-4, combinations: [{ id: "LRFD2", factors: { D: 1.2, L: 1.6 } }] });

/** The beam as it opens after a reload: the segments' sections stay with a session, so none has one. */
function reloaded(): BeamDocument {
  const r = fromExchange(demo);
  if (!r.ok) throw new Error(r.error.message);
  return r.doc;
}


function withSegmentSection(doc: BeamDocument): BeamDocument {
  const r = setSegmentSection(doc, { segmentIds: [doc.segments[0]!.id], shape: wShape, material: steel });
  if (!r.ok) throw new Error(r.error.message);
  return { ...doc, ...r.change.patch.after };
}

/** Invented saved settings: a typed welded I-section, ASD, braces every 2 m, Cb = 1.0, L/300 under L. */
const saved = {
  section: { source: "typed", name: "Edge beam I-360", shape: { kind: "i-shape", d: 0.36, bf: 0.17, tf: 0.0127, tw: 0.008 } },
  material: steel,
  method: "ASD",
  lb: 2,
  cb: "unity",
  strengthIds: null,
  deflection: [{ limit: { kind: "ratio", ratio: 300 }, ids: ["L"] }],
  allowableBending: null,
  allowableShear: null,
};

function answers(role: string, designSettings: unknown, sections: unknown[] = []) {
  return {
    [`GET /api/projects/${projectId}`]: {
      status: 200,
      body: { project: { id: projectId, name: "Harbour Lane depot", unitSystem: "si", compareThresholdPercent: 5, role, createdAt: when, updatedAt: when } },
    },
    [`GET /api/projects/${projectId}/sections`]: { status: 200, body: { sections } },
    [`GET /api/projects/${projectId}/beams/${beamId}`]: {
      status: 200,
      body: {
        beam: { id: beamId, projectId, name: "B-12", latestVersion: 4, createdAt: when, updatedAt: when },
        revision: {
          version: 4, author: { id: "u1", name: "Odile Marsh" }, createdAt: when, changeSummary: "", status: "draft",
          checkedBy: null, checkedAt: null, checkComment: null, model: demo, result: { format: "spanwright.result/1", results: {}, envelopes: {} },
        },
        designSettings,
      },
    },
  };
}

/** The stub, recording the body of each PATCH and answering it with the settings sent, as the API does. */
function echoingFetch(table: Record<string, { status: number; body?: unknown }>) {
  const sent: unknown[] = [];
  const inner = stubFetch(table);
  const fetch = async (input: RequestInfo | URL, init?: RequestInit) => {
    if (init?.method !== "PATCH") return inner(input, init);
    const body = JSON.parse(String(init.body)) as unknown;
    sent.push(body);
    return new Response(JSON.stringify(body), { status: 200, headers: { "Content-Type": "application/json" } });
  };
  return { fetch, sent };
}

const analysisOf = (doc: BeamDocument) => analyze(beamModelSchema.parse(toExchange(doc)));

function openChecks(doc: BeamDocument) {
  return renderRoutes([{ path: "/projects/:projectId/beams/:beamId", element: <EditorChecks doc={doc} analysis={analysisOf(doc)} /> }], `/projects/${projectId}/beams/${beamId}`);
}

const inDisabledFieldset = (label: string) => screen.getByLabelText(label).closest("fieldset")?.disabled;

describe("the editor's Checks tab on a saved beam", () => {
  it("starts after a reload from the beam's saved section, method, Lb, Cb and limits, and links the report", async () => {
    vi.stubGlobal("fetch", stubFetch(answers("engineer", saved)));
    openChecks(reloaded());
    expect(await screen.findByText(/Checking the section saved with the beam, Edge beam I-360/)).toBeTruthy();
    expect((screen.getByLabelText("Design method") as HTMLSelectElement).value).toBe("ASD");
    expect((screen.getByLabelText("Unbraced length Lb (m)") as HTMLInputElement).value).toBe("2");
    expect((screen.getByLabelText("Cb (lateral-torsional buckling)") as HTMLSelectElement).value).toBe("unity");
    expect(screen.getByText("Saved with the beam.")).toBeTruthy();
    const link = screen.getByRole("link", { name: "PDF report with these checks" });
    expect(link.getAttribute("href")).toBe(`/api/projects/${projectId}/beams/${beamId}/revisions/4/report.pdf`);
    // 6 m span at the saved L/300 (typed ratio): the deflection row's capacity 6000/300 = 20 mm.
    expect(within(screen.getByRole("table", { name: "Member checks" })).getByText(/^20(\.0+)? mm$/)).toBeTruthy();
  });

  it("saves the segment's section and the choices with the beam when an engineer clicks Save", async () => {
    const { fetch, sent } = echoingFetch(answers("engineer", null));
    vi.stubGlobal("fetch", fetch);
    openChecks(withSegmentSection(reloaded()));
    await screen.findByText(/Checking the section of segment 1/);
    expect(screen.queryByRole("link", { name: "PDF report with these checks" })).toBeNull();
    fireEvent.change(screen.getByLabelText("Design method"), { target: { value: "ASD" } });
    fireEvent.change(screen.getByLabelText("Unbraced length Lb (m)"), { target: { value: "1.5" } });
    fireEvent.click(screen.getByRole("button", { name: "Save design settings" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    const body = sent[0] as { designSettings: Record<string, unknown> };
    expect(body.designSettings).toMatchObject({
      section: { source: "typed", name: "Section of segment 1", shape: wShape },
      material: { id: "steel-a992" },
      method: "ASD",
      lb: 1.5,
      cb: "equation-f1-1",
      strengthIds: null,
    });
    expect(await screen.findByRole("link", { name: "PDF report with these checks" })).toBeTruthy();
    expect(screen.getByText("Saved with the beam.")).toBeTruthy();
  });

  it("keeps a saved project section linked while the segment has that section's shape", async () => {
    const { fetch, sent } = echoingFetch(
      answers("owner", { ...saved, section: { source: "project", sectionId }, material: null }, [
        { id: sectionId, projectId, name: "Mezzanine W410", shape: wShape, material: steel, createdBy: { id: "u1", name: "Odile Marsh" }, createdAt: when, updatedAt: when,
          // Values the server would compute; not read here.
          sectionProperties: { kind: "i-shape", A: 5.5e-3, I: 1.5e-4, depth: 0.403, yTop: 0.2015, Stop: 7.4e-4, Sbot: 7.4e-4, Z: 8.4e-4, yPlastic: 0.2015, Q: 4.2e-4, bNA: 0.007, shearArea: 2.8e-3, shearFactor: null, shearAreaBasis: "d·tw" } },
      ]),
    );
    vi.stubGlobal("fetch", fetch);
    openChecks(withSegmentSection(reloaded()));
    await screen.findByText(/Checking the section of segment 1/);
    expect(screen.getByText("Saved with the beam.")).toBeTruthy();
    fireEvent.change(screen.getByLabelText("Unbraced length Lb (m)"), { target: { value: "3" } });
    fireEvent.click(screen.getByRole("button", { name: "Save design settings" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect((sent[0] as { designSettings: unknown }).designSettings).toMatchObject({ section: { source: "project", sectionId }, material: null, lb: 3 });
  });

  it("shows a checker the saved choices read-only, with the report link and no Save button", async () => {
    vi.stubGlobal("fetch", stubFetch(answers("checker", saved)));
    openChecks(reloaded());
    await screen.findByText(/Checking the section saved with the beam/);
    expect(inDisabledFieldset("Design method")).toBe(true);
    expect(inDisabledFieldset("Unbraced length Lb (m)")).toBe(true);
    expect(screen.queryByRole("button", { name: "Save design settings" })).toBeNull();
    expect(screen.getByRole("link", { name: "PDF report with these checks" })).toBeTruthy();
  });

  it("keeps unsaved choices when a combination is added, and checks the new combination too", async () => {
    vi.stubGlobal("fetch", stubFetch(answers("engineer", saved)));
    const before = reloaded();
    const r = fromExchange({ ...demo, combinations: [...(demo.combinations ?? []), { id: "LRFD1", factors: { D: 1.4 } }] });
    if (!r.ok) throw new Error(r.error.message);
    const after = r.doc;
    function Editing() {
      const [doc, setDoc] = useState(before);
      return (
        <>
          <button type="button" onClick={() => setDoc(after)}>Add LRFD1</button>
          <EditorChecks doc={doc} analysis={analysisOf(doc)} />
        </>
      );
    }
    renderRoutes([{ path: "/projects/:projectId/beams/:beamId", element: <Editing /> }], `/projects/${projectId}/beams/${beamId}`);
    fireEvent.change(await screen.findByLabelText("Unbraced length Lb (m)"), { target: { value: "3" } });
    fireEvent.click(screen.getByRole("button", { name: "Add LRFD1" }));
    expect((screen.getByLabelText("Unbraced length Lb (m)") as HTMLInputElement).value).toBe("3");
    expect((screen.getByLabelText("Design method") as HTMLSelectElement).value).toBe("ASD");
    // The saved strength cases are "every combination", so the new one is checked as well.
    expect(within(screen.getByRole("table", { name: "Member checks" })).getAllByText("LRFD1").length).toBeGreaterThan(0);
    expect(screen.getByText("Unsaved changes: the saved settings differ from what is shown.")).toBeTruthy();
  });

  it("says so when the saved project section was deleted and no segment has a section", async () => {
    vi.stubGlobal("fetch", stubFetch(answers("engineer", { ...saved, section: { source: "project", sectionId }, material: null })));
    openChecks(reloaded());
    expect(await screen.findByText(/project section saved with this beam's design settings has been deleted/)).toBeTruthy();
    expect(screen.queryByRole("table", { name: "Member checks" })).toBeNull();
  });
});
