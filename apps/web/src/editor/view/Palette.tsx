import { useSyncExternalStore } from "react";
import { editorActions } from "../actions/editorActions";
import { formatShortcut, type EditorAction } from "../actions/EditorAction";
import { useEditorStore } from "../store/useEditor";
import type { EditorState } from "../store/EditorStore";

const isMac = typeof navigator !== "undefined" && /Mac|iPhone|iPad/.test(navigator.platform);

/** Whether a tool action is the active tool (its run would change nothing). */
function isActiveTool(action: EditorAction, state: EditorState): boolean {
  const ui = state.ui;
  switch (action.id) {
    case "tool-select":
      return ui.tool === "select";
    case "tool-pan":
      return ui.tool === "pan";
    case "tool-hinge":
      return ui.tool === "place-hinge";
    case "tool-split":
      return ui.tool === "split";
    case "tool-point-load":
      return ui.tool === "place-load" && ui.toolOptions.loadType === "point";
    case "tool-distributed-load":
      return ui.tool === "place-load" && ui.toolOptions.loadType === "distributed";
    case "tool-moment":
      return ui.tool === "place-load" && ui.toolOptions.loadType === "moment";
    default:
      return action.id.startsWith("tool-support-") && ui.tool === "place-support" && action.id === `tool-support-${ui.toolOptions.supportType}`;
  }
}

const shortLabels: Record<string, string> = {
  undo: "Undo",
  redo: "Redo",
  delete: "Delete",
  "tool-select": "Select",
  "tool-pan": "Pan",
  "tool-support-pinned": "Pin",
  "tool-support-fixed": "Fixed",
  "tool-support-guided": "Guided",
  "tool-support-spring": "Spring",
  "tool-hinge": "Hinge",
  "tool-point-load": "Point load",
  "tool-distributed-load": "Line load",
  "tool-moment": "Moment",
  "tool-split": "Split",
  "add-span": "+ Span",
  fit: "Fit",
  "zoom-in": "Zoom +",
  "zoom-out": "Zoom −",
};

/** The toolbar: the same action definitions the keyboard uses, shown as buttons. */
export function Palette() {
  const store = useEditorStore();
  const state = useSyncExternalStore(store.subscribe, store.getState);
  const groups: EditorAction["group"][] = ["edit", "tool", "beam", "view"];
  return (
    <div role="toolbar" aria-label="Beam tools" className="flex flex-wrap items-center gap-1">
      {groups.map((group) => (
        <div key={group} className="flex flex-wrap items-center gap-0.5 border-r border-paper-300 pr-1 last:border-r-0">
          {editorActions
            .filter((a) => a.group === group && shortLabels[a.id])
            .map((a) => {
              const active = isActiveTool(a, state);
              const shortcut = a.shortcuts[0];
              return (
                <button
                  key={a.id}
                  type="button"
                  aria-pressed={a.group === "tool" ? active : undefined}
                  title={shortcut ? `${a.label} (${formatShortcut(shortcut, isMac)})` : a.label}
                  disabled={!a.isEnabled(state)}
                  onClick={() => a.run(store)}
                  className={`rounded-sm px-2 py-1 text-xs font-medium focus:outline-2 focus:outline-ochre-400 disabled:text-paper-400 ${
                    active ? "bg-ink-800 text-paper-50" : "text-ink-800 hover:bg-paper-200"
                  }`}
                >
                  {shortLabels[a.id]}
                </button>
              );
            })}
        </div>
      ))}
    </div>
  );
}
