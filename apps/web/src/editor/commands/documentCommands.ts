import type { BeamDocument, Theory } from "../model/BeamDocument";
import type { UnitSystemId } from "../units/unitSystems";
import { changed, type CommandResult } from "./DocChange";

export function setTitle(doc: BeamDocument, args: { title: string }): CommandResult {
  return changed(doc, "Rename beam", { title: args.title });
}

export function setTheory(doc: BeamDocument, args: { theory: Theory }): CommandResult {
  return changed(doc, "Set beam theory", { theory: args.theory });
}

/** Display units change how values are shown, never the SI values, so the switch is not undoable. */
export function setUnits(doc: BeamDocument, args: { units: UnitSystemId }): CommandResult {
  return changed(doc, "Set units", { units: args.units }, "untracked");
}

/** Replaces the whole document (import, template); undoable like any edit. */
export function replaceDocument(doc: BeamDocument, args: { next: BeamDocument; label: string }): CommandResult {
  const { units: _units, ...rest } = args.next;
  return changed(doc, args.label, rest);
}
