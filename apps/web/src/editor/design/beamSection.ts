import type { BeamDocument, SegmentSection } from "../model/BeamDocument";
import type { SegmentId } from "../model/ids";

/**
 * The section the checks and the section view use: the given segment's if it has one, else the
 * first segment with a section. The checks take one section for the whole beam; the checks panel
 * warns when other segments' I differ from it.
 */
export function beamSection(doc: BeamDocument, preferred?: SegmentId | null): { section: SegmentSection; index: number } | null {
  const wanted = preferred ? doc.segments.findIndex((s) => s.id === preferred && s.section) : -1;
  const index = wanted >= 0 ? wanted : doc.segments.findIndex((s) => s.section);
  const section = doc.segments[index]?.section;
  return section ? { section, index } : null;
}

/** Index of the segment containing x (m); at a node, the segment to its right, except at the end. */
export function segmentIndexAt(doc: BeamDocument, x: number): number {
  const last = doc.segments.length - 1;
  for (let i = 0; i < last; i++) if (x < doc.nodes[i + 1]!.x) return i;
  return Math.max(0, last);
}
