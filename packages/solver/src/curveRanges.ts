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
  QUANTITIES.forEach((quantity, q) => {
    const tracker = trackers[q]!;
    if (samples) seedWithSamples(tracker, samples.values, q, samples.x);
    const { offset, degree } = QUANTITY_LAYOUT[quantity];
    for (let k = 0; k < K; k++) {
      let high = 0;
      let low = 0;
      let scale = 0;
      for (let i = 0; i < factors.length; i++) {
        const { caseIndex, factor } = factors[i]!;
        const range = caseRanges[caseIndex]![quantity];
        const least = factor * range[4 * k]!;
        const greatest = factor * range[4 * k + 1]!;
        high += Math.max(least, greatest);
        low += Math.min(least, greatest);
        scale += Math.abs(least) + Math.abs(greatest);
      }
      const margin = roundingMargin(scale);
      if (high + margin <= tracker.maxValue && low - margin >= tracker.minValue) continue;
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
 * What a bound from ranges summed with these terms (Σ |factor · range|) may be off by: 1e-12 of
 * them covers rounding in the ranges, the sum and the combined curve. Below 1e-100 (no physical
 * value in N, m or rad) squares of the polynomials' terms underflow and their rounding is no longer
 * relative, so nothing is skipped there and every interval is searched, as without ranges.
 */
export function roundingMargin(scale: number): number {
  return scale >= 1e-100 ? 1e-12 * scale : Infinity;
}

/**
 * Starts a tracker a hair (1e-9 of the scale) inside the best of column q of the samples. Not below
 * 1e-100, where the search can miss what a sample finds (see `roundingMargin`).
 */
function seedWithSamples(tracker: ExtremeTracker, values: Float64Array, q: number, x: ArrayLike<number>): void {
  const n = x.length;
  if (n === 0) return;
  let max = -Infinity;
  let min = Infinity;
  let maxAt = 0;
  let minAt = 0;
  for (let i = q * n; i < (q + 1) * n; i++) {
    const v = values[i]!;
    if (v > max) [max, maxAt] = [v, i - q * n];
    if (v < min) [min, minAt] = [v, i - q * n];
  }
  const scale = Math.max(Math.abs(max), Math.abs(min));
  if (!(scale >= 1e-100)) return;
  const margin = 1e-9 * scale;
  [tracker.maxValue, tracker.maxX] = [max - margin, x[maxAt]!];
  [tracker.minValue, tracker.minX] = [min + margin, x[minAt]!];
}
