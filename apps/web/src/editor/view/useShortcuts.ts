import { useEffect } from "react";
import { editorActions } from "../actions/editorActions";
import { findActionForKey } from "../actions/EditorAction";
import type { EditorStore } from "../store/EditorStore";

const NON_TEXT_INPUTS = new Set(["checkbox", "radio", "button", "submit", "file"]);

/**
 * Whether a key belongs to the focused control rather than the editor. Text fields keep every
 * key while they hold an uncommitted edit (Ctrl+Z then undoes typing); once committed, Ctrl/Cmd
 * shortcuts (undo, redo) reach the model, so a keyboard user in a table can undo a cell edit.
 * Selects keep plain keys (type-ahead) but pass Ctrl/Cmd shortcuts.
 */
function keyBelongsToControl(e: KeyboardEvent): boolean {
  const target = e.target;
  if (!(target instanceof HTMLElement)) return false;
  const mod = e.ctrlKey || e.metaKey;
  if (target.isContentEditable || target.tagName === "TEXTAREA") return true;
  if (target.tagName === "SELECT") return !mod;
  if (target instanceof HTMLInputElement && !NON_TEXT_INPUTS.has(target.type)) return !mod || target.dataset.pending === "true";
  return false;
}

/** Routes keyboard shortcuts to editor actions unless the focused control owns the key. */
export function useShortcuts(store: EditorStore): void {
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent) => {
      if (e.defaultPrevented || keyBelongsToControl(e)) return;
      const action = findActionForKey(editorActions, e);
      if (!action || !action.isEnabled(store.getState())) return;
      e.preventDefault();
      action.run(store);
    };
    window.addEventListener("keydown", onKeyDown);
    return () => window.removeEventListener("keydown", onKeyDown);
  }, [store]);
}
