import {
  sectionProperties,
  segmentStiffness,
  type GeneratedCombination,
  type Material,
  type SectionShape,
  type SegmentStiffness,
} from "@spanwright/solver/design";
import type { BeamDocument, Combination, CombinationFactor, Segment } from "../model/BeamDocument";
import { createCombinationId, type SegmentId } from "../model/ids";
import { changed, refused, type CommandResult } from "./DocChange";

/**
 * The stiffness a section and material give a segment. A, G and κ are filled whenever the section
 * and material allow, even under Euler-Bernoulli, so switching the beam to Timoshenko later needs
 * no second trip to the section editor; only Timoshenko insists on them.
 */
function stiffnessOf(doc: BeamDocument, shape: SectionShape, material: Material): { ok: true; value: SegmentStiffness } | { ok: false; message: string } {
  const props = sectionProperties(shape);
  if (!props.ok) return { ok: false, message: `Section: ${props.error.message}` };
  const full = segmentStiffness(props.value, material, "timoshenko");
  if (full.ok) return full;
  if (doc.theory === "timoshenko") return { ok: false, message: full.error.message };
  const bending = segmentStiffness(props.value, material, "euler-bernoulli");
  return bending.ok ? bending : { ok: false, message: bending.error.message };
}

/**
 * Gives the segments a section and material and sets their E, I, A, G and κ from them
 * (`segmentStiffness`); one undo step however many segments.
 */
export function setSegmentSection(
  doc: BeamDocument,
  args: { segmentIds: readonly SegmentId[]; shape: SectionShape; material: Material },
): CommandResult {
  if (args.segmentIds.length === 0) return refused("not-found", "Select a segment first.");
  const targets = new Set(args.segmentIds);
  if (!args.segmentIds.every((id) => doc.segments.some((s) => s.id === id))) return refused("not-found", "That segment no longer exists.");
  const stiffness = stiffnessOf(doc, args.shape, args.material);
  if (!stiffness.ok) return refused("invalid-value", stiffness.message);
  const section = { shape: args.shape, material: args.material };
  const segments = doc.segments.map((s): Segment => (targets.has(s.id) ? { id: s.id, ...stiffness.value, section } : s));
  return changed(doc, args.segmentIds.length > 1 ? "Set section of segments" : "Set section", { segments });
}

/**
 * Adds combinations from the code generator (factors keyed by case name, as in the exchange
 * format) in one undo step. Refuses all of them if one name is taken or names a missing case, so
 * a half-applied preset never lands in the beam.
 */
export function addCombinations(doc: BeamDocument, args: { combinations: readonly GeneratedCombination[] }): CommandResult {
  if (args.combinations.length === 0) return refused("invalid-value", "There are no combinations to add.");
  const caseByName = new Map(doc.loadCases.map((c) => [c.name, c.id]));
  const taken = new Set([...doc.loadCases.map((c) => c.name), ...doc.combinations.map((k) => k.name)]);
  const added: Combination[] = [];
  for (const g of args.combinations) {
    const name = g.id.trim();
    if (name === "" || name === "*" || taken.has(name)) return refused("duplicate-name", `“${name}” is already used by a load case or combination.`);
    taken.add(name);
    const factors: CombinationFactor[] = [];
    for (const [caseName, factor] of Object.entries(g.factors)) {
      const caseId = caseByName.get(caseName);
      if (!caseId) return refused("invalid-value", `No load case named “${caseName}”.`);
      if (!Number.isFinite(factor)) return refused("invalid-value", "Factors must be numbers.");
      factors.push({ caseId, factor });
    }
    added.push({ id: createCombinationId(), name, factors });
  }
  return changed(doc, `Add ${added.length} combinations`, { combinations: [...doc.combinations, ...added] });
}
