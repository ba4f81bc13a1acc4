import type { BeamModel, Load } from "./beamModelSchema.js";
import { viewsOf } from "./workBuffers.js";

/** A stretch between consecutive supported nodes (or an overhang), for pattern loading. */
export interface Span {
  x1: number;
  x2: number;
}

/**
 * The breakpoints shared by every load case: all nodes plus every load position. Between two
 * breakpoints each field of each case is one polynomial, so cases and combinations add up
 * coefficient by coefficient. Grid points are indexed j = 0…K, intervals k = 0…K−1.
 */
export interface LoadGrid {
  x: Float64Array;
  /** Node index at grid point j, or −1 for a point inside a segment. */
  pointNode: Int32Array;
  /** Segment e covers intervals segmentFirstInterval[e] … segmentFirstInterval[e+1] − 1. */
  segmentFirstInterval: Int32Array;
  intervalSpan: Int32Array;
  pointSpan: Int32Array;
  spans: Span[];
}

/** The loads of one right-hand side (a load case, or one span piece of a patterned case) on the grid. */
export interface BasisLoads {
  caseIndex: number;
  /** The span of a pattern piece; −1 for a whole load case. */
  span: number;
  /** Distributed load at the start of interval k (N/m) and its slope (N/m²). */
  q0: Float64Array;
  q1: Float64Array;
  /** Point force (N) and applied moment (N·m, CCW) at grid point j. */
  fy: Float64Array;
  mz: Float64Array;
  settlements: { node: number; uy: number }[];
}

function loadPositions(load: Load): number[] {
  switch (load.type) {
    case "point":
    case "moment":
      return [load.x];
    case "distributed":
      return [load.x1, load.x2];
    case "settlement":
      return [];
    default: {
      const never: never = load;
      return never;
    }
  }
}

/** Positions within this distance of a node are taken as at the node (rounding in imported data). */
function snapTolerance(model: BeamModel): number {
  const nodes = model.nodes;
  return 1e-12 * (Math.abs(nodes[0]!.x) + Math.abs(nodes[nodes.length - 1]!.x));
}

export function buildLoadGrid(model: BeamModel): LoadGrid {
  const nodeX = model.nodes.map((n) => n.x);
  const tolerance = snapTolerance(model);
  const all = [...nodeX];
  for (const loadCase of model.loadCases) for (const load of loadCase.loads) all.push(...loadPositions(load).map((x) => snap(nodeX, x, tolerance)));
  all.sort((a, b) => a - b);
  const unique = all.filter((x, i) => i === 0 || x !== all[i - 1]);
  const x = Float64Array.from(unique);
  const pointNode = new Int32Array(x.length).fill(-1);
  const segmentFirstInterval = new Int32Array(nodeX.length);
  for (let i = 0, j = 0; i < nodeX.length; i++) {
    while (x[j] !== nodeX[i]) j++;
    pointNode[j] = i;
    segmentFirstInterval[i] = j;
  }
  const spans = findSpans(model);
  const pointSpan = Int32Array.from(x, (xj) => spanOf(spans, xj));
  const intervalSpan = Int32Array.from({ length: x.length - 1 }, (_, k) => spanOf(spans, 0.5 * (x[k]! + x[k + 1]!)));
  return { x, pointNode, segmentFirstInterval, intervalSpan, pointSpan, spans };
}

function snap(nodeX: readonly number[], x: number, tolerance: number): number {
  const i = nearestIndex(nodeX, x);
  return Math.abs(nodeX[i]! - x) <= tolerance ? nodeX[i]! : x;
}

function nearestIndex(sorted: ArrayLike<number>, x: number): number {
  let lo = 0;
  let hi = sorted.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid]! <= x) lo = mid;
    else hi = mid;
  }
  return Math.abs(sorted[hi]! - x) < Math.abs(sorted[lo]! - x) ? hi : lo;
}

/** Spans between consecutive supported nodes; overhangs beyond the end supports are spans too. */
export function findSpans(model: Pick<BeamModel, "nodes">): Span[] {
  const nodes = model.nodes;
  const cuts = nodes.filter((n) => n.support !== undefined).map((n) => n.x);
  const x0 = nodes[0]!.x;
  const xEnd = nodes[nodes.length - 1]!.x;
  if (cuts[0] !== x0) cuts.unshift(x0);
  if (cuts[cuts.length - 1] !== xEnd) cuts.push(xEnd);
  const spans: Span[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) spans.push({ x1: cuts[i]!, x2: cuts[i + 1]! });
  return spans;
}

/** The span holding x: a point exactly at a support belongs to the span on its right (or the last span). */
export function spanOf(spans: readonly Span[], x: number): number {
  // Binary search for the first span whose end lies beyond x; the last span takes the right end.
  let lo = 0;
  let hi = spans.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (x < spans[mid]!.x2) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

function emptyBasis(grid: LoadGrid, caseIndex: number, span: number, take: (length: number) => Float64Array): BasisLoads {
  const K = grid.x.length - 1;
  return { caseIndex, span, q0: take(K), q1: take(K), fy: take(K + 1), mz: take(K + 1), settlements: [] };
}

/**
 * The right-hand sides to solve: one per load case, or for a patterned case one per span that
 * carries any of its loads (distributed loads cut at the supports).
 */
export function buildBases(model: BeamModel, grid: LoadGrid): BasisLoads[] {
  const bases: BasisLoads[] = [];
  const nodeX = model.nodes.map((n) => n.x);
  const tolerance = snapTolerance(model);
  const indexOf = (x: number) => nearestIndex(grid.x, snap(nodeX, x, tolerance));
  // a buffer holds as many bases as there can be (a patterned case has one per loaded span), at
  // most 32: large beams with one case must not pay for more
  const most = model.loadCases.reduce((sum, c) => sum + (c.pattern ? grid.spans.length : 1), 0);
  const take = viewsOf(Math.min(most, 32) * (4 * grid.x.length));
  model.loadCases.forEach((loadCase, caseIndex) => {
    const pieces = new Map<number, BasisLoads>();
    const basisFor = (span: number) => {
      const key = loadCase.pattern ? span : -1;
      let basis = pieces.get(key);
      if (!basis) pieces.set(key, (basis = emptyBasis(grid, caseIndex, key, take)));
      return basis;
    };
    for (const load of loadCase.loads) {
      switch (load.type) {
        case "point": {
          const j = indexOf(load.x);
          basisFor(grid.pointSpan[j]!).fy[j]! += load.fy;
          break;
        }
        case "moment": {
          const j = indexOf(load.x);
          basisFor(grid.pointSpan[j]!).mz[j]! += load.mz;
          break;
        }
        case "distributed": {
          const slope = (load.qy2 - load.qy1) / (load.x2 - load.x1);
          for (let k = indexOf(load.x1), kEnd = indexOf(load.x2); k < kEnd; k++) {
            const basis = basisFor(grid.intervalSpan[k]!);
            basis.q0[k]! += load.qy1 + slope * (grid.x[k]! - load.x1);
            basis.q1[k]! += slope;
          }
          break;
        }
        case "settlement": {
          const j = indexOf(nodeX[load.node]!);
          basisFor(grid.pointSpan[j]!).settlements.push({ node: load.node, uy: load.uy });
          break;
        }
        default: {
          const never: never = load;
          return never;
        }
      }
    }
    if (!loadCase.pattern && pieces.size === 0) basisFor(-1);
    bases.push(...[...pieces.values()].sort((a, b) => a.span - b.span));
  });
  return bases;
}
