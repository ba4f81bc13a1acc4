import type { BeamDocument, Segment } from "../model/BeamDocument";
import type { SegmentId } from "../model/ids";
import { changed, isFiniteNumber, MIN_NODE_GAP, refused, type CommandResult } from "./DocChange";
import { shiftLoads } from "./loadGeometry";

export type SectionProperties = Partial<Pick<Segment, "E" | "I" | "A" | "G" | "shearFactor">>;

/** Changes a segment's section or material. `undefined` clears an optional property (A, G, κ). */
export function editSegment(doc: BeamDocument, args: { segmentId: SegmentId; props: SectionProperties }): CommandResult {
  const segment = doc.segments.find((s) => s.id === args.segmentId);
  if (!segment) return refused("not-found", "That segment no longer exists.");
  for (const [key, value] of Object.entries(args.props)) {
    const required = key === "E" || key === "I";
    if (value === undefined && !required) continue;
    if (typeof value !== "number" || !isFiniteNumber(value) || value <= 0) {
      return refused("invalid-value", `${key} must be a number above zero.`);
    }
  }
  // Typed stiffness no longer follows from the chosen shape and material, so the section goes.
  const { section: _section, ...plain } = segment;
  const next: Record<string, unknown> = { ...plain, ...args.props };
  for (const key of Object.keys(next)) if (next[key] === undefined) delete next[key];
  return changed(doc, "Edit section", {
    segments: doc.segments.map((s) => (s.id === segment.id ? (next as unknown as Segment) : s)),
  });
}

/** Sets a segment's length by moving every node to its right; loads right of the segment move with
 * them, so the other spans keep their loading. */
export function setSegmentLength(doc: BeamDocument, args: { segmentId: SegmentId; length: number }): CommandResult {
  const index = doc.segments.findIndex((s) => s.id === args.segmentId);
  const left = doc.nodes[index];
  const right = doc.nodes[index + 1];
  if (!left || !right) return refused("not-found", "That segment no longer exists.");
  if (!isFiniteNumber(args.length) || args.length < MIN_NODE_GAP) return refused("invalid-value", "A segment must be longer than 1 mm.");
  const dx = left.x + args.length - right.x;
  if (dx === 0) return changed(doc, "Set length", {});
  const from = right.x;
  return changed(doc, "Set length", {
    nodes: doc.nodes.map((n, i) => (i > index ? { ...n, x: n.x + dx } : n)),
    loadCases: doc.loadCases.map((c) => ({ ...c, loads: shiftLoads(c.loads, dx, from) })),
    stations: doc.stations ? doc.stations.map((s) => (s >= from ? s + dx : s)) : null,
  });
}
