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

/** V, M, uy, rz of one curve at every station (Horner inlined: 16 curves × every station). */
export function curveStationRows(places: StationPlaces, curve: Curve): StationRow[] {
  const c = curve.coef;
  const { x, k, u: local } = places;
  const [stride, vAt, mAt, yAt, rAt] = LAYOUT;
  const rows: StationRow[] = new Array(x.length);
  for (let i = 0; i < rows.length; i++) {
    const o = k[i]! * stride;
    const u = local[i]!;
    const v = o + vAt;
    const m = o + mAt;
    const y = o + yAt;
    const r = o + rAt;
    rows[i] = new Row(
      x[i]!,
      (c[v + 2]! * u + c[v + 1]!) * u + c[v]!,
      ((c[m + 3]! * u + c[m + 2]!) * u + c[m + 1]!) * u + c[m]!,
      ((((c[y + 5]! * u + c[y + 4]!) * u + c[y + 3]!) * u + c[y + 2]!) * u + c[y + 1]!) * u + c[y]!,
      (((c[r + 4]! * u + c[r + 3]!) * u + c[r + 2]!) * u + c[r + 1]!) * u + c[r]!,
    );
  }
  return rows;
}

/**
 * Envelope rows of every combination and of "*" (last), at every station, from each combination's
 * own value (its curve: every case at full value). A combination's envelope
 * differs from its own value only by its patterned cases: for each, the value holds f·(positive +
 * negative) where the worst arrangement holds only the adverse part, so max = value − Σ min(f·positive,
 * f·negative) and min = value − Σ max(…). The parts of the patterned cases are evaluated once per
 * station and shared by every combination; "*" is the worst of the combination rows, which is its
 * definition. With `peaks` (12 numbers per combination), also writes each combination's best
 * sampled Vmax, Vmin, Mmax, Mmin, uyMax, uyMin and then their x (the seeds of `envelopeExtremesOf`).
 */
export function envelopeStationRows(
  analysis: Analysis,
  places: StationPlaces,
  context: EnvelopeExtremesContext = prepareEnvelopeExtremes(analysis),
  peaks?: Float64Array,
): EnvelopeStationRow[][] {
  if (peaks) for (let p = 0; p + 12 <= peaks.length; p += 12) peaks.set(EMPTY_PEAKS, p);
  const nc = analysis.cases.length;
  const combos = analysis.combinations;
  // per combination, only its patterned factors: [case index, factor] pairs
  const starts = new Int32Array(combos.length + 1);
  const patternedFactors = combos.map((c) => c.factors.filter((f) => f.factor !== 0 && analysis.cases[f.caseIndex]!.pattern));
  patternedFactors.forEach((list, i) => (starts[i + 1] = starts[i]! + list.length));
  const caseIndex = new Int32Array(starts[combos.length]!);
  const factor = new Float64Array(starts[combos.length]!);
  patternedFactors.forEach((list, i) => list.forEach((f, j) => ((caseIndex[starts[i]! + j] = f.caseIndex), (factor[starts[i]! + j] = f.factor))));
  const patternedCases = analysis.cases.flatMap((c, i) => (c.pattern ? [i] : []));
  const parts = new Float64Array(6 * nc);
  const n = places.x.length;
  const [stride, vAt, mAt, yAt] = LAYOUT;
  const coefs = combos.map((c) => c.curve.coef);
  const rows: EnvelopeStationRow[][] = Array.from({ length: combos.length + 1 }, () => new Array(n));
  const { splits } = context;
  for (let s = 0; s < n; s++) {
    const k = places.k[s]!;
    const u = places.u[s]!;
    // parts[6c..6c+5]: positive and negative parts of V, M, uy of patterned case c
    for (const c of patternedCases) {
      splitParts(splits.V[c]![k]!, 2, u, parts, 6 * c);
      splitParts(splits.M[c]![k]!, 3, u, parts, 6 * c + 2);
      splitParts(splits.uy[c]![k]!, 5, u, parts, 6 * c + 4);
    }
    const x = places.x[s]!;
    let starVMax = -Infinity;
    let starVMin = Infinity;
    let starMMax = -Infinity;
    let starMMin = Infinity;
    let starYMax = -Infinity;
    let starYMin = Infinity;
    const v = k * stride + vAt;
    const m = k * stride + mAt;
    const y = k * stride + yAt;
    for (let c = 0; c < combos.length; c++) {
      // the combination's own value, as its station row has it (same expressions)
      const co = coefs[c]!;
      let vMax = (co[v + 2]! * u + co[v + 1]!) * u + co[v]!;
      let mMax = ((co[m + 3]! * u + co[m + 2]!) * u + co[m + 1]!) * u + co[m]!;
      let yMax = ((((co[y + 5]! * u + co[y + 4]!) * u + co[y + 3]!) * u + co[y + 2]!) * u + co[y + 1]!) * u + co[y]!;
      let vMin = vMax;
      let mMin = mMax;
      let yMin = yMax;
      for (let j = starts[c]!; j < starts[c + 1]!; j++) {
        const at = 6 * caseIndex[j]!;
        const f = factor[j]!;
        let positive = f * parts[at]!;
        let negative = f * parts[at + 1]!;
        vMax -= Math.min(positive, negative);
        vMin -= Math.max(positive, negative);
        positive = f * parts[at + 2]!;
        negative = f * parts[at + 3]!;
        mMax -= Math.min(positive, negative);
        mMin -= Math.max(positive, negative);
        positive = f * parts[at + 4]!;
        negative = f * parts[at + 5]!;
        yMax -= Math.min(positive, negative);
        yMin -= Math.max(positive, negative);
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

/**
 * The positive and negative parts of a patterned case's quantity at u of an interval, from its
 * sign split: inside a sub-interval no piece changes sign, so the parts are the sums of pieces by
 * sign, added before evaluation instead of after.
 */
function splitParts(split: PatternSplit, degree: number, u: number, out: Float64Array, at: number): void {
  const cuts = split.cuts;
  let s = 0;
  while (s + 2 < cuts.length && u >= cuts[s + 1]!) s++;
  out[at] = horner(split.positive, split.at + s * (degree + 1), degree, u);
  out[at + 1] = horner(split.negative, split.at + s * (degree + 1), degree, u);
}
