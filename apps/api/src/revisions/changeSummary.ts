import { diffModels, summariseModelDiff, type BeamModel, type UnitSystem } from "@spanwright/handoff";

/** The column holds at most this much (the request schema's limit for a typed note). */
const MAX_SUMMARY = 2000;

/**
 * A revision's change summary: the lines of the model diff against the revision it was edited
 * from ("L: +2 kN/m on span 2"), after the author's note when there is one. Generated on the
 * server so the history never depends on what a client chose to write.
 */
export function summariseRevisionChange(before: BeamModel | null, after: BeamModel, units: UnitSystem, note: string): string {
  const lines = before ? summariseModelDiff(diffModels(before, after), units) : [];
  const generated = before ? (lines.length > 0 ? lines.join("; ") : "no model changes") : "";
  const trimmedNote = note.trim();
  const text = trimmedNote && generated ? `${trimmedNote}: ${generated}` : trimmedNote || generated;
  return text.length > MAX_SUMMARY ? `${text.slice(0, MAX_SUMMARY - 1)}…` : text;
}
