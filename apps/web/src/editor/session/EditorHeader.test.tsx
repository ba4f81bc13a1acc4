import { describe, expect, it } from "vitest";
import { screen } from "@testing-library/react";
import { renderRoutes } from "../../test/renderWithProviders";
import { twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import { EditorHeader } from "./EditorHeader";

const path = "/projects/p-1/beams/b-7";

function renderHeader(canEdit: boolean) {
  const store = new EditorStore(twoSpanDocument(), { canEdit });
  const element = (
    <EditorStoreContext.Provider value={store}>
      <EditorHeader beamName="B-7" version={2} isDirty={false} canSave={canEdit} saving={false} onSave={() => {}} />
    </EditorStoreContext.Provider>
  );
  renderRoutes([{ path: "/projects/:projectId/beams/:beamId", element }], path);
}

describe("the editor header", () => {
  it("links to the beam's design checks and its revisions", () => {
    renderHeader(true);
    expect(screen.getByRole("link", { name: "Design checks" }).getAttribute("href")).toBe(`${path}/design`);
    expect(screen.getByRole("link", { name: "Revisions" }).getAttribute("href")).toBe(`${path}/revisions`);
  });

  it("locks the beam-level edits for a read-only role", () => {
    renderHeader(false);
    for (const label of ["Display units", "Beam theory", "Start from a template"]) {
      expect((screen.getByLabelText(label) as HTMLSelectElement).disabled, label).toBe(true);
    }
    expect((screen.getByRole("button", { name: "Import JSON" }) as HTMLButtonElement).disabled).toBe(true);
    expect((screen.getByRole("button", { name: "Export JSON" }) as HTMLButtonElement).disabled).toBe(false);
  });
});
