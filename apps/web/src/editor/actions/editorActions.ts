import { addCombination, addLoadCase, deleteCombination, deleteLoadCase } from "../commands/caseCommands";
import { canRedo, canUndo } from "../commands/history";
import { deleteLoad, moveLoad } from "../commands/loadCommands";
import { addSpan, deleteNode, moveNode, splitSpan, toggleHinge } from "../commands/nodeCommands";
import { fitCamera, zoomAt } from "../geometry/camera";
import { snapToGrid } from "../geometry/snapping";
import { findLoad, findNode, type SupportType } from "../model/BeamDocument";
import type { EditorState, EditorStore } from "../store/EditorStore";
import type { ToolOptions } from "../store/uiState";
import type { EditorAction } from "./EditorAction";

const always = () => true;
const selectionKind = (s: EditorState) => s.ui.selection?.kind;

/** The one role check of the editor: viewers and checkers read the beam but change nothing. */
export const canEditBeam = (s: EditorState): boolean => s.ui.canEdit;

/** An action that changes the beam: enabled only when the role may edit and its own predicate holds. */
function editing(action: EditorAction): EditorAction {
  const own = action.isEnabled;
  return { ...action, isEnabled: (s) => canEditBeam(s) && own(s) };
}

function fit(store: EditorStore): void {
  const { doc } = store;
  const { viewportWidth } = store.getState().ui;
  store.setUi({ camera: fitCamera(doc.nodes[0]?.x ?? 0, doc.nodes[doc.nodes.length - 1]?.x ?? 1, viewportWidth) });
}

function deleteSelection(store: EditorStore): void {
  const sel = store.getState().ui.selection;
  if (!sel) return;
  switch (sel.kind) {
    case "node":
      store.run((d) => deleteNode(d, { nodeId: sel.id }));
      return;
    case "load":
      store.run((d) => deleteLoad(d, { loadId: sel.id }));
      return;
    case "case":
      store.run((d) => deleteLoadCase(d, { caseId: sel.id }));
      return;
    case "combination":
      store.run((d) => deleteCombination(d, { combinationId: sel.id }));
      return;
    case "segment":
      return;
  }
}

/** Moves the selected node or load by whole grid steps (keyboard-only editing). */
function nudge(store: EditorStore, steps: number): void {
  const { selection, gridStep } = store.getState().ui;
  const doc = store.doc;
  if (selection?.kind === "node") {
    const node = findNode(doc, selection.id);
    if (node) store.run((d) => moveNode(d, { nodeId: node.id, x: snapToGrid(node.x + steps * gridStep, gridStep) }));
  } else if (selection?.kind === "load") {
    const found = findLoad(doc, selection.id);
    if (!found || found.load.type === "settlement") return;
    const start = found.load.type === "distributed" ? found.load.x1 : found.load.x;
    store.run((d) => moveLoad(d, { loadId: selection.id, x: snapToGrid(start + steps * gridStep, gridStep) }));
  }
}

function uniqueName(store: EditorStore, prefix: string): string {
  const taken = new Set([...store.doc.loadCases, ...store.doc.combinations].map((r) => r.name));
  for (let i = 1; ; i++) if (!taken.has(`${prefix}${i}`)) return `${prefix}${i}`;
}

/** Select and pan only look; every other tool places or splits, so it needs edit rights. */
function toolAction(id: string, label: string, key: string, tool: EditorState["ui"]["tool"], options?: Partial<ToolOptions>): EditorAction {
  const onlyLooks = tool === "select" || tool === "pan";
  return {
    id,
    label,
    group: "tool",
    shortcuts: [{ key }],
    isEnabled: onlyLooks ? always : canEditBeam,
    run: (store) => store.updateUi((ui) => ({ tool, toolOptions: { ...ui.toolOptions, ...options } })),
  };
}

const supportTool = (type: SupportType, label: string, key: string) =>
  toolAction(`tool-support-${type}`, `Place ${label} support`, key, "place-support", { supportType: type });

export const editorActions: readonly EditorAction[] = [
  editing({ id: "undo", label: "Undo", group: "edit", shortcuts: [{ key: "z", mod: true }], isEnabled: (s) => canUndo(s.history), run: (st) => st.undo() }),
  editing({
    id: "redo",
    label: "Redo",
    group: "edit",
    shortcuts: [{ key: "z", mod: true, shift: true }, { key: "y", mod: true }],
    isEnabled: (s) => canRedo(s.history),
    run: (st) => st.redo(),
  }),
  editing({
    id: "delete",
    label: "Delete selected",
    group: "edit",
    shortcuts: [{ key: "Delete" }, { key: "Backspace" }],
    isEnabled: (s) => !!selectionKind(s) && selectionKind(s) !== "segment",
    run: deleteSelection,
  }),
  editing({ id: "nudge-left", label: "Move selected left one grid step", group: "edit", shortcuts: [{ key: "ArrowLeft", shift: false }], isEnabled: (s) => selectionKind(s) === "node" || selectionKind(s) === "load", run: (st) => nudge(st, -1) }),
  editing({ id: "nudge-right", label: "Move selected right one grid step", group: "edit", shortcuts: [{ key: "ArrowRight", shift: false }], isEnabled: (s) => selectionKind(s) === "node" || selectionKind(s) === "load", run: (st) => nudge(st, 1) }),
  editing({ id: "nudge-left-10", label: "Move selected left ten grid steps", group: "edit", shortcuts: [{ key: "ArrowLeft", shift: true }], isEnabled: (s) => selectionKind(s) === "node" || selectionKind(s) === "load", run: (st) => nudge(st, -10) }),
  editing({ id: "nudge-right-10", label: "Move selected right ten grid steps", group: "edit", shortcuts: [{ key: "ArrowRight", shift: true }], isEnabled: (s) => selectionKind(s) === "node" || selectionKind(s) === "load", run: (st) => nudge(st, 10) }),
  {
    id: "escape",
    label: "Back to select, clear the selection",
    group: "edit",
    shortcuts: [{ key: "Escape" }],
    isEnabled: (s) => s.ui.selection !== null || s.ui.tool !== "select" || s.ui.notice !== null,
    run: (store) => store.setUi({ tool: "select", selection: null, preview: null, notice: null }),
  },
  toolAction("tool-select", "Select and move", "v", "select"),
  toolAction("tool-pan", "Pan", "h", "pan"),
  supportTool("pinned", "pinned", "p"),
  supportTool("fixed", "fixed", "f"),
  supportTool("guided", "guided", "g"),
  supportTool("spring", "spring", "k"),
  toolAction("tool-hinge", "Place hinge", "i", "place-hinge"),
  toolAction("tool-point-load", "Place point load", "l", "place-load", { loadType: "point" }),
  toolAction("tool-distributed-load", "Place distributed load", "u", "place-load", { loadType: "distributed" }),
  toolAction("tool-moment", "Place applied moment", "m", "place-load", { loadType: "moment" }),
  toolAction("tool-split", "Split a span", "s", "split"),
  editing({
    id: "add-span",
    label: "Add span at right end",
    group: "beam",
    shortcuts: [{ key: "a" }],
    isEnabled: always,
    run: (store) => {
      const n = store.doc.nodes;
      const last = n.length >= 2 ? n[n.length - 1]!.x - n[n.length - 2]!.x : 6;
      if (store.run((d) => addSpan(d, { length: last }))) fit(store);
    },
  }),
  editing({
    id: "split-selected",
    label: "Split selected segment at its middle",
    group: "beam",
    shortcuts: [{ key: "s", shift: true }],
    isEnabled: (s) => selectionKind(s) === "segment",
    run: (store) => {
      const sel = store.getState().ui.selection;
      if (sel?.kind !== "segment") return;
      const i = store.doc.segments.findIndex((s) => s.id === sel.id);
      const a = store.doc.nodes[i]?.x ?? 0;
      const b = store.doc.nodes[i + 1]?.x ?? 0;
      store.run((d) => splitSpan(d, { segmentId: sel.id, x: snapToGrid((a + b) / 2, store.getState().ui.gridStep) }));
    },
  }),
  editing({
    id: "toggle-hinge",
    label: "Toggle hinge at selected node",
    group: "beam",
    shortcuts: [{ key: "i", shift: true }],
    isEnabled: (s) => selectionKind(s) === "node",
    run: (store) => {
      const sel = store.getState().ui.selection;
      if (sel?.kind === "node") store.run((d) => toggleHinge(d, { nodeId: sel.id }));
    },
  }),
  editing({
    id: "add-load-case",
    label: "Add load case",
    group: "beam",
    shortcuts: [],
    isEnabled: always,
    run: (store) => {
      store.run((d) => addLoadCase(d, { name: uniqueName(store, "LC"), category: "other" }));
    },
  }),
  editing({
    id: "add-combination",
    label: "Add combination",
    group: "beam",
    shortcuts: [],
    isEnabled: (s) => s.history.doc.loadCases.length > 0,
    run: (store) => {
      const factors = store.doc.loadCases.map((c) => ({ caseId: c.id, factor: 1 }));
      store.run((d) => addCombination(d, { name: uniqueName(store, "C"), factors }));
    },
  }),
  { id: "fit", label: "Fit beam to view", group: "view", shortcuts: [{ key: "0" }], isEnabled: always, run: fit },
  {
    id: "zoom-in",
    label: "Zoom in",
    group: "view",
    shortcuts: [{ key: "=" }, { key: "+" }],
    isEnabled: always,
    run: (store) => store.updateUi((ui) => ({ camera: zoomAt(ui.camera, 1.25, ui.viewportWidth / 2) })),
  },
  {
    id: "zoom-out",
    label: "Zoom out",
    group: "view",
    shortcuts: [{ key: "-" }],
    isEnabled: always,
    run: (store) => store.updateUi((ui) => ({ camera: zoomAt(ui.camera, 0.8, ui.viewportWidth / 2) })),
  },
];

export function findAction(id: string): EditorAction {
  const action = editorActions.find((a) => a.id === id);
  if (!action) throw new Error(`no editor action ${id}`);
  return action;
}
