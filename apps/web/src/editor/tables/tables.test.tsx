import { describe, expect, it } from "vitest";
import { fireEvent, render, screen } from "@testing-library/react";
import type { ReactNode } from "react";
import { ids, twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import { NodesTable } from "./NodesTable";
import { CombinationsTable } from "./CombinationsTable";
import { LoadsTable } from "./LoadsTable";

function withStore(store: EditorStore, children: ReactNode) {
  return <EditorStoreContext.Provider value={store}>{children}</EditorStoreContext.Provider>;
}

function type(label: string, text: string) {
  const input = screen.getByLabelText(label);
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: "Enter" });
}

describe("editable tables issue commands", () => {
  it("typing a node position in mm moves the node, undoably", () => {
    const store = new EditorStore(twoSpanDocument());
    render(withStore(store, <NodesTable />));
    type("Node 2 x (m)", "6500 mm");
    expect(store.doc.nodes[1]!.x).toBe(6.5);
    store.undo();
    expect(store.doc.nodes[1]!.x).toBe(6);
  });

  it("choosing a spring support shows its stiffness in display units", () => {
    const store = new EditorStore(twoSpanDocument());
    render(withStore(store, <NodesTable />));
    fireEvent.change(screen.getByLabelText("Node 2 support"), { target: { value: "spring" } });
    expect(store.doc.nodes[1]!.support).toEqual({ type: "spring", ky: 5e7 });
    expect((screen.getByLabelText("Node 2 ky (kN/mm)") as HTMLInputElement).value).toBe("50");
  });

  it("a refused edit shows why and leaves the model alone", () => {
    const store = new EditorStore(twoSpanDocument());
    render(withStore(store, <NodesTable />));
    type("Node 2 x (m)", "13");
    expect(store.doc.nodes[1]!.x).toBe(6);
    expect(store.getState().ui.notice?.text).toMatch(/neighbours/);
  });

  it("editing a combination factor and clearing another", () => {
    const store = new EditorStore(twoSpanDocument());
    render(withStore(store, <CombinationsTable />));
    type("Combination C1 factor on D", "1.4");
    type("Combination C1 factor on L", "");
    expect(store.doc.combinations[0]!.factors).toEqual([{ caseId: ids.dead, factor: 1.4 }]);
  });

  it("loads table edits the active case in display units", () => {
    const doc = { ...twoSpanDocument(), units: "us" as const };
    const store = new EditorStore(doc);
    render(withStore(store, <LoadsTable />));
    type("Load 2 force (kip)", "-5");
    const load = store.doc.loadCases[0]!.loads[1]!;
    expect(load.type === "point" && load.fy).toBeCloseTo(-5 * 4448.2216152605, 6);
  });

  it("ArrowDown moves to the same column in the next row", () => {
    const store = new EditorStore(twoSpanDocument());
    render(withStore(store, <NodesTable />));
    const first = screen.getByLabelText("Node 1 x (m)");
    first.focus();
    fireEvent.keyDown(first, { key: "ArrowDown" });
    expect(document.activeElement).toBe(screen.getByLabelText("Node 2 x (m)"));
  });
});

describe("tables for a read-only role", () => {
  it("show the values in read-only, focusable cells and commit nothing", () => {
    const store = new EditorStore(twoSpanDocument(), { canEdit: false });
    render(withStore(store, <NodesTable />));
    const x = screen.getByLabelText("Node 2 x (m)") as HTMLInputElement;
    expect(x.readOnly).toBe(true);
    expect(x.value).toBe("6");
    type("Node 2 x (m)", "6500 mm");
    expect(store.doc.nodes[1]!.x).toBe(6);
    const support = screen.getByLabelText("Node 2 support") as HTMLInputElement;
    expect(support.tagName).toBe("INPUT");
    expect(support.readOnly).toBe(true);
    x.focus();
    expect(document.activeElement).toBe(x);
    fireEvent.keyDown(x, { key: "ArrowDown" });
    expect(document.activeElement).toBe(screen.getByLabelText("Node 3 x (m)"));
  });

  it("disable adding and deleting loads", () => {
    const store = new EditorStore(twoSpanDocument(), { canEdit: false });
    render(withStore(store, <LoadsTable />));
    for (const b of screen.getAllByRole("button")) expect((b as HTMLButtonElement).disabled).toBe(true);
  });
});
