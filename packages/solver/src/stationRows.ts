import type { Analysis, Curve } from "./analysisTypes.js";
import { locateInterval } from "./fieldQueries.js";
import { prepareEnvelopeExtremes, type EnvelopeExtremesContext, type PatternSplit } from "./envelopeExtremes.js";
import { COEFFICIENTS_PER_INTERVAL, M_OFFSET, RZ_OFFSET, UY_OFFSET, V_OFFSET } from "./segmentField.js";
import { workArray } from "./workBuffers.js";

export interface StationRow {
  x: number;
  V: number;
  M: number;
  uy: number;
  rz: number;
}

export interface EnvelopeStationRow {
  x: number;
  Mmax: number;
  Mmin: number;
  Vmax: number;
  Vmin: number;
  uyMax: number;
  uyMin: number;
}

/** Where each station reads: grid interval k and local coordinate u = x − grid[k]. */
export interface StationPlaces {
  x: number[];
  k: Int32Array;
  u: Float64Array;
}

/**
 * Locates every station once for all curves. The contract reads right of x, except at the right
 * end. Stations are usually ascending, so a moving index finds the interval; any step back falls
 * back to the binary search, which gives the same interval.
 */
export function placeStations(grid: Float64Array, stations: number[]): StationPlaces {
  const K = grid.length - 1;
  const xEnd = grid[K]!;
  const k = new Int32Array(stations.length);
  const u = new Float64Array(stations.length);
  let at = 0;
  for (let i = 0; i < stations.length; i++) {
    const x = stations[i]!;
    if (x >= xEnd) at = locateInterval(grid, x, "left");
    else if (at > 0 && x < grid[at]!) at = locateInterval(grid, x, "right");
    else while (at + 1 < K && x >= grid[at + 1]!) at++;
    k[i] = at;
    u[i] = x - grid[at]!;
  }
  return { x: stations, k, u };
}

/*
 * The layout constants are read into locals once per call: as imported bindings inside the hot
 * loops they made the station loops several times slower under Node's ESM loader.
 */
const LAYOUT = [COEFFICIENTS_PER_INTERVAL, V_OFFSET, M_OFFSET, UY_OFFSET, RZ_OFFSET] as const;

/*
 * Rows are built by constructors, not object literals: V8 tracks literal allocation sites and,
 * seeing tens of thousands of rows survive, moves them to old-space allocation, which made the
 * full result several times slower. The rows are still plain data (own enumerable numbers only,
 * same keys and order as the contract), so JSON and structured clone see the same objects.
 */
class Row implements StationRow {
  constructor(
    public x: number,
    public V: number,
    public M: number,
    public uy: number,
    public rz: number,
  ) {}
}

/** Exported for the benchmark's floor figure only (bench/bench.ts); not part of the package API. */
export class EnvelopeRow implements EnvelopeStationRow {
  constructor(
    public x: number,
    public Mmax: number,
    public Mmin: number,
    public Vmax: number,
    public Vmin: number,
    public uyMax: number,
    public uyMin: number,
  ) {}
}

const EMPTY_PEAKS = [-Infinity, Infinity, -Infinity, Infinity, -Infinity, Infinity, 0, 0, 0, 0, 0, 0];

/**
 * V, M, uy and rz of one curve at every station, as columns of n numbers at 0, n, 2n and 3n (Horner
 * inlined: 16 curves × every station). The station rows and the envelope rows both read these.
 */
export function stationValues(places: StationPlaces, curve: Curve, out = new Float64Array(4 * places.k.length)): Float64Array {
  const c = curve.coef;
  const { k, u: local } = places;
  const n = k.length;
  const [stride, vAt, mAt, yAt, rAt] = LAYOUT;
  for (let i = 0; i < n; i++) {
    const o = k[i]! * stride;
    const u = local[i]!;
    const v = o + vAt;
    const m = o + mAt;
    const y = o + yAt;
    const r = o + rAt;
    out[i] = (c[v + 2]! * u + c[v + 1]!) * u + c[v]!;
    out[n + i] = ((c[m + 3]! * u + c[m + 2]!) * u + c[m + 1]!) * u + c[m]!;
    out[2 * n + i] = ((((c[y + 5]! * u + c[y + 4]!) * u + c[y + 3]!) * u + c[y + 2]!) * u + c[y + 1]!) * u + c[y]!;
    out[3 * n + i] = (((c[r + 4]! * u + c[r + 3]!) * u + c[r + 2]!) * u + c[r + 1]!) * u + c[r]!;
  }
  return out;
}

/** The station rows of one curve (from its `stationValues`, computed here unless given). */
export function curveStationRows(places: StationPlaces, curve: Curve, values: Float64Array = stationValues(places, curve)): StationRow[] {
  const x = places.x;
  const n = x.length;
  const rows: StationRow[] = new Array(n);
  for (let i = 0; i < n; i++) rows[i] = new Row(x[i]!, values[i]!, values[n + i]!, values[2 * n + i]!, values[3 * n + i]!);
  return rows;
}

const columns = { array: new Float64Array(0) };

/**
 * Envelope rows of every combination and of "*" (last), at every station, from each combination's
 * own value (its `stationValues`: every case at full value; computed here unless given). A
 * combination's envelope differs from its own value only by its patterned cases: for each, the
 * value holds f·(positive + negative) where the worst arrangement holds only the adverse part, so
 * max = value − Σ min(f·positive, f·negative) and min = value − Σ max(…). The parts of the patterned
 * cases are evaluated once per station and shared by every combination; "*" is the worst of the
 * combination rows, which is its definition. With `peaks` (12 numbers per combination), also writes
 * each combination's best sampled Vmax, Vmin, Mmax, Mmin, uyMax, uyMin and then their x (the seeds
 * of `envelopeExtremesOf`). Works column by column (one quantity of one combination over every
 * station) and builds the row objects last.
 */
export function envelopeStationRows(
  analysis: Analysis,
  places: StationPlaces,
  context: EnvelopeExtremesContext = prepareEnvelopeExtremes(analysis),
  peaks?: Float64Array,
  combinationValues: Float64Array[] = analysis.combinations.map((c) => stationValues(places, c.curve)),
): EnvelopeStationRow[][] {
  if (peaks) for (let p = 0; p + 12 <= peaks.length; p += 12) peaks.set(EMPTY_PEAKS, p);
  const combos = analysis.combinations;
  const patternedCases = analysis.cases.flatMap((c, i) => (c.pattern ? [i] : []));
  const n = places.x.length;
  // columns: the positive and negative parts of V, M, uy of each patterned case (6 per case),
  // then Vmax, Vmin, Mmax, Mmin, uyMax, uyMin of each combination and of "*" (6 each)
  const partsAt = (p: number, q: number, negative: number) => (6 * p + 2 * q + negative) * n;
  const envelopeAt = (c: number, column: number) => (6 * patternedCases.length + 6 * c + column) * n;
  const size = (6 * patternedCases.length + 6 * (combos.length + 1)) * n;
  const work = workArray(size, columns);
  const quantitySplits = [context.splits.V, context.splits.M, context.splits.uy];
  const degrees = [2, 3, 5];
  const { k: intervals, u: local } = places;
  patternedCases.forEach((caseIndex, p) => {
    for (let q = 0; q < 3; q++) {
      const splits = quantitySplits[q]![caseIndex]!;
      const degree = degrees[q]!;
      const positiveAt = partsAt(p, q, 0);
      const negativeAt = partsAt(p, q, 1);
      let lastK = -1;
      let lastU = Infinity;
      let sub = 0;
      for (let s = 0; s < n; s++) {
        const k = intervals[s]!;
        const u = local[s]!;
        // stations usually ascend: the sub-interval moves on; anything else starts it again
        if (k !== lastK || u < lastU) sub = 0;
        lastK = k;
        lastU = u;
        const split = splits[k]!;
        const cuts = split.cuts;
        while (sub + 2 < cuts.length && u >= cuts[sub + 1]!) sub++;
        const o = split.at + sub * (degree + 1);
        work[positiveAt + s] = horner(split.positive, o, degree, u);
        work[negativeAt + s] = horner(split.negative, o, degree, u);
      }
    }
  });
  const star = combos.length;
  for (let q = 0; q < 3; q++) {
    work.fill(-Infinity, envelopeAt(star, 2 * q), envelopeAt(star, 2 * q) + n);
    work.fill(Infinity, envelopeAt(star, 2 * q + 1), envelopeAt(star, 2 * q + 1) + n);
  }
  const taken = new Int32Array(patternedCases.length);
  const kept = new Int32Array(patternedCases.length);
  const factors = new Float64Array(patternedCases.length);
  combos.forEach((combination, c) => {
    const own = combinationValues[c]!;
    const patterned = combination.factors.filter((f) => f.factor !== 0 && analysis.cases[f.caseIndex]!.pattern);
    for (let q = 0; q < 3; q++) {
      // for f > 0, min(f·positive, f·negative) is f·negative, taken off for max; for f < 0, f·positive
      patterned.forEach(({ caseIndex, factor }, j) => {
        const p = patternedCases.indexOf(caseIndex);
        taken[j] = partsAt(p, q, factor > 0 ? 1 : 0);
        kept[j] = partsAt(p, q, factor > 0 ? 0 : 1);
        factors[j] = factor;
      });
      const count = patterned.length;
      const maxAt = envelopeAt(c, 2 * q);
      const minAt = envelopeAt(c, 2 * q + 1);
      const ownAt = q * n;
      const starMaxAt = envelopeAt(star, 2 * q);
      const starMinAt = envelopeAt(star, 2 * q + 1);
      // one pass per column pair: own value less the adverse parts (at most two patterned cases
      // take the unrolled path, more the general loop), then the peaks and the "*" columns
      let best = -Infinity;
      let bestAt = 0;
      let least = Infinity;
      let leastAt = 0;
      const f0 = count > 0 ? factors[0]! : 0;
      const t0 = count > 0 ? taken[0]! : 0;
      const k0 = count > 0 ? kept[0]! : 0;
      const f1 = count > 1 ? factors[1]! : 0;
      const t1 = count > 1 ? taken[1]! : 0;
      const k1 = count > 1 ? kept[1]! : 0;
      for (let s = 0; s < n; s++) {
        let max = own[ownAt + s]!;
        let min = max;
        if (count > 0) {
          max -= f0 * work[t0 + s]!;
          min -= f0 * work[k0 + s]!;
          if (count > 1) {
            max -= f1 * work[t1 + s]!;
            min -= f1 * work[k1 + s]!;
            for (let j = 2; j < count; j++) {
              max -= factors[j]! * work[taken[j]! + s]!;
              min -= factors[j]! * work[kept[j]! + s]!;
            }
          }
        }
        work[maxAt + s] = max;
        work[minAt + s] = min;
        if (max > best) (best = max), (bestAt = s);
        if (min < least) (least = min), (leastAt = s);
        if (max > work[starMaxAt + s]!) work[starMaxAt + s] = max;
        if (min < work[starMinAt + s]!) work[starMinAt + s] = min;
      }
      if (peaks && n > 0) {
        const at = 12 * c + 2 * q;
        peaks[at] = best;
        peaks[at + 1] = least;
        peaks[at + 6] = places.x[bestAt]!;
        peaks[at + 7] = places.x[leastAt]!;
      }
    }
  });
  const x = places.x;
  const rows: EnvelopeStationRow[][] = [];
  for (let c = 0; c <= combos.length; c++) {
    const list: EnvelopeStationRow[] = new Array(n);
    const v = envelopeAt(c, 0);
    const m = envelopeAt(c, 2);
    const y = envelopeAt(c, 4);
    for (let s = 0; s < n; s++) {
      list[s] = new EnvelopeRow(x[s]!, work[m + s]!, work[m + n + s]!, work[v + s]!, work[v + n + s]!, work[y + s]!, work[y + n + s]!);
    }
    rows.push(list);
  }
  return rows;
}

function horner(coef: Float64Array, o: number, degree: number, u: number): number {
  let v = coef[o + degree]!;
  for (let i = degree - 1; i >= 0; i--) v = v * u + coef[o + i]!;
  return v;
}
