import type { StationLike } from "./steelBeamChecks.js";

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
