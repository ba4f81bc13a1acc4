import type { Analysis, Curve } from "./analysisTypes.js";
import type { EnvelopeQuantity } from "./envelopeQueries.js";
import { ExtremeTracker, QUANTITY_LAYOUT, visitPolynomialExtremes, type Extremes } from "./fieldQueries.js";
import { COEFFICIENTS_PER_INTERVAL } from "./segmentField.js";

/**
 * Per grid interval, the least and greatest value of a curve's V, M and uy and the first x where
 * each occurs: 4 numbers per interval (min, max, x of min, x of max), exact (ends and interior
 * stationary points). A case's ranges give its extremes; summed with a combination's factors they
 * bound the combination on each interval, so its exact search skips most intervals.
 */
export type CurveRanges = Record<EnvelopeQuantity, Float64Array>;

const QUANTITIES: readonly EnvelopeQuantity[] = ["V", "M", "uy"];

export function curveRanges(grid: ArrayLike<number>, curve: Curve): CurveRanges {
  const K = grid.length - 1;
  const all = new Float64Array(12 * K); // one allocation for the three
  const out = { V: all.subarray(0, 4 * K), M: all.subarray(4 * K, 8 * K), uy: all.subarray(8 * K) };
  const tracker = new ExtremeTracker();
  const scratch = new Float64Array(6);
  for (const quantity of QUANTITIES) {
    const { offset, degree } = QUANTITY_LAYOUT[quantity];
    const values = out[quantity];
    for (let k = 0; k < K; k++) {
      tracker.reset();
      visitPolynomialExtremes(curve.coef, k * COEFFICIENTS_PER_INTERVAL + offset, degree, grid[k + 1]! - grid[k]!, grid[k]!, grid[k + 1]!, scratch, tracker);
      values[4 * k] = tracker.minValue;
      values[4 * k + 1] = tracker.maxValue;
      values[4 * k + 2] = tracker.minX;
      values[4 * k + 3] = tracker.maxX;
    }
  }
  return out;
}

/** The extremes of a curve from its ranges (the first interval holding each, as a left-to-right search). */
export function extremesOfRanges(ranges: CurveRanges): Extremes {
  const pick = (values: Float64Array) => {
    const tracker = new ExtremeTracker();
    for (let at = 0; at < values.length; at += 4) {
      if (values[at]! < tracker.minValue) [tracker.minValue, tracker.minX] = [values[at]!, values[at + 2]!];
      if (values[at + 1]! > tracker.maxValue) [tracker.maxValue, tracker.maxX] = [values[at + 1]!, values[at + 3]!];
    }
    return tracker;
  };
  const [V, M, uy] = [pick(ranges.V), pick(ranges.M), pick(ranges.uy)];
  return { Mmax: M.max, Mmin: M.min, Vmax: V.max, Vmin: V.min, uyMax: uy.max, uyMin: uy.min };
}

/**
 * Exact extremes of a combination's curve (Σ factor · case curve) from the ranges of its cases:
 * an interval is searched only where the factored sum of the case ranges could beat the best value
 * so far. `samples` (the curve at the stations, V, M, uy as `stationValues` lays them out, with
 * their x) start the search just inside the best sampled values, so nearly every interval is
 * skipped; the extremes and their x always come from the polynomials, never from a sample.
 */
export function combinationExtremes(
  analysis: Analysis,
  combination: { factors: { caseIndex: number; factor: number }[]; curve: Curve },
  caseRanges: CurveRanges[],
  samples?: { values: Float64Array; x: ArrayLike<number> },
): Extremes {
  const grid = analysis.grid;
  const K = grid.length - 1;
  const factors = combination.factors.filter((f) => f.factor !== 0);
  const trackers = QUANTITIES.map(() => new ExtremeTracker());
  const scratch = new Float64Array(6);
  const interval = new ExtremeTracker();
  const bound = new Float64Array(2);
  QUANTITIES.forEach((quantity, q) => {
    const tracker = trackers[q]!;
    if (samples) seedWithSamples(tracker, samples.values, q, samples.x);
    const { offset, degree } = QUANTITY_LAYOUT[quantity];
    for (let k = 0; k < K; k++) {
      intervalBound(factors, caseRanges, quantity, k, bound);
      if (bound[0]! <= tracker.maxValue && bound[1]! >= tracker.minValue) continue;
      interval.reset();
      visitPolynomialExtremes(combination.curve.coef, k * COEFFICIENTS_PER_INTERVAL + offset, degree, grid[k + 1]! - grid[k]!, grid[k]!, grid[k + 1]!, scratch, interval);
      if (interval.maxValue > tracker.maxValue) [tracker.maxValue, tracker.maxX] = [interval.maxValue, interval.maxX];
      if (interval.minValue < tracker.minValue) [tracker.minValue, tracker.minX] = [interval.minValue, interval.minX];
    }
  });
  const [V, M, uy] = trackers as [ExtremeTracker, ExtremeTracker, ExtremeTracker];
  return { Mmax: M.max, Mmin: M.min, Vmax: V.max, Vmin: V.min, uyMax: uy.max, uyMin: uy.min };
}

/**
 * Bounds of Σ factor · case on grid interval k from the cases' ranges there: out[0] lies at or
 * above its greatest value, out[1] at or below its least (for a patterned case, whose ranges hold
 * its negative and positive parts, of its worst arrangement). Each bound is widened by 1e-12 of
 * Σ |factor · range|, for rounding in the ranges, this sum and the combined curve. Below 1e-100 (no
 * physical value in N, m or rad) squares of the polynomials' terms underflow and their rounding is no
 * longer relative: the bounds are then infinite, so every interval is searched, as without ranges.
 */
export function intervalBound(factors: readonly { caseIndex: number; factor: number }[], ranges: CurveRanges[], quantity: EnvelopeQuantity, k: number, out: Float64Array): void {
  let high = 0;
  let low = 0;
  let scale = 0;
  for (let i = 0; i < factors.length; i++) {
    const { caseIndex, factor } = factors[i]!;
    const range = ranges[caseIndex]![quantity];
    const least = factor * range[4 * k]!;
    const greatest = factor * range[4 * k + 1]!;
    high += Math.max(least, greatest);
    low += Math.min(least, greatest);
    scale += Math.abs(least) + Math.abs(greatest);
  }
  const margin = scale >= 1e-100 ? 1e-12 * scale : Infinity;
  out[0] = high + margin;
  out[1] = low - margin;
}

/**
 * How far inside the best sampled values (greatest `max`, least `min`) a search may start: a hair,
 * 1e-9 of their scale, so the exact search always replaces the start and the extreme and its x come
 * from the polynomials, never from a sample. NaN (do not start there) without samples or below
 * 1e-100, where the search can miss what a sample finds (see `intervalBound`).
 */
export function seedMargin(max: number, min: number): number {
  const scale = Math.max(Math.abs(max), Math.abs(min));
  return max >= min && scale >= 1e-100 ? 1e-9 * scale : NaN;
}

/** Starts a tracker just inside the best of column q of the samples (`seedMargin`). */
function seedWithSamples(tracker: ExtremeTracker, values: Float64Array, q: number, x: ArrayLike<number>): void {
  const n = x.length;
  let max = -Infinity;
  let min = Infinity;
  let maxAt = 0;
  let minAt = 0;
  for (let i = q * n; i < (q + 1) * n; i++) {
    const v = values[i]!;
    if (v > max) [max, maxAt] = [v, i - q * n];
    if (v < min) [min, minAt] = [v, i - q * n];
  }
  const margin = seedMargin(max, min);
  if (Number.isNaN(margin)) return;
  [tracker.maxValue, tracker.maxX] = [max - margin, x[maxAt]!];
  [tracker.minValue, tracker.minX] = [min + margin, x[minAt]!];
}
