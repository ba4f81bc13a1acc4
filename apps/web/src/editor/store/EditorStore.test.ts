import { describe, expect, it } from "vitest";
import { addSpan, moveNode } from "../commands/nodeCommands";
import { createNodeId } from "../model/ids";
import { ids, twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "./EditorStore";

describe("EditorStore", () => {
  it("shows why a command was refused and clears the notice on the next edit", () => {
    const store = new EditorStore(twoSpanDocument());
    expect(store.run((d) => moveNode(d, { nodeId: ids.n1, x: 20 }))).toBe(false);
    expect(store.getState().ui.notice).toEqual({ tone: "error", text: "A node cannot pass its neighbours." });
    store.run((d) => moveNode(d, { nodeId: ids.n1, x: 5 }));
    expect(store.getState().ui.notice).toBeNull();
  });

  it("drops a selection whose record an undo removed", () => {
    const store = new EditorStore(twoSpanDocument());
    const nodeId = createNodeId("added");
    store.run((d) => addSpan(d, { length: 3, nodeId }));
    store.setUi({ selection: { kind: "node", id: nodeId } });
    store.undo();
    expect(store.getState().ui.selection).toBeNull();
  });

  it("notifies subscribers once per change", () => {
    const store = new EditorStore(twoSpanDocument());
    let calls = 0;
    store.subscribe(() => (calls += 1));
    store.run((d) => moveNode(d, { nodeId: ids.n1, x: 5 }));
    store.undo();
    expect(calls).toBe(2);
  });

  it("replace opens another document clean, without history", () => {
    const store = new EditorStore(twoSpanDocument());
    store.run((d) => moveNode(d, { nodeId: ids.n1, x: 5 }));
    store.replace(twoSpanDocument());
    expect(store.getState().history.undoStack).toHaveLength(0);
    expect(store.doc.nodes[1]!.x).toBe(6);
  });
});
