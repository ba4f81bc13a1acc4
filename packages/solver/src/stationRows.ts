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
 * Envelope rows of every combination and of "*" (last), at every station. The case parts at a
 * station are evaluated once and shared by every combination; "*" is the worst of the
 * combination rows, which is its definition.
 */
export function envelopeStationRows(analysis: Analysis, places: StationPlaces, context: EnvelopeExtremesContext = prepareEnvelopeExtremes(analysis)): EnvelopeStationRow[][] {
  const nc = analysis.cases.length;
  const combos = analysis.combinations;
  const starts = new Int32Array(combos.length + 1);
  combos.forEach((c, i) => (starts[i + 1] = starts[i]! + c.factors.length));
  const caseIndex = new Int32Array(starts[combos.length]!);
  const factor = new Float64Array(starts[combos.length]!);
  combos.forEach((c, i) => c.factors.forEach((f, j) => ((caseIndex[starts[i]! + j] = f.caseIndex), (factor[starts[i]! + j] = f.factor))));
  const parts = new Float64Array(9 * nc);
  const partsV = parts.subarray(0, 3 * nc);
  const partsM = parts.subarray(3 * nc, 6 * nc);
  const partsUy = parts.subarray(6 * nc, 9 * nc);
  const n = places.x.length;
  const [stride, vAt, mAt, yAt] = LAYOUT;
  const rows: EnvelopeStationRow[][] = Array.from({ length: combos.length + 1 }, () => new Array(n));
  for (let s = 0; s < n; s++) {
    const k = places.k[s]!;
    const u = places.u[s]!;
    evaluateSplitParts(analysis, context.splits.V, k * stride + vAt, k, u, 2, partsV);
    evaluateSplitParts(analysis, context.splits.M, k * stride + mAt, k, u, 3, partsM);
    evaluateSplitParts(analysis, context.splits.uy, k * stride + yAt, k, u, 5, partsUy);
    const x = places.x[s]!;
    const star = new EnvelopeRow(x, -Infinity, Infinity, -Infinity, Infinity, -Infinity, Infinity);
    for (let c = 0; c < combos.length; c++) {
      // [max, min] of each factored sum: patterned cases add only their adverse pieces.
      let vMax = 0;
      let vMin = 0;
      let mMax = 0;
      let mMin = 0;
      let yMax = 0;
      let yMin = 0;
      for (let j = starts[c]!; j < starts[c + 1]!; j++) {
        const at = 3 * caseIndex[j]!;
        const f = factor[j]!;
        let positive = f * partsV[at + 1]!;
        let negative = f * partsV[at + 2]!;
        if (positive >= negative) {
          vMax += positive;
          vMin += negative;
        } else {
          vMax += negative;
          vMin += positive;
        }
        positive = f * partsM[at + 1]!;
        negative = f * partsM[at + 2]!;
        if (positive >= negative) {
          mMax += positive;
          mMin += negative;
        } else {
          mMax += negative;
          mMin += positive;
        }
        positive = f * partsUy[at + 1]!;
        negative = f * partsUy[at + 2]!;
        if (positive >= negative) {
          yMax += positive;
          yMin += negative;
        } else {
          yMax += negative;
          yMin += positive;
        }
      }
      const row = new EnvelopeRow(x, mMax, mMin, vMax, vMin, yMax, yMin);
      rows[c]![s] = row;
      star.Mmax = Math.max(star.Mmax, row.Mmax);
      star.Mmin = Math.min(star.Mmin, row.Mmin);
      star.Vmax = Math.max(star.Vmax, row.Vmax);
      star.Vmin = Math.min(star.Vmin, row.Vmin);
      star.uyMax = Math.max(star.uyMax, row.uyMax);
      star.uyMin = Math.min(star.uyMin, row.uyMin);
    }
    rows[combos.length]![s] = star;
  }
  return rows;
}

function horner(coef: Float64Array, o: number, degree: number, u: number): number {
  let v = coef[o + degree]!;
  for (let i = degree - 1; i >= 0; i--) v = v * u + coef[o + i]!;
  return v;
}

/**
 * Per load case at (k, u), the quantity's coefficients at `at`: [value, positive part, negative part], as `evaluateCaseParts`, but a
 * patterned case reads the sums of its positive and of its negative pieces from the sign splits
 * (two polynomials instead of one per span piece). Inside a sub-interval no piece changes sign,
 * so the parts are the same sums, added before evaluation instead of after.
 */
function evaluateSplitParts(analysis: Analysis, splits: (PatternSplit[] | null)[], at: number, k: number, u: number, degree: number, out: Float64Array): void {
  const cases = analysis.cases;
  const n = degree + 1;
  for (let c = 0; c < cases.length; c++) {
    const perInterval = splits[c];
    if (!perInterval) {
      const v = horner(cases[c]!.curve.coef, at, degree, u);
      out[3 * c] = v;
      out[3 * c + 1] = v;
      out[3 * c + 2] = v;
      continue;
    }
    const split = perInterval[k]!;
    const cuts = split.cuts;
    let s = 0;
    while (s + 2 < cuts.length && u >= cuts[s + 1]!) s++;
    const positive = horner(split.positive, s * n, degree, u);
    const negative = horner(split.negative, s * n, degree, u);
    out[3 * c] = positive + negative;
    out[3 * c + 1] = positive;
    out[3 * c + 2] = negative;
  }
}
