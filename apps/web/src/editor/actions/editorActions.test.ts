import { describe, expect, it } from "vitest";
import { ids, twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "../store/EditorStore";
import { findActionForKey, matchesShortcut, type KeyInput } from "./EditorAction";
import { editorActions, findAction } from "./editorActions";

const key = (k: string, mods: Partial<KeyInput> = {}): KeyInput => ({ key: k, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });

describe("keyboard shortcuts find their action", () => {
  it.each<[string, KeyInput, string]>([
    ["Ctrl+Z", key("z", { ctrlKey: true }), "undo"],
    ["Cmd+Z", key("z", { metaKey: true }), "undo"],
    ["Ctrl+Shift+Z", key("Z", { ctrlKey: true, shiftKey: true }), "redo"],
    ["Ctrl+Y", key("y", { ctrlKey: true }), "redo"],
    ["Delete", key("Delete"), "delete"],
    ["P", key("p"), "tool-support-pinned"],
    ["0", key("0"), "fit"],
    ["Shift+ArrowRight", key("ArrowRight", { shiftKey: true }), "nudge-right-10"],
  ])("%s", (_t, event, id) => {
    expect(findActionForKey(editorActions, event)?.id).toBe(id);
  });

  it("does not fire a plain-letter tool on Ctrl+letter", () => {
    expect(matchesShortcut(key("p", { ctrlKey: true }), { key: "p" })).toBe(false);
  });

  it("has no two actions on the same shortcut", () => {
    const seen = editorActions.flatMap((a) => a.shortcuts.map((s) => `${s.mod}|${s.shift}|${s.key.toLowerCase()}`));
    expect(new Set(seen).size).toBe(seen.length);
  });
});

describe("actions run commands", () => {
  it("Delete removes the selected node and undo brings it back", () => {
    const store = new EditorStore(twoSpanDocument());
    store.setUi({ selection: { kind: "node", id: ids.n1 } });
    findAction("delete").run(store);
    expect(store.doc.nodes).toHaveLength(2);
    expect(store.getState().ui.selection).toBeNull();
    expect(findAction("undo").isEnabled(store.getState())).toBe(true);
    findAction("undo").run(store);
    expect(store.doc.nodes).toHaveLength(3);
  });

  it("arrow keys nudge the selected node by the grid step", () => {
    const store = new EditorStore(twoSpanDocument());
    store.setUi({ selection: { kind: "node", id: ids.n1 }, gridStep: 0.1 });
    findAction("nudge-right-10").run(store);
    findAction("nudge-left").run(store);
    expect(store.doc.nodes[1]!.x).toBe(6.9);
  });

  it("add span repeats the last span length", () => {
    const store = new EditorStore(twoSpanDocument());
    findAction("add-span").run(store);
    expect(store.doc.nodes.map((n) => n.x)).toEqual([0, 6, 12, 18]);
  });

  it("delete is disabled with nothing selected", () => {
    expect(findAction("delete").isEnabled(new EditorStore(twoSpanDocument()).getState())).toBe(false);
  });
});

describe("escape", () => {
  it("returns to the select tool and clears the selection", () => {
    const store = new EditorStore(twoSpanDocument());
    store.setUi({ tool: "place-load", selection: { kind: "node", id: ids.n0 } });
    findActionForKey(editorActions, key("Escape"))!.run(store);
    expect(store.getState().ui.tool).toBe("select");
    expect(store.getState().ui.selection).toBeNull();
  });
});
