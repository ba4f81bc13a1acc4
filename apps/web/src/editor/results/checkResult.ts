import { valuesAt, type Analysis } from "@spanwright/solver";
import type { ResultLike, StationLike } from "@spanwright/solver/design";

/**
 * The exchange-format result's `stations` for the checks, read from the worker's analysis at the
 * x the checks ask for (`stationsForChecks`). The analysis holds every interval's exact
 * polynomials, so reading at new stations needs no second solve, and no engine on the main
 * thread. Read right of x except at the beam's right end, as the contract's stations are.
 */
export function resultAtStations(analysis: Analysis, ids: readonly string[], xs: readonly number[]): ResultLike {
  const xEnd = analysis.grid[analysis.grid.length - 1] ?? 0;
  const results: Record<string, { stations: StationLike[] }> = {};
  for (const id of ids) {
    const stations: StationLike[] = [];
    for (const x of xs) {
      const v = valuesAt(analysis, id, x, x >= xEnd ? "left" : "right");
      if (!v) break;
      stations.push({ x, V: v.V, M: v.M, uy: v.uy });
    }
    if (stations.length === xs.length) results[id] = { stations };
  }
  return { results };
}

/** Case and combination ids an analysis can read (the envelope "*" has no single curve). */
export function resultIds(analysis: Analysis): string[] {
  return [...analysis.cases.map((c) => c.id), ...analysis.combinations.map((k) => k.id)];
}
