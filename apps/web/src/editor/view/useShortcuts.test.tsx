import { describe, expect, it } from "vitest";
import { fireEvent, render, screen } from "@testing-library/react";
import { ids, twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "../store/EditorStore";
import { EditorStoreContext } from "../store/useEditor";
import { NodesTable } from "../tables/NodesTable";
import { useShortcuts } from "./useShortcuts";

function Harness({ store }: { store: EditorStore }) {
  useShortcuts(store);
  return (
    <EditorStoreContext.Provider value={store}>
      <NodesTable />
    </EditorStoreContext.Provider>
  );
}

describe("keyboard shortcuts beside text fields", () => {
  it("Ctrl+Z in a committed cell undoes the model edit", () => {
    const store = new EditorStore(twoSpanDocument());
    render(<Harness store={store} />);
    const input = screen.getByLabelText("Node 2 x (m)");
    fireEvent.change(input, { target: { value: "5" } });
    fireEvent.blur(input);
    expect(store.doc.nodes[1]!.x).toBe(5);
    fireEvent.keyDown(input, { key: "z", ctrlKey: true });
    expect(store.doc.nodes[1]!.x).toBe(6);
  });

  it("Ctrl+Z while typing is left to the field, and letters never switch tools", () => {
    const store = new EditorStore(twoSpanDocument());
    store.setUi({ selection: { kind: "node", id: ids.n1 } });
    render(<Harness store={store} />);
    const input = screen.getByLabelText("Node 2 x (m)");
    fireEvent.change(input, { target: { value: "5" } });
    fireEvent.keyDown(input, { key: "z", ctrlKey: true });
    fireEvent.keyDown(input, { key: "p" });
    fireEvent.keyDown(input, { key: "Delete" });
    expect(store.getState().history.undoStack).toHaveLength(0);
    expect(store.getState().ui.tool).toBe("select");
    expect(store.doc.nodes).toHaveLength(3);
  });
});
