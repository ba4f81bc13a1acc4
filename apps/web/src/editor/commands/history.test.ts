import { describe, expect, it } from "vitest";
import type { BeamDocument } from "../model/BeamDocument";
import type { CommandResult, DocChange } from "./DocChange";
import { setUnits } from "./documentCommands";
import { addSpan, moveNode, toggleHinge } from "./nodeCommands";
import { applyChange, beginInteraction, cancelInteraction, canRedo, canUndo, commitInteraction, createHistory, isDirty, markSaved, redo, undo, type EditorHistory } from "./history";
import { ids, twoSpanDocument } from "./testDocument";

function change(result: CommandResult): DocChange {
  if (!result.ok) throw new Error(result.error.message);
  return result.change;
}
const apply = (h: EditorHistory, make: (d: BeamDocument) => CommandResult) => applyChange(h, change(make(h.doc)));
const xs = (h: EditorHistory) => h.doc.nodes.map((n) => n.x);

describe("undo and redo", () => {
  it.each<[string, (d: BeamDocument) => CommandResult]>([
    ["addSpan", (d) => addSpan(d, { length: 4 })],
    ["moveNode", (d) => moveNode(d, { nodeId: ids.n1, x: 5 })],
    ["toggleHinge", (d) => toggleHinge(d, { nodeId: ids.n1 })],
  ])("%s: undo restores the previous document exactly, redo reapplies it", (_t, make) => {
    const start = createHistory(twoSpanDocument());
    const edited = apply(start, make);
    const undone = undo(edited);
    expect(undone.doc).toEqual(start.doc);
    expect(undone.doc.nodes).toBe(start.doc.nodes); // the same arrays come back, not copies
    expect(redo(undone).doc).toEqual(edited.doc);
  });

  it("steps back through several edits in order and a new edit clears redo", () => {
    let h = createHistory(twoSpanDocument());
    h = apply(h, (d) => moveNode(d, { nodeId: ids.n1, x: 5 }));
    h = apply(h, (d) => moveNode(d, { nodeId: ids.n1, x: 4 }));
    h = undo(h);
    expect(xs(h)).toEqual([0, 5, 12]);
    h = undo(h);
    expect(xs(h)).toEqual([0, 6, 12]);
    expect(canUndo(h)).toBe(false);
    h = redo(h);
    h = apply(h, (d) => toggleHinge(d, { nodeId: ids.n1 }));
    expect(canRedo(h)).toBe(false);
  });

  it("records a drag as one entry however many moves it had", () => {
    let h = beginInteraction(createHistory(twoSpanDocument()), "Move node");
    for (const x of [5.5, 5, 4.5, 4]) h = apply(h, (d) => moveNode(d, { nodeId: ids.n1, x }));
    expect(xs(h)).toEqual([0, 4, 12]);
    expect(canUndo(h)).toBe(false); // nothing undoable until release
    h = commitInteraction(h);
    expect(h.undoStack).toHaveLength(1);
    expect(xs(undo(h))).toEqual([0, 6, 12]);
  });

  it("a cancelled drag leaves no trace", () => {
    let h = createHistory(twoSpanDocument());
    const start = h.doc;
    h = beginInteraction(h, "Move node");
    h = apply(h, (d) => moveNode(d, { nodeId: ids.n1, x: 4 }));
    h = cancelInteraction(h);
    expect(h.doc.nodes).toBe(start.nodes);
    expect(h.undoStack).toHaveLength(0);
    expect(isDirty(h)).toBe(false);
  });

  it("untracked changes do not enter the history", () => {
    const h = apply(createHistory(twoSpanDocument()), (d) => setUnits(d, { units: "us" }));
    expect(h.doc.units).toBe("us");
    expect(h.undoStack).toHaveLength(0);
  });
});

describe("dirty tracking", () => {
  it("is dirty after an edit, clean after undoing back to the saved state", () => {
    let h = createHistory(twoSpanDocument());
    expect(isDirty(h)).toBe(false);
    h = apply(h, (d) => toggleHinge(d, { nodeId: ids.n1 }));
    expect(isDirty(h)).toBe(true);
    expect(isDirty(undo(h))).toBe(false);
  });

  it("is clean when a value is typed back to what was saved", () => {
    let h = createHistory(twoSpanDocument());
    h = apply(h, (d) => moveNode(d, { nodeId: ids.n1, x: 5 }));
    h = apply(h, (d) => moveNode(d, { nodeId: ids.n1, x: 6 }));
    expect(isDirty(h)).toBe(false);
  });

  it("switching display units alone leaves nothing to save", () => {
    const h = apply(createHistory(twoSpanDocument()), (d) => setUnits(d, { units: "us" }));
    expect(isDirty(h)).toBe(false);
  });

  it("compares against the last save, not the first load", () => {
    let h = apply(createHistory(twoSpanDocument()), (d) => toggleHinge(d, { nodeId: ids.n1 }));
    h = markSaved(h);
    expect(isDirty(h)).toBe(false);
    expect(isDirty(undo(h))).toBe(true);
  });
});
