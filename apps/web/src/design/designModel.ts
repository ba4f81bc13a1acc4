import type { LoadCategory, ResultLike, SpanRef, StationLike } from "@spanwright/solver/design";

/**
 * The part of an exchange-format beam model (`spanwright.beam/1`) the design components read.
 * Structural, so the editor's `toExchange(doc)` and the engine's parsed `BeamModel` both fit.
 */
export interface DesignModel {
  readonly theory?: "euler-bernoulli" | "timoshenko";
  readonly nodes: readonly { readonly x: number; readonly support?: unknown }[];
  readonly segments: readonly { readonly E: number; readonly I: number; readonly A?: number; readonly G?: number; readonly shearFactor?: number }[];
  readonly loadCases: readonly { readonly id: string; readonly category: LoadCategory }[];
  readonly combinations?: readonly { readonly id: string; readonly factors: Readonly<Record<string, number>> }[];
  readonly stations?: readonly number[];
}

export interface DesignSpan extends SpanRef {
  /** Index of the segment at the middle of the span, whose E and I the theory panel uses. */
  readonly segment: number;
}

/**
 * Spans between consecutive supported nodes; a stretch beyond the first or last support is a
 * cantilever supported at its inner end. Same cuts as the engine's pattern-loading spans.
 */
export function designSpans(model: DesignModel): DesignSpan[] {
  const nodes = model.nodes;
  const first = nodes[0];
  const last = nodes[nodes.length - 1];
  if (!first || !last) return [];
  const supported = nodes.filter((n) => n.support !== undefined && n.support !== null).map((n) => n.x);
  const cuts = [...supported];
  if (cuts[0] !== first.x) cuts.unshift(first.x);
  if (cuts[cuts.length - 1] !== last.x) cuts.push(last.x);
  const spans: DesignSpan[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const x1 = cuts[i]!;
    const x2 = cuts[i + 1]!;
    const leftFree = i === 0 && !supported.includes(x1);
    const rightFree = i === cuts.length - 2 && !supported.includes(x2);
    const mid = (x1 + x2) / 2;
    const segment = Math.max(0, nodes.findIndex((n, k) => k + 1 < nodes.length && n.x <= mid && nodes[k + 1]!.x >= mid));
    const base = { label: `Span ${i + 1}`, x1, x2, segment };
    if (leftFree && !rightFree) spans.push({ ...base, label: `Overhang ${i + 1}`, kind: "cantilever", supportAt: "right" });
    else if (rightFree && !leftFree) spans.push({ ...base, label: `Overhang ${i + 1}`, kind: "cantilever", supportAt: "left" });
    else spans.push({ ...base, kind: "span" });
  }
  return spans;
}


export function caseIds(model: DesignModel): string[] {
  return model.loadCases.map((c) => c.id);
}

export function combinationIds(model: DesignModel): string[] {
  return (model.combinations ?? []).map((c) => c.id);
}

function hasStations(stations: readonly StationLike[] | undefined, xs: readonly number[]): boolean {
  if (!stations) return false;
  const sorted = stations.map((s) => s.x).sort((a, b) => a - b);
  let j = 0;
  for (const x of xs) {
    while (j < sorted.length && sorted[j]! < x - 1e-9) j++;
    if (j >= sorted.length || Math.abs(sorted[j]! - x) > 1e-9) return false;
  }
  return true;
}

/** Whether `result` reports every id at every x the checks need (span ends, braces, quarter points). */
export function resultCovers(result: ResultLike | null | undefined, ids: readonly string[], xs: readonly number[]): boolean {
  if (!result) return false;
  return ids.every((id) => hasStations(result.results[id]?.stations, xs));
}
