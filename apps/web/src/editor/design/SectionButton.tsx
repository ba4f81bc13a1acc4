import { Suspense, useState } from "react";
import { SHAPE_LABELS } from "../../design/shapeFields";
import type { SegmentId } from "../model/ids";
import { useEditor } from "../store/useEditor";
import { SectionDialog } from "./lazyDesign";

export interface SectionButtonProps {
  readonly segmentId: SegmentId;
  /** 1-based, for labels. */
  readonly number: number;
  readonly className?: string;
}

/** "Section…": a shape and a material for the segment (or every segment), setting E, I, A, G, κ. */
export function SectionButton({ segmentId, number, className }: SectionButtonProps) {
  const [open, setOpen] = useState(false);
  const section = useEditor((s) => s.history.doc.segments.find((g) => g.id === segmentId)?.section);
  return (
    <>
      <button type="button" className={className} aria-label={`Section of segment ${number}`} onClick={() => setOpen(true)}>
        {section ? `${SHAPE_LABELS[section.shape.kind]}, ${section.material.name}` : "Section…"}
      </button>
      {open && (
        <Suspense fallback={null}>
          <SectionDialog segmentId={segmentId} number={number} onClose={() => setOpen(false)} />
        </Suspense>
      )}
    </>
  );
}
