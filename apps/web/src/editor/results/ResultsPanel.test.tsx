import { describe, expect, it, vi } from "vitest";
import { fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { analyze, beamModelSchema } from "@spanwright/solver";
import { findMaterialPreset } from "@spanwright/solver/design";
import { setSegmentSection } from "../commands/designCommands";
import { createTemplate } from "../model/templates";
import { toExchange } from "../model/exchange";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import { ResultsPanel } from "./ResultsPanel";

// Konva needs a real canvas, which happy-dom lacks; the diagrams are not under test here.
vi.mock("./DiagramsStage", () => ({ DiagramsStage: () => null }));

describe("the results area", () => {
  it("switches from the diagrams to the member checks of the open beam", async () => {
    const store = new EditorStore(createTemplate("simple-span", "si"));
    store.run((d) => setSegmentSection(d, { segmentIds: d.segments.map((s) => s.id), shape: { kind: "i-shape", d: 0.4, bf: 0.18, tf: 0.012, tw: 0.008 }, material: findMaterialPreset("steel-a992")! }));
    const analysis = analyze(beamModelSchema.parse(toExchange(store.doc)));
    render(
      <EditorStoreContext.Provider value={store}>
        <ResultsPanel state={{ status: "ready", analysis, error: null }} />
      </EditorStoreContext.Provider>,
    );
    // The section view is keyboard-reachable: typing x works like clicking the diagrams.
    // (the section view and the checks are chunks of their own: lazyDesign.ts)
    // The field arrives with its lazy chunk; on a busy machine the first keystrokes can land
    // before it has settled, so the typing is retried until it takes (as a user would retype).
    await screen.findByLabelText(/^Section view x/);
    await waitFor(() => {
      const x = screen.getByLabelText(/^Section view x/);
      fireEvent.change(x, { target: { value: "3" } });
      fireEvent.keyDown(x, { key: "Enter" });
      expect(store.getState().ui.sectionX).toBe(3);
    });
    expect(screen.getByText(/an envelope has no single moment at x/)).toBeTruthy();
    expect(screen.queryByRole("table", { name: "Member checks" })).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Checks" }));
    expect(screen.getByRole("button", { name: "Checks" }).getAttribute("aria-pressed")).toBe("true");
    const table = await screen.findByRole("table", { name: "Member checks" });
    expect(within(table).getAllByText(/flexure/i).length).toBeGreaterThan(0);
  });
});
