import type { BeamDocument } from "./BeamDocument";

/**
 * A change to the document as the before and after values of the top-level fields it touches.
 * Collections are immutable arrays, so a patch holds two references per field rather than copies;
 * the inverse is the swap, and undoing restores the very arrays that were there before, which is
 * what dirty tracking compares against.
 */
export interface DocPatch {
  readonly before: Partial<BeamDocument>;
  readonly after: Partial<BeamDocument>;
}

export function applyPatch(doc: BeamDocument, patch: DocPatch): BeamDocument {
  return { ...doc, ...patch.after };
}

export function invertPatch(patch: DocPatch): DocPatch {
  return { before: patch.after, after: patch.before };
}

/** A patch taking `doc` to `doc` with `changes`. Fields whose value is unchanged (the same object,
 * or equal data, as when a cell commits the value it already had) are left out, so no-op edits
 * add no undo entries. */
export function patchFrom(doc: BeamDocument, changes: Partial<BeamDocument>): DocPatch {
  const before: Record<string, unknown> = {};
  const after: Record<string, unknown> = {};
  for (const key of Object.keys(changes) as (keyof BeamDocument)[]) {
    if (changes[key] === doc[key] || deepEqual(changes[key], doc[key])) continue;
    before[key] = doc[key];
    after[key] = changes[key];
  }
  return { before: before as Partial<BeamDocument>, after: after as Partial<BeamDocument> };
}

export function isEmptyPatch(patch: DocPatch): boolean {
  return Object.keys(patch.after).length === 0;
}

/** Structural equality for plain JSON-like data (documents hold no functions, dates or cycles). */
export function deepEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== "object" || typeof b !== "object" || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined);
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined);
  if (ka.length !== kb.length) return false;
  return ka.every((k) => deepEqual((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
}
