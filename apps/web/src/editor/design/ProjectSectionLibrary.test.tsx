import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import { findMaterialPreset } from "@spanwright/solver/design";
import { renderRoutes, stubFetch } from "../../test/renderWithProviders";
import { twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import { SectionButton } from "./SectionButton";
import { readProjectSection } from "./ProjectSectionLibrary";

afterEach(() => {
  vi.unstubAllGlobals();
});

const projectId = "6a0f3c52-8d1e-4b7a-9c2f-1e5d7b3a9c40";
const beamId = "c4d2e8f1-7a3b-4c5d-9e6f-2a1b3c4d5e6f";
const when = "2026-11-30T09:00:00.000Z";
const glulam = findMaterialPreset("glulam-gl24h")!;

/** Invented library entry of an imaginary timber canopy project: a 140 × 450 mm glulam beam. */
const canopyBeam = {
  id: "0b6c1e52-3f4a-4d8b-9a7c-5e2f1d3c4b5a",
  projectId,
  name: "Canopy glulam 140x450",
  shape: { kind: "rectangle", b: 0.14, h: 0.45 },
  material: glulam,
  // Values the server would compute; b·h = 0.063 m², b·h³/12 = 1.063e-3 m⁴ (rectangle, statics).
  sectionProperties: {
    kind: "rectangle", A: 0.063, I: 1.063e-3, depth: 0.45, yTop: 0.225, Stop: 4.725e-3, Sbot: 4.725e-3,
    Z: 7.0875e-3, yPlastic: 0.225, Q: 3.54e-3, bNA: 0.14, shearArea: 0.0525, shearFactor: 5 / 6, shearAreaBasis: "5/6 of A",
  },
  createdBy: { id: "u1", name: "Odile Marsh" },
  createdAt: when,
  updatedAt: when,
};

function open(store: EditorStore, answers: Parameters<typeof stubFetch>[0], calls: { key: string; body: unknown }[] = []) {
  const stub = stubFetch(answers);
  vi.stubGlobal("fetch", async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = typeof input === "string" ? input : input instanceof URL ? input.pathname : input.url;
    calls.push({ key: `${init?.method ?? "GET"} ${url}`, body: typeof init?.body === "string" ? JSON.parse(init.body) : undefined });
    return stub(input, init);
  });
  const element = (
    <EditorStoreContext.Provider value={store}>
      <SectionButton segmentId={store.doc.segments[0]!.id} number={1} />
    </EditorStoreContext.Provider>
  );
  renderRoutes([{ path: "/projects/:projectId/beams/:beamId", element }], `/projects/${projectId}/beams/${beamId}`);
  fireEvent.click(screen.getByRole("button", { name: "Section of segment 1" }));
  // the dialog is its own chunk (lazyDesign.ts): it appears once loaded
  return screen.findByRole("dialog");
}

const listPath = `/api/projects/${projectId}/sections`;

describe("the project section library in the Section dialog", () => {
  it("picks a saved section, fills the shape and material, and applies it to the segment", async () => {
    const store = new EditorStore(twoSpanDocument());
    const dialog = await open(store, { [`GET ${listPath}`]: { status: 200, body: { sections: [canopyBeam] } } });
    const select = await within(dialog).findByRole("combobox", { name: "Saved project sections" });
    await waitFor(() => expect((select as HTMLSelectElement).disabled).toBe(false));
    fireEvent.change(select, { target: { value: canopyBeam.id } });
    expect((within(dialog).getByRole("combobox", { name: "Shape" }) as HTMLSelectElement).value).toBe("rectangle");
    fireEvent.click(within(dialog).getByRole("button", { name: "Apply to segment 1" }));
    const section = store.doc.segments[0]!.section;
    expect(section?.shape).toEqual({ kind: "rectangle", b: 0.14, h: 0.45 });
    expect(section?.material.name).toBe(glulam.name);
    // E comes from the material, I = b·h³/12 from the shape (rectangle, statics).
    expect(store.doc.segments[0]!.E).toBe(glulam.E);
    expect(store.doc.segments[0]!.I).toBeCloseTo((0.14 * 0.45 ** 3) / 12, 10);
  });

  it("saves the typed section to the project library under a name", async () => {
    const store = new EditorStore(twoSpanDocument());
    const calls: { key: string; body: unknown }[] = [];
    const dialog = await open(
      store,
      {
        [`GET ${listPath}`]: { status: 200, body: { sections: [] } },
        [`POST ${listPath}`]: { status: 201, body: { section: { ...canopyBeam, name: "Typical floor beam" } } },
      },
      calls,
    );
    await within(dialog).findByRole("option", { name: "No saved sections yet" });
    fireEvent.change(within(dialog).getByLabelText("Name in the project library"), { target: { value: "Typical floor beam" } });
    fireEvent.click(within(dialog).getByRole("button", { name: "Save to project library" }));
    expect(await within(dialog).findByText("Saved “Typical floor beam” to the project library.")).toBeTruthy();
    const post = calls.find((c) => c.key === `POST ${listPath}`);
    expect(post?.body).toMatchObject({ name: "Typical floor beam", shape: { kind: "i-shape" }, material: { id: "steel-a992" } });
  });

  it("offers picking but not saving to a read-only role", async () => {
    const store = new EditorStore(twoSpanDocument(), { canEdit: false });
    const dialog = await open(store, { [`GET ${listPath}`]: { status: 200, body: { sections: [canopyBeam] } } });
    await within(dialog).findByRole("option", { name: /Canopy glulam/ });
    expect(within(dialog).queryByRole("button", { name: "Save to project library" })).toBeNull();
    expect((within(dialog).getByRole("button", { name: "Apply to segment 1" }) as HTMLButtonElement).disabled).toBe(true);
  });
});

describe("readProjectSection", () => {
  it("refuses a stored shape the engine cannot read, naming the section", () => {
    const r = readProjectSection({ ...canopyBeam, shape: { kind: "rectangle", b: -1, h: 0.45 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain("Canopy glulam 140x450");
  });
});
