import type { BeamDocument } from "../model/BeamDocument";
import { patchFrom, type DocPatch } from "../model/patch";

/**
 * Whether a change enters the undo history. "undoable" changes do; "untracked" ones (the display
 * unit system, a viewing preference saved with the beam) change the document without an entry.
 */
export type CaptureMode = "undoable" | "untracked";

export interface DocChange {
  readonly label: string;
  readonly capture: CaptureMode;
  readonly patch: DocPatch;
}

export type EditErrorCode = "not-found" | "invalid-position" | "invalid-value" | "duplicate-name" | "last-span";

export interface EditError {
  readonly code: EditErrorCode;
  readonly message: string;
}

export type CommandResult = { readonly ok: true; readonly change: DocChange } | { readonly ok: false; readonly error: EditError };

export function changed(
  doc: BeamDocument,
  label: string,
  changes: Partial<BeamDocument>,
  capture: CaptureMode = "undoable",
): CommandResult {
  return { ok: true, change: { label, capture, patch: patchFrom(doc, changes) } };
}

export function refused(code: EditErrorCode, message: string): CommandResult {
  return { ok: false, error: { code, message } };
}

/** Smallest distance kept between nodes, m; the solver needs strictly increasing x. */
export const MIN_NODE_GAP = 1e-3;

export function isFiniteNumber(value: number): boolean {
  return typeof value === "number" && Number.isFinite(value);
}
