import { valuesAt, type Analysis } from "@spanwright/solver";
import { SectionView } from "../../design";
import { QuantityInput } from "../fields/QuantityInput";
import type { BeamDocument } from "../model/BeamDocument";
import { formatQuantity } from "../units/formatQuantity";
import { beamSection, segmentIndexAt } from "./beamSection";

export interface SectionAtCursorProps {
  readonly doc: BeamDocument;
  readonly analysis: Analysis;
  /** Engine id of the case or combination shown; null for an envelope (no single V, M at x). */
  readonly name: string | null;
  readonly x: number | null;
  readonly onX: (x: number) => void;
}

/**
 * The cross-section at x (picked on the diagrams or typed): strain and stress through the depth
 * from V, M and rz read from the worker's analysis, for the section of the segment at x.
 */
export function SectionAtCursor({ doc, analysis, name, x, onX }: SectionAtCursorProps) {
  const x0 = doc.nodes[0]?.x ?? 0;
  const xEnd = doc.nodes[doc.nodes.length - 1]?.x ?? 0;
  const at = x === null ? null : Math.min(Math.max(x, x0), xEnd);
  const index = at === null ? -1 : segmentIndexAt(doc, at);
  const section = index >= 0 ? doc.segments[index]?.section : undefined;
  const values = at !== null && name ? valuesAt(analysis, name, at, at >= xEnd ? "left" : "right") : undefined;
  const fallback = beamSection(doc);

  return (
    <section aria-label="Section at x" className="space-y-2 rounded-md border border-paper-300 p-3">
      <div className="flex flex-wrap items-center gap-3">
        <h3 className="text-sm font-semibold text-ink-900">Section at x</h3>
        <label className="flex items-center gap-1 text-sm">
          <span className="text-paper-700">x</span>
          <QuantityInput label="Section view x" value={at ?? undefined} kind="position" units={doc.units} onCommit={(v) => (v < x0 || v > xEnd ? false : onX(v))} className="w-28" />
        </label>
        <span className="text-xs text-paper-600">Click a diagram or type x.</span>
      </div>
      {at === null ? null : !name ? (
        <p className="text-sm text-paper-600">Pick one load case or combination above: an envelope has no single moment at x.</p>
      ) : !section ? (
        <p className="text-sm text-paper-600">
          Segment {index + 1} has no section yet{fallback ? ` (segment ${fallback.index + 1} has one)` : ""}: use “Section…” in the Segments table.
        </p>
      ) : values ? (
        <SectionView
          shape={section.shape}
          E={section.material.E}
          {...(section.material.G !== undefined ? { G: section.material.G } : {})}
          M={values.M}
          V={values.V}
          rz={values.rz}
          theory={doc.theory}
          units={doc.units}
          x={at}
        />
      ) : (
        <p className="text-sm text-paper-600">No result at x = {formatQuantity(at, doc.units, "position")}.</p>
      )}
    </section>
  );
}
