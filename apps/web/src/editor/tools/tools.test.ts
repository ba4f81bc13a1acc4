import { describe, expect, it } from "vitest";
import { ids, twoSpanDocument } from "../commands/testDocument";
import { TestEditor } from "./TestEditor";
import { editLoad } from "../commands/loadCommands";

const xs = (e: TestEditor) => e.store.doc.nodes.map((n) => n.x);

describe("select tool", () => {
  it("selects a node on click without moving it", () => {
    const editor = new TestEditor(twoSpanDocument()).pointerDown(6).pointerUp(6);
    expect(editor.store.getState().ui.selection).toEqual({ kind: "node", id: ids.n1 });
    expect(editor.runner.path).toBe("select.idle");
    expect(editor.store.getState().history.undoStack).toHaveLength(0);
  });

  it("drags a node live, snapped to the grid, as one undo entry", () => {
    const editor = new TestEditor(twoSpanDocument()).pointerDown(6).pointerMove(5.5).pointerMove(5.03);
    expect(editor.runner.path).toBe("select.draggingNode");
    expect(xs(editor)).toEqual([0, 5, 12]);
    editor.pointerUp(5.03);
    expect(editor.store.getState().history.undoStack).toHaveLength(1);
    editor.store.undo();
    expect(xs(editor)).toEqual([0, 6, 12]);
  });

  it("selects but never drags for a read-only role", () => {
    const editor = new TestEditor(twoSpanDocument());
    editor.store.setUi({ canEdit: false });
    editor.pointerDown(6).pointerMove(5.5).pointerMove(5.03).pointerUp(5.03);
    expect(editor.store.getState().ui.selection).toEqual({ kind: "node", id: ids.n1 });
    expect(editor.runner.path).toBe("select.idle");
    expect(xs(editor)).toEqual([0, 6, 12]);
    expect(editor.store.getState().history.undoStack).toHaveLength(0);
  });

  it("drags the end of a distributed load to stretch it", () => {
    const editor = new TestEditor(twoSpanDocument());
    // The block of the test document's line load sits just above the beam; press on its right end.
    const y = 150;
    editor.pointerDown(12, y).pointerMove(11.5, y).pointerMove(10.02, y).pointerUp(10.02, y);
    expect(editor.store.doc.loadCases[0]!.loads[0]).toMatchObject({ x1: 0, x2: 10 });
    expect(editor.store.getState().history.undoStack).toHaveLength(1);
  });

  it("drags a distributed load by its middle keeping its length", () => {
    const editor = new TestEditor(twoSpanDocument());
    editor.store.run((d) => editLoad(d, { loadId: ids.udl, load: { id: ids.udl, type: "distributed", x1: 2, x2: 4, qy1: -3000, qy2: -3000 } }));
    editor.pointerDown(3, 150).pointerMove(4, 150).pointerMove(6, 150).pointerUp(6, 150);
    expect(editor.store.doc.loadCases[0]!.loads[0]).toMatchObject({ x1: 5, x2: 7 });
  });

  it("Escape during a drag puts the node back", () => {
    const editor = new TestEditor(twoSpanDocument()).pointerDown(6).pointerMove(4).cancel();
    expect(xs(editor)).toEqual([0, 6, 12]);
    expect(editor.store.getState().history.undoStack).toHaveLength(0);
  });

  it("clears the selection on empty canvas", () => {
    const editor = new TestEditor(twoSpanDocument()).pointerDown(6).pointerUp(6).pointerDown(3, 5);
    expect(editor.store.getState().ui.selection).toBeNull();
  });
});

describe("placing", () => {
  it("puts a spring on the beam mid-span in one undoable step", () => {
    const editor = new TestEditor(twoSpanDocument());
    editor.store.setUi({ toolOptions: { supportType: "spring", loadType: "point" } });
    editor.setTool("place-support").pointerDown(3.02);
    expect(xs(editor)).toEqual([0, 3, 6, 12]);
    expect(editor.store.doc.nodes[1]!.support).toEqual({ type: "spring", ky: 5e7 });
    editor.store.undo();
    expect(xs(editor)).toEqual([0, 6, 12]);
  });

  it("toggles a hinge on an existing node", () => {
    const editor = new TestEditor(twoSpanDocument()).setTool("place-hinge").pointerDown(6);
    expect(editor.store.doc.nodes[1]!.hinge).toBe(true);
  });

  it("adds a point load to the active case and selects it", () => {
    const editor = new TestEditor(twoSpanDocument());
    editor.store.setUi({ activeCaseId: ids.live });
    editor.setTool("place-load").pointerDown(2.98);
    const loads = editor.store.doc.loadCases[1]!.loads;
    expect(loads).toEqual([{ id: expect.any(String), type: "point", x: 3, fy: -10000 }]);
    expect(editor.store.getState().ui.selection).toEqual({ kind: "load", id: loads[0]!.id });
  });

  it("drags out a distributed load, or fills the span on a click", () => {
    const editor = new TestEditor(twoSpanDocument());
    editor.store.setUi({ activeCaseId: ids.live, toolOptions: { supportType: "pinned", loadType: "distributed" } });
    editor.setTool("place-load").pointerDown(1).pointerMove(2).pointerUp(4);
    editor.pointerDown(8).pointerUp(8);
    expect(editor.store.doc.loadCases[1]!.loads.map((l) => (l.type === "distributed" ? [l.x1, l.x2] : null))).toEqual([
      [1, 4],
      [6, 12],
    ]);
    expect(editor.store.getState().ui.preview).toBeNull();
  });

  it("splits a segment with the split tool", () => {
    const editor = new TestEditor(twoSpanDocument()).setTool("split").pointerDown(9.5);
    expect(xs(editor)).toEqual([0, 6, 9.5, 12]);
  });

  it("pans the camera by the drag distance", () => {
    const editor = new TestEditor(twoSpanDocument()).setTool("pan");
    const before = editor.store.getState().ui.camera.originX;
    editor.pointerDown(2).pointerMove(4).pointerUp(4);
    // World moved right by 2 m, so the left edge now shows 2 m further left.
    expect(editor.store.getState().ui.camera.originX).toBeCloseTo(before - 2, 9);
  });
});
