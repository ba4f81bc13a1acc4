import type { Analysis, Curve } from "./analysisTypes.js";
import { locateInterval } from "./fieldQueries.js";
import { prepareEnvelopeExtremes, type EnvelopeExtremesContext, type PatternSplit } from "./envelopeExtremes.js";
import { COEFFICIENTS_PER_INTERVAL, M_OFFSET, RZ_OFFSET, UY_OFFSET, V_OFFSET } from "./segmentField.js";

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

class EnvelopeRow implements EnvelopeStationRow {
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

/**
 * Envelope rows of every combination and of "*" (last), at every station, from each combination's
 * own value (its `stationValues`: every case at full value; computed here unless given). A
 * combination's envelope differs from its own value only by its patterned cases: for each, the
 * value holds f·(positive + negative) where the worst arrangement holds only the adverse part, so
 * max = value − Σ min(f·positive, f·negative) and min = value − Σ max(…). The parts of the patterned
 * cases are evaluated once per station and shared by every combination; "*" is the worst of the
 * combination rows, which is its definition. With `peaks` (12 numbers per combination), also writes
 * each combination's best sampled Vmax, Vmin, Mmax, Mmin, uyMax, uyMin and then their x (the seeds
 * of `envelopeExtremesOf`).
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
  // per combination, its patterned factors: the case's place in patternedCases, the factor, and
  // which part (0 positive, 1 negative) is min(f·positive, f·negative), the one taken off for max
  const starts = new Int32Array(combos.length + 1);
  const patternedFactors = combos.map((c) => c.factors.filter((f) => f.factor !== 0 && analysis.cases[f.caseIndex]!.pattern));
  patternedFactors.forEach((list, i) => (starts[i + 1] = starts[i]! + list.length));
  const place = new Int32Array(starts[combos.length]!);
  const factor = new Float64Array(starts[combos.length]!);
  const forMax = new Int32Array(starts[combos.length]!);
  patternedFactors.forEach((list, i) =>
    list.forEach((f, j) => {
      place[starts[i]! + j] = patternedCases.indexOf(f.caseIndex);
      factor[starts[i]! + j] = f.factor;
      forMax[starts[i]! + j] = f.factor > 0 ? 1 : 0;
    }),
  );
  const n = places.x.length;
  const { splits } = context;
  const quantitySplits = [splits.V, splits.M, splits.uy];
  const degrees = [2, 3, 5];
  // parts[6p..6p+5]: positive and negative parts of V, M, uy of the p-th patterned case; cursor:
  // the sub-interval of each (case, quantity) split at the last station
  const parts = new Float64Array(6 * patternedCases.length);
  const cursor = new Int32Array(3 * patternedCases.length);
  let lastK = -1;
  let lastU = Infinity;
  const rows: EnvelopeStationRow[][] = Array.from({ length: combos.length + 1 }, () => new Array(n));
  for (let s = 0; s < n; s++) {
    const k = places.k[s]!;
    const u = places.u[s]!;
    // stations usually ascend: the cursors move on; anything else starts them again
    if (k !== lastK || u < lastU) cursor.fill(0);
    lastK = k;
    lastU = u;
    for (let p = 0; p < patternedCases.length; p++) {
      for (let q = 0; q < 3; q++) {
        const split = quantitySplits[q]![patternedCases[p]!]![k]!;
        const cuts = split.cuts;
        let sub = cursor[3 * p + q]!;
        while (sub + 2 < cuts.length && u >= cuts[sub + 1]!) sub++;
        cursor[3 * p + q] = sub;
        const degree = degrees[q]!;
        const o = split.at + sub * (degree + 1);
        parts[6 * p + 2 * q] = horner(split.positive, o, degree, u);
        parts[6 * p + 2 * q + 1] = horner(split.negative, o, degree, u);
      }
    }
    const x = places.x[s]!;
    let starVMax = -Infinity;
    let starVMin = Infinity;
    let starMMax = -Infinity;
    let starMMin = Infinity;
    let starYMax = -Infinity;
    let starYMin = Infinity;
    for (let c = 0; c < combos.length; c++) {
      const own = combinationValues[c]!;
      let vMax = own[s]!;
      let mMax = own[n + s]!;
      let yMax = own[2 * n + s]!;
      let vMin = vMax;
      let mMin = mMax;
      let yMin = yMax;
      for (let j = starts[c]!; j < starts[c + 1]!; j++) {
        const at = 6 * place[j]!;
        const f = factor[j]!;
        const taken = forMax[j]!;
        const kept = 1 - taken;
        vMax -= f * parts[at + taken]!;
        vMin -= f * parts[at + kept]!;
        mMax -= f * parts[at + 2 + taken]!;
        mMin -= f * parts[at + 2 + kept]!;
        yMax -= f * parts[at + 4 + taken]!;
        yMin -= f * parts[at + 4 + kept]!;
      }
      rows[c]![s] = new EnvelopeRow(x, mMax, mMin, vMax, vMin, yMax, yMin);
      if (peaks) {
        const p = 12 * c;
        if (vMax > peaks[p]!) (peaks[p] = vMax), (peaks[p + 6] = x);
        if (vMin < peaks[p + 1]!) (peaks[p + 1] = vMin), (peaks[p + 7] = x);
        if (mMax > peaks[p + 2]!) (peaks[p + 2] = mMax), (peaks[p + 8] = x);
        if (mMin < peaks[p + 3]!) (peaks[p + 3] = mMin), (peaks[p + 9] = x);
        if (yMax > peaks[p + 4]!) (peaks[p + 4] = yMax), (peaks[p + 10] = x);
        if (yMin < peaks[p + 5]!) (peaks[p + 5] = yMin), (peaks[p + 11] = x);
      }
      if (vMax > starVMax) starVMax = vMax;
      if (vMin < starVMin) starVMin = vMin;
      if (mMax > starMMax) starMMax = mMax;
      if (mMin < starMMin) starMMin = mMin;
      if (yMax > starYMax) starYMax = yMax;
      if (yMin < starYMin) starYMin = yMin;
    }
    rows[combos.length]![s] = new EnvelopeRow(x, starMMax, starMMin, starVMax, starVMin, starYMax, starYMin);
  }
  return rows;
}

function horner(coef: Float64Array, o: number, degree: number, u: number): number {
  let v = coef[o + degree]!;
  for (let i = degree - 1; i >= 0; i--) v = v * u + coef[o + i]!;
  return v;
}
