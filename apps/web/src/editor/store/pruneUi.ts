import type { BeamDocument } from "../model/BeamDocument";
import { findLoad } from "../model/BeamDocument";
import type { UiState } from "./uiState";

/** Drops UI references to records that no longer exist (after delete or undo of an add). */
export function pruneUi(ui: UiState, doc: BeamDocument): UiState {
  let next = ui;
  const sel = ui.selection;
  if (sel) {
    const exists =
      sel.kind === "node" ? doc.nodes.some((n) => n.id === sel.id)
      : sel.kind === "segment" ? doc.segments.some((s) => s.id === sel.id)
      : sel.kind === "load" ? findLoad(doc, sel.id) !== undefined
      : sel.kind === "case" ? doc.loadCases.some((c) => c.id === sel.id)
      : doc.combinations.some((k) => k.id === sel.id);
    if (!exists) next = { ...next, selection: null };
  }
  if (ui.activeCaseId && !doc.loadCases.some((c) => c.id === ui.activeCaseId)) {
    next = { ...next, activeCaseId: doc.loadCases[0]?.id ?? null };
  } else if (!ui.activeCaseId && doc.loadCases[0]) {
    next = { ...next, activeCaseId: doc.loadCases[0].id };
  }
  const target = ui.resultTarget;
  if (target) {
    const exists =
      target.kind === "case" ? doc.loadCases.some((c) => c.id === target.id)
      : target.id === "*" || doc.combinations.some((k) => k.id === target.id);
    if (!exists) next = { ...next, resultTarget: null };
  }
  return next;
}
