import type { SpanRef, StationLike } from "./steelBeamChecks.js";

/**
 * The part of the exchange format's result (`spanwright.result/1`) the checks read, typed
 * structurally so the design functions do not depend on the engine's own types.
 */
export interface ResultLike {
  readonly results: Readonly<Record<string, { readonly stations?: readonly StationLike[] } | undefined>>;
}

/**
 * Stations of one load case or combination, sorted by x. Ask the engine for stations at the span
 * ends, the brace points and the quarter points of each unbraced segment, so that deflections are
 * measured from the supports and Cb (eq. F1-1) uses exact quarter-point moments.
 */
export function stationsFromResult(result: ResultLike, id: string): StationLike[] {
  return [...(result.results[id]?.stations ?? [])].sort((a, b) => a.x - b.x);
}

/**
 * x positions to request as `stations` for checks: every span end and brace point, the quarter
 * points of each unbraced segment, and `perSegment` evenly spaced points in between.
 */
export function checkStations(spanEnds: readonly number[], bracePoints: readonly number[], perSegment = 40): number[] {
  const cuts = [...new Set([...spanEnds, ...bracePoints])].sort((a, b) => a - b);
  const xs = new Set<number>(cuts);
  for (let i = 1; i < cuts.length; i++) {
    const a = cuts[i - 1]!, b = cuts[i]!;
    for (let k = 1; k < perSegment; k++) xs.add(a + ((b - a) * k) / perSegment);
    for (const f of [0.25, 0.5, 0.75]) xs.add(a + (b - a) * f);
  }
  return [...xs].sort((a, b) => a - b);
}

/**
 * Brace points for a compression flange braced every `Lb` from the start of each span (and at the
 * supports); none when `Lb` is null or not positive. The Checks tab and the PDF report share it.
 */
export function bracePointsEvery(spans: readonly SpanRef[], Lb: number | null): number[] {
  if (Lb === null || !(Lb > 0)) return [];
  const points: number[] = [];
  for (const s of spans) {
    for (let x = s.x1 + Lb; x < s.x2 - 1e-9; x += Lb) points.push(x);
  }
  return points;
}
