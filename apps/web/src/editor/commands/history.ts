import type { BeamDocument } from "../model/BeamDocument";
import { applyPatch, deepEqual, invertPatch, isEmptyPatch, type DocPatch } from "../model/patch";
import type { DocChange } from "./DocChange";

export interface HistoryEntry {
  readonly label: string;
  readonly patch: DocPatch;
}

/** An interaction in progress (a drag): changes apply live; `before` keeps each touched field's
 * value from when it started so the whole drag becomes one entry, or is reverted on cancel. */
interface Interaction {
  readonly label: string;
  readonly before: Partial<BeamDocument>;
}

export interface EditorHistory {
  readonly doc: BeamDocument;
  readonly undoStack: readonly HistoryEntry[];
  readonly redoStack: readonly HistoryEntry[];
  readonly interaction: Interaction | null;
  /** The document as last saved (or loaded); dirty means different from this. */
  readonly saved: BeamDocument;
}

const MAX_ENTRIES = 200;

export function createHistory(doc: BeamDocument): EditorHistory {
  return { doc, undoStack: [], redoStack: [], interaction: null, saved: doc };
}

export function applyChange(h: EditorHistory, change: DocChange): EditorHistory {
  if (isEmptyPatch(change.patch)) return h;
  const doc = applyPatch(h.doc, change.patch);
  if (change.capture === "untracked") return { ...h, doc };
  if (h.interaction) {
    const before: Record<string, unknown> = { ...h.interaction.before };
    for (const [key, value] of Object.entries(change.patch.before)) if (!(key in before)) before[key] = value;
    return { ...h, doc, interaction: { ...h.interaction, before: before as Partial<BeamDocument> } };
  }
  const entry: HistoryEntry = { label: change.label, patch: change.patch };
  return { ...h, doc, undoStack: [...h.undoStack, entry].slice(-MAX_ENTRIES), redoStack: [] };
}

/** Starts a drag; nothing is recorded until it ends. */
export function beginInteraction(h: EditorHistory, label: string): EditorHistory {
  if (h.interaction) return h;
  return { ...h, interaction: { label, before: {} } };
}

/** Ends a drag, folding every live change into one undo entry. */
export function commitInteraction(h: EditorHistory): EditorHistory {
  if (!h.interaction) return h;
  const before = h.interaction.before;
  const after: Record<string, unknown> = {};
  for (const key of Object.keys(before) as (keyof BeamDocument)[]) after[key] = h.doc[key];
  const unchanged = Object.keys(before).every((k) => before[k as keyof BeamDocument] === after[k]);
  if (unchanged) return { ...h, interaction: null };
  const entry: HistoryEntry = { label: h.interaction.label, patch: { before, after: after as Partial<BeamDocument> } };
  return { ...h, interaction: null, undoStack: [...h.undoStack, entry].slice(-MAX_ENTRIES), redoStack: [] };
}

/** Abandons a drag (Escape), restoring the document as it was when the drag began. */
export function cancelInteraction(h: EditorHistory): EditorHistory {
  if (!h.interaction) return h;
  return { ...h, doc: { ...h.doc, ...h.interaction.before }, interaction: null };
}

export function canUndo(h: EditorHistory): boolean {
  return h.undoStack.length > 0 && !h.interaction;
}

export function canRedo(h: EditorHistory): boolean {
  return h.redoStack.length > 0 && !h.interaction;
}

export function undo(h: EditorHistory): EditorHistory {
  const entry = h.undoStack[h.undoStack.length - 1];
  if (!entry || h.interaction) return h;
  return {
    ...h,
    doc: applyPatch(h.doc, invertPatch(entry.patch)),
    undoStack: h.undoStack.slice(0, -1),
    redoStack: [...h.redoStack, entry],
  };
}

export function redo(h: EditorHistory): EditorHistory {
  const entry = h.redoStack[h.redoStack.length - 1];
  if (!entry || h.interaction) return h;
  return {
    ...h,
    doc: applyPatch(h.doc, entry.patch),
    undoStack: [...h.undoStack, entry],
    redoStack: h.redoStack.slice(0, -1),
  };
}

/** Compares field by field: identical references (after undo) are cheap; edits that were typed
 * back to the saved value compare equal structurally. Display units are not part of the saved
 * exchange model, so switching them alone leaves nothing to save. */
export function isDirty(h: EditorHistory): boolean {
  if (h.doc === h.saved) return false;
  return (Object.keys(h.doc) as (keyof BeamDocument)[]).some(
    (k) => k !== "units" && h.doc[k] !== h.saved[k] && !deepEqual(h.doc[k], h.saved[k]),
  );
}

export function markSaved(h: EditorHistory, saved: BeamDocument = h.doc): EditorHistory {
  return { ...h, saved };
}

/** Starts over on another document (reload after a conflict), dropping history. */
export function resetHistory(doc: BeamDocument): EditorHistory {
  return createHistory(doc);
}
