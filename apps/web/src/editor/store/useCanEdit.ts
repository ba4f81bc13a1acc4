import { canEditBeam } from "../actions/editorActions";
import { useEditor } from "./useEditor";

/** Whether the open beam may be changed by this user (the same predicate the actions use). */
export function useCanEdit(): boolean {
  return useEditor(canEditBeam);
}
