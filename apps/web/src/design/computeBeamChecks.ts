import {
  assembleBeamChecks,
  bracePointsEvery,
  checkStationsForSpans,
  stationsFromResult,
  type CbRule,
  type DeflectionLimit,
  type DesignMethod,
  type Material,
  type ResultLike,
  type SectionShape,
  type SpanCheckRow,
} from "@spanwright/solver/design";
import { designSpans, resultCovers, type DesignModel } from "./designModel";

export interface BeamCheckRequest {
  readonly model: DesignModel;
  /** The saved or live result; solved again (with check stations) when it lacks stations. */
  readonly result: ResultLike | null;
  readonly shape: SectionShape;
  readonly material: Material;
  readonly method: DesignMethod;
  /** Maximum unbraced length of the compression flange, m; null = braced at the supports only. */
  readonly Lb: number | null;
  readonly strengthIds: readonly string[];
  /** Each case or combination checked for deflection, with its limit (one id may appear under several limits). */
  readonly deflection: readonly { readonly id: string; readonly limit: DeflectionLimit }[];
  /**
   * Solves the model (with `stations`) when `result` lacks stations the checks need, e.g. the
   * engine's `solve`. Injected so that mounting the checks does not pull the engine into a chunk;
   * without it a result lacking stations gives the `missing-stations` outcome.
   */
  readonly solveModel?: (model: unknown) => ResultLike;
  /** User allowables for the elastic checks of sections other than I-shapes, Pa. */
  readonly allowableBending: number | null;
  readonly allowableShear: number | null;
  /** How Cb is found for I-shapes; default eq. F1-1. */
  readonly cb?: CbRule;
}

export type BeamCheckOutcome =
  | { readonly ok: true; readonly rows: readonly SpanCheckRow[]; readonly resolved: boolean; readonly notes: readonly string[] }
  | { readonly ok: false; readonly code: "invalid-input" | "solve-failed"; readonly message: string }
  /** The result lacks stations and no solver was given: solve again with `stations`. */
  | { readonly ok: false; readonly code: "missing-stations"; readonly message: string; readonly stations: readonly number[] };

/** x positions (m) at which the checks need results: span ends, brace points and quarter points. */
export function stationsForChecks(model: DesignModel, Lb: number | null): number[] {
  return checkStationsForSpans(designSpans(model), Lb);
}

/**
 * The per-span check table for a beam (`assembleBeamChecks`: AISC 360-22 F2/G2 for I-shapes,
 * elastic σ and τ against user allowables otherwise, and deflection limits). Solves the model again
 * when the given result lacks the stations the checks need (span ends, braces, quarter points).
 */
export function computeBeamChecks(req: BeamCheckRequest): BeamCheckOutcome {
  const spans = designSpans(req.model);
  if (spans.length === 0) return { ok: false, code: "invalid-input", message: "The beam has no spans to check." };
  const braces = bracePointsEvery(spans, req.Lb);
  const xs = stationsForChecks(req.model, req.Lb);
  const ids = [...new Set([...req.strengthIds, ...req.deflection.map((d) => d.id)])];
  let result = req.result;
  let resolved = false;
  if (!resultCovers(result, ids, xs)) {
    if (!req.solveModel)
      return { ok: false, code: "missing-stations", message: "The result lacks the stations the checks need: solve the beam again with them.", stations: xs };
    try {
      result = req.solveModel({ ...req.model, stations: xs });
      resolved = true;
    } catch (error) {
      // The engine throws a SolverError (code, message) for models it cannot solve.
      return { ok: false, code: "solve-failed", message: `The beam could not be solved for the checks: ${error instanceof Error ? error.message : String(error)}` };
    }
  }
  if (!result) return { ok: false, code: "invalid-input", message: "No result to check." };
  if (req.shape.kind === "i-shape" && req.material.Fy === undefined)
    return { ok: false, code: "invalid-input", message: "The AISC checks need the yield stress Fy of the material." };
  const { basis, rows } = assembleBeamChecks({
    shape: req.shape,
    material: req.material,
    method: req.method,
    spans,
    bracePoints: braces,
    strength: req.strengthIds.map((id) => ({ id, stations: stationsFromResult(result, id) })),
    deflection: req.deflection.map(({ id, limit }) => ({ id, stations: stationsFromResult(result, id), limit })),
    allowableBending: req.allowableBending,
    allowableShear: req.allowableShear,
    ...(req.cb ? { cb: req.cb } : {}),
  });
  const notes = basis === "elastic" ? ["AISC 360-22 Chapters F and G apply to I-shapes here; this section is checked elastically against your allowables."] : [];
  return { ok: true, rows, resolved, notes };
}
