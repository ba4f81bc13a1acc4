import { useCallback, useMemo } from "react";
import type { Analysis } from "@spanwright/solver";
import type { ResultLike } from "@spanwright/solver/design";
import { ChecksPanel, stationsForChecks } from "../../design";
import type { BeamDocument } from "../model/BeamDocument";
import { toExchange } from "../model/exchange";
import { resultAtStations, resultIds } from "../results/checkResult";
import type { SegmentId } from "../model/ids";
import { beamSection } from "./beamSection";

export interface EditorChecksProps {
  readonly doc: BeamDocument;
  readonly analysis: Analysis;
  /** The selected segment, whose section is checked if it has one. */
  readonly segmentId?: SegmentId | null;
}

/**
 * The member checks on the open beam, fed by the worker's analysis: the stations the checks need
 * (span ends, braces, quarter points) are read from it, so the editor never solves on the main thread.
 */
export function EditorChecks({ doc, analysis, segmentId = null }: EditorChecksProps) {
  const { nodes, segments, loadCases, combinations, theory, stations } = doc;
  const model = useMemo(
    () => toExchange({ title: "", units: "si", nodes, segments, loadCases, combinations, theory, stations }),
    [nodes, segments, loadCases, combinations, theory, stations],
  );
  const ids = useMemo(() => resultIds(analysis), [analysis]);
  const result = useMemo(() => resultAtStations(analysis, ids, stationsForChecks(model, null)), [analysis, ids, model]);
  // Asked for when the user sets Lb and the checks need brace and quarter points the result lacks.
  const readStations = useCallback(
    (asked: unknown): ResultLike => resultAtStations(analysis, ids, (asked as { stations?: readonly number[] }).stations ?? []),
    [analysis, ids],
  );
  const chosen = beamSection(doc, segmentId);
  if (!chosen) {
    return (
      <p className="p-3 text-sm text-paper-700">
        Choose a section and material for the beam first: “Section…” in the Segments table or the segment inspector.
      </p>
    );
  }
  return (
    <div className="space-y-2 p-3">
      <p className="text-xs text-paper-600">
        Checking the section of segment {chosen.index + 1}: {chosen.section.material.name}.
      </p>
      <ChecksPanel
        key={ids.join("\u0000")}
        model={model}
        result={result}
        units={doc.units}
        shape={chosen.section.shape}
        material={chosen.section.material}
        solveModel={readStations}
      />
    </div>
  );
}
