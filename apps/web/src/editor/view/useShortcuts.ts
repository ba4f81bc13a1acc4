import { useEffect } from "react";
import { editorActions } from "../actions/editorActions";
import { findActionForKey } from "../actions/EditorAction";
import type { EditorStore } from "../store/EditorStore";

function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ["INPUT", "SELECT", "TEXTAREA"].includes(target.tagName);
}

/** Routes keyboard shortcuts to editor actions, except while the user is typing in a field
 * (there Ctrl+Z belongs to the field's own text undo). */
export function useShortcuts(store: EditorStore): void {
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent) => {
      if (e.defaultPrevented || isTyping(e.target)) return;
      const action = findActionForKey(editorActions, e);
      if (!action || !action.isEnabled(store.getState())) return;
      e.preventDefault();
      action.run(store);
    };
    window.addEventListener("keydown", onKeyDown);
    return () => window.removeEventListener("keydown", onKeyDown);
  }, [store]);
}
