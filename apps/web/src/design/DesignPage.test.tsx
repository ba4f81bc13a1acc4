import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import { simpleSpanDeadLive } from "../test/designFixtures";
import { renderRoutes, stubFetch } from "../test/renderWithProviders";
import { DesignPage } from "./DesignPage";

afterEach(() => {
  vi.unstubAllGlobals();
});

const projectId = "6a0f3c52-8d1e-4b7a-9c2f-1e5d7b3a9c40";
const beamId = "c4d2e8f1-7a3b-4c5d-9e6f-2a1b3c4d5e6f";
const when = "2026-11-30T09:00:00.000Z";

/** Invented beam: a 7 m simple span at an imaginary warehouse mezzanine, dead and live cases. */
const model = simpleSpanDeadLive({ title: "Mezzanine edge beam", span: 7, dead: 8e3, live: 12e3, I: 2.1e-4, combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }] });

function answers(role = "owner", designSettings: unknown = null) {
  return {
    [`GET /api/projects/${projectId}`]: {
      status: 200,
      body: { project: { id: projectId, name: "Harbour Lane depot", unitSystem: "si", compareThresholdPercent: 5, role, createdAt: when, updatedAt: when } },
    },
    [`GET /api/projects/${projectId}/sections`]: { status: 200, body: { sections: [] } },
    [`GET /api/projects/${projectId}/beams/${beamId}`]: {
      status: 200,
      body: {
        beam: { id: beamId, projectId, name: "B-12", latestVersion: 3, createdAt: when, updatedAt: when },
        revision: {
          version: 3, author: { id: "u1", name: "Odile Marsh" }, createdAt: when, changeSummary: "", status: "draft",
          checkedBy: null, checkedAt: null, checkComment: null, model, result: { format: "spanwright.result/1", results: {}, envelopes: {} },
        },
        designSettings,
      },
    },
  };
}

const steel = { id: "steel-a992", name: "Structural steel A992 (demo)", kind: "steel", E: 200e9, Fy: 345e6, typical: true, note: "typical values, confirm for your project", source: "demo" };
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
const path = `/projects/${projectId}/beams/${beamId}/design`;
const settingsPath = `/api/projects/${projectId}/beams/${beamId}/design-settings`;

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

const page = () => renderRoutes([{ path: "/projects/:projectId/beams/:beamId/design", element: <DesignPage /> }], path);

describe("DesignPage", () => {
  it("loads the beam's latest revision and shows checks, the section at x and the theory panel", async () => {
    vi.stubGlobal("fetch", stubFetch(answers()));
    renderRoutes([{ path: "/projects/:projectId/beams/:beamId/design", element: <DesignPage /> }], `/projects/${projectId}/beams/${beamId}/design`);
    expect(await screen.findByText("Design checks: B-12")).toBeTruthy();
    const checks = screen.getByRole("table", { name: "Member checks" });
    // The saved result has no stations, so the page solves again: C1 flexure and shear, L deflection.
    expect(within(checks).getAllByRole("row")).toHaveLength(1 + 3);
    // wu·L²/8 = (1.2·8 + 1.6·12)·7²/8 = 176.4 kN·m (simple span, uniform load).
    expect(within(checks).getByText("176.4 kN·m")).toBeTruthy();
    expect(screen.getByTestId("stress-top")).toBeTruthy();
    expect(screen.getByRole("table", { name: "Shear deformation per span" })).toBeTruthy();
  });

  it("starts from the beam's saved settings and offers the PDF report that prints them", async () => {
    vi.stubGlobal("fetch", stubFetch(answers("engineer", saved)));
    page();
    expect(await screen.findByText("Design checks: B-12")).toBeTruthy();
    expect((screen.getByLabelText("Name of the typed section") as HTMLInputElement).value).toBe("Edge beam I-360");
    expect((screen.getByLabelText("Design method") as HTMLSelectElement).value).toBe("ASD");
    expect((screen.getByLabelText("Unbraced length Lb (m)") as HTMLInputElement).value).toBe("2");
    expect((screen.getByLabelText("Cb (lateral-torsional buckling)") as HTMLSelectElement).value).toBe("unity");
    expect(screen.getByText("Saved with the beam.")).toBeTruthy();
    const link = screen.getByRole("link", { name: "PDF report with these checks" });
    expect(link.getAttribute("href")).toBe(`/api/projects/${projectId}/beams/${beamId}/revisions/3/report.pdf`);
    // 7 m span at L/300 (typed ratio): the deflection row's capacity 23.33 mm
    expect(within(screen.getByRole("table", { name: "Member checks" })).getByText("23.33 mm")).toBeTruthy();
    expect(screen.getByText(/do not replace, the judgement of a licensed engineer/)).toBeTruthy();
  });

  it("saves the choices with the beam when an engineer clicks Save, then links the report", async () => {
    const { fetch, sent } = echoingFetch(answers("engineer"));
    vi.stubGlobal("fetch", fetch);
    page();
    await screen.findByText("Design checks: B-12");
    expect(screen.queryByRole("link", { name: "PDF report with these checks" })).toBeNull();
    fireEvent.change(screen.getByLabelText("Design method"), { target: { value: "ASD" } });
    fireEvent.click(screen.getByRole("button", { name: "Save design settings" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    const body = sent[0] as { designSettings: { method: string; lb: number | null; section: { source: string }; deflection: unknown[] } };
    expect(body.designSettings).toMatchObject({ method: "ASD", lb: null, cb: "equation-f1-1", section: { source: "typed" }, strengthIds: null });
    expect(body.designSettings.deflection).toEqual([{ limit: { kind: "preset", presetId: "floor-live" }, ids: ["L"] }, { limit: { kind: "preset", presetId: "floor-total" }, ids: [] }]);
    expect(await screen.findByRole("link", { name: "PDF report with these checks" })).toBeTruthy();
  });

  it("shows a refused save with the field the server names", async () => {
    const table = answers("engineer");
    const refusal = { error: { code: "invalid-section", message: "web thickness tw must be greater than zero", details: { field: "designSettings.section.shape.tw" } } };
    vi.stubGlobal("fetch", stubFetch({ ...table, [`PATCH ${settingsPath}`]: { status: 422, body: refusal } }));
    page();
    await screen.findByText("Design checks: B-12");
    fireEvent.change(screen.getByLabelText("Design method"), { target: { value: "ASD" } });
    fireEvent.click(screen.getByRole("button", { name: "Save design settings" }));
    expect(await screen.findByText(/field: designSettings\.section\.shape\.tw/)).toBeTruthy();
    expect(screen.queryByRole("link", { name: "PDF report with these checks" })).toBeNull();
  });

  it("shows a viewer the saved settings read-only, with the report link and no Save button", async () => {
    vi.stubGlobal("fetch", stubFetch(answers("viewer", saved)));
    page();
    await screen.findByText("Design checks: B-12");
    // a disabled fieldset disables every control inside it (HTML form semantics; jsdom does not apply it to :disabled)
    const inDisabledFieldset = (label: string) => screen.getByLabelText(label).closest("fieldset")?.disabled;
    expect(inDisabledFieldset("Design method")).toBe(true);
    expect(inDisabledFieldset("Name of the typed section")).toBe(true);
    expect(inDisabledFieldset("Unbraced length Lb (m)")).toBe(true);
    expect(screen.queryByRole("button", { name: "Save design settings" })).toBeNull();
    expect(screen.getByRole("link", { name: "PDF report with these checks" })).toBeTruthy();
  });

  it("moves strength checks from the load cases to combinations generated on a beam that had none, and saves them as every combination", async () => {
    const table = answers("engineer", { ...saved, deflection: null });
    const key = `GET /api/projects/${projectId}/beams/${beamId}`;
    const beam = table[key].body as { revision: { model: typeof model } };
    const bare = { ...beam, revision: { ...beam.revision, model: { ...model, combinations: [] } } };
    const { fetch, sent } = echoingFetch({ ...table, [key]: { status: 200, body: bare } });
    vi.stubGlobal("fetch", fetch);
    page();
    await screen.findByText("Design checks: B-12");
    const caseColumn = () => within(screen.getByRole("table", { name: "Member checks" })).getAllByRole("row").slice(1).map((r) => r.querySelectorAll("td")[1]?.textContent);
    // No combinations yet: strength checks on D and L (flexure and shear), deflection under L.
    expect(new Set(caseColumn())).toEqual(new Set(["D", "L"]));
    fireEvent.click(screen.getByRole("button", { name: /Apply 2 combinations/ }));
    // ASCE/SEI 7-22 §2.3.1 with D and L only: combination 1 (1.4D) and 2 (1.2D + 1.6L)
    await waitFor(() => expect(new Set(caseColumn())).toEqual(new Set(["LRFD1", "LRFD2", "L"])));
    expect((screen.getByLabelText("Design method") as HTMLSelectElement).value).toBe("ASD");
    expect((screen.getByLabelText("Unbraced length Lb (m)") as HTMLInputElement).value).toBe("2");
    fireEvent.click(screen.getByRole("button", { name: "Save design settings" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect((sent[0] as { designSettings: { strengthIds: unknown } }).designSettings.strengthIds).toBeNull();
  });
});
