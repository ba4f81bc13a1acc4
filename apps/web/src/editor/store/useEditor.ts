import { createContext, useContext, useSyncExternalStore } from "react";
import type { EditorState, EditorStore } from "./EditorStore";

export const EditorStoreContext = createContext<EditorStore | null>(null);

export function useEditorStore(): EditorStore {
  const store = useContext(EditorStoreContext);
  if (!store) throw new Error("useEditorStore outside the beam editor");
  return store;
}

/** Subscribes to a slice of editor state; the selector must return stable references. */
export function useEditor<T>(selector: (state: EditorState) => T): T {
  const store = useEditorStore();
  return useSyncExternalStore(store.subscribe, () => selector(store.getState()));
}
