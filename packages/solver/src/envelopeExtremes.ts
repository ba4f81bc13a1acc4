import type { Analysis, AnalysisCase } from "./analysisTypes.js";
import { curveRanges, intervalBound, seedMargin, type CurveRanges } from "./curveRanges.js";
import { envelopeFactorSets, envelopeOfSets, ENVELOPE_QUANTITIES, evaluateCaseParts, type EnvelopeQuantity, type FactorSet } from "./envelopeQueries.js";
import { ExtremeTracker, QUANTITY_LAYOUT, visitPolynomialExtremes, type Extreme, type Extremes } from "./fieldQueries.js";
import { evaluatePolynomial, signChangesInto, taylorBound } from "./polynomial.js";
import { COEFFICIENTS_PER_INTERVAL } from "./segmentField.js";

/**
 * A patterned case on one grid interval, split where any of its pieces changes sign: on each
 * sub-interval the sum of its positive pieces and the sum of its negative pieces are plain
 * polynomials (interval-local coordinate u), so every envelope is a polynomial there too.
 */
export interface PatternSplit {
  cuts: number[];
  /**
   * Coefficients of the sums on sub-interval s at `at` + s·(degree + 1). The arrays are shared by
   * every interval of one case and quantity: one allocation each instead of two per interval.
   */
  positive: Float64Array;
  negative: Float64Array;
  at: number;
  /** The greatest value of the positive part and the least of the negative part on the interval. */
  positiveMax: number;
  negativeMin: number;
}

/** Work shared by every envelope id of one analysis: the sign splits of the patterned cases. */
export interface EnvelopeExtremesContext {
  analysis: Analysis;
  /** splits[quantity][case][interval], null for a non-patterned case. */
  splits: Record<EnvelopeQuantity, (PatternSplit[] | null)[]>;
  /** Case parts (`evaluateCaseParts`) at both ends of every interval: [k][end][3·cases]. */
  ends: Record<EnvelopeQuantity, Float64Array>;
  /**
   * Per case, its `curveRanges`; for a patterned case instead the least of its negative part and
   * the greatest of its positive part per interval (no x). Summed with a combination's factors
   * (`intervalBound`) they bound its envelopes on a whole interval, so most intervals are skipped
   * without being split.
   */
  ranges: CurveRanges[];
}

/** `caseRanges` (`curveRanges` of each case's curve) are computed here unless given. */
export function prepareEnvelopeExtremes(analysis: Analysis, caseRanges?: CurveRanges[]): EnvelopeExtremesContext {
  const grid = analysis.grid;
  const splits = {} as EnvelopeExtremesContext["splits"];
  for (const quantity of ENVELOPE_QUANTITIES) {
    const { offset, degree } = QUANTITY_LAYOUT[quantity];
    splits[quantity] = analysis.cases.map((loadCase) => (loadCase.pattern ? splitPatternedCase(loadCase.pieces, grid, offset, degree) : null));
  }
  const ends = {} as EnvelopeExtremesContext["ends"];
  const stride = 3 * analysis.cases.length;
  for (const quantity of ENVELOPE_QUANTITIES) {
    const values = new Float64Array(2 * (grid.length - 1) * stride);
    for (let k = 0; k + 1 < grid.length; k++) {
      evaluateCaseParts(analysis, k, 0, quantity, values, 2 * k * stride);
      evaluateCaseParts(analysis, k, grid[k + 1]! - grid[k]!, quantity, values, (2 * k + 1) * stride);
    }
    ends[quantity] = values;
  }
  const K = grid.length - 1;
  const ranges = analysis.cases.map((loadCase, c): CurveRanges => {
    if (!loadCase.pattern) return caseRanges?.[c] ?? curveRanges(grid, loadCase.curve);
    const parts = {} as CurveRanges;
    for (const quantity of ENVELOPE_QUANTITIES) {
      const values = new Float64Array(4 * K).fill(NaN);
      splits[quantity][c]!.forEach((split, k) => {
        values[4 * k] = split.negativeMin;
        values[4 * k + 1] = split.positiveMax;
      });
      parts[quantity] = values;
    }
    return parts;
  });
  return { analysis, splits, ends, ranges };
}

/**
 * The sign splits of one quantity (its polynomial at `offset`, of `degree`) of a patterned case's
 * span pieces, per grid interval. Pieces that keep their sign on an interval go to one side once.
 * Each other piece starts on the side of its sign left of its first root and changes side at each
 * of its roots (all sign changes): never read near a root, where its sign is rounding noise.
 */
function splitPatternedCase(pieces: AnalysisCase["pieces"], grid: Float64Array, offset: number, degree: number): PatternSplit[] {
  const n = degree + 1;
  const own = new Float64Array(degree);
  // work arrays for one interval at a time: sign-change roots ascending, with the piece of each
  const roots = new Float64Array(pieces.length * degree);
  const owners = new Int32Array(pieces.length * degree);
  const sides = new Int8Array(pieces.length);
  // running sums of the pieces on each side, with Neumaier compensation: a piece added and later
  // taken away again must not leave its rounding behind (sums can be far smaller than the pieces
  // that passed through them)
  const positiveSum = new CompensatedSums(n);
  const negativeSum = new CompensatedSums(n);
  const perInterval: PatternSplit[] = [];
  // room for about one root per piece and interval (the usual count for M); grown when short
  let positive = new Float64Array((pieces.length + 2) * n * (grid.length - 1));
  let negative = new Float64Array(positive.length);
  let used = 0;
  for (let k = 0; k + 1 < grid.length; k++) {
    const h = grid[k + 1]! - grid[k]!;
    const o = k * COEFFICIENTS_PER_INTERVAL + offset;
    positiveSum.clear();
    negativeSum.clear();
    let count = 0;
    for (let p = 0; p < pieces.length; p++) {
      const coef = pieces[p]!.curve.coef;
      if (keepsSign(coef, o, degree, h)) {
        (coef[o]! > 0 ? positiveSum : negativeSum).add(coef, o, 1);
        continue;
      }
      const found = signChangesInto(coef, o, degree, 0, h, own);
      const side = initialSide(coef, o, degree, h, own, found);
      sides[p] = side;
      (side > 0 ? positiveSum : negativeSum).add(coef, o, 1);
      // insertion into the sorted roots (a few dozen per interval; ties keep piece order)
      for (let r = 0; r < found; r++) {
        let at = count++;
        while (at > 0 && roots[at - 1]! > own[r]!) {
          roots[at] = roots[at - 1]!;
          owners[at] = owners[at - 1]!;
          at--;
        }
        roots[at] = own[r]!;
        owners[at] = p;
      }
    }
    const cuts: number[] = new Array(count + 2);
    cuts[0] = 0;
    for (let r = 0; r < count; r++) cuts[r + 1] = roots[r]!;
    cuts[count + 1] = h;
    const at = used;
    used += (count + 1) * n;
    if (used > positive.length) [positive, negative] = [grown(positive, used), grown(negative, used)];
    positiveSum.writeTo(positive, at);
    negativeSum.writeTo(negative, at);
    for (let s = 1; s <= count; s++) {
      const p = owners[s - 1]!;
      const coef = pieces[p]!.curve.coef;
      (sides[p]! > 0 ? positiveSum : negativeSum).add(coef, o, -1);
      (sides[p]! > 0 ? negativeSum : positiveSum).add(coef, o, 1);
      sides[p] = -sides[p]!;
      positiveSum.writeTo(positive, at + s * n);
      negativeSum.writeTo(negative, at + s * n);
    }
    perInterval.push({ cuts, positive, negative, at, positiveMax: 0, negativeMin: 0 });
  }
  for (const split of perInterval) {
    split.positive = positive;
    split.negative = negative;
    setPartRanges(split, degree);
  }
  return perInterval;
}

/** A copy of `values` with room for at least `size` numbers. */
function grown(values: Float64Array, size: number): Float64Array<ArrayBuffer> {
  const out = new Float64Array(Math.max(size, 2 * values.length));
  out.set(values);
  return out;
}

const partRange = new ExtremeTracker();
const partScratch = new Float64Array(6);

/**
 * Sets the split's positiveMax and negativeMin. The values at the cuts come first; a sub-interval is
 * searched exactly only where its Taylor bound could beat them (the few with an interior peak).
 */
function setPartRanges(split: PatternSplit, degree: number): void {
  const { cuts, positive, negative, at } = split;
  const n = degree + 1;
  const last = cuts.length - 2;
  let max = evaluatePolynomial(positive, at + last * n, degree, cuts[last + 1]!);
  let min = evaluatePolynomial(negative, at + last * n, degree, cuts[last + 1]!);
  for (let s = 0; s <= last; s++) {
    max = Math.max(max, evaluatePolynomial(positive, at + s * n, degree, cuts[s]!));
    min = Math.min(min, evaluatePolynomial(negative, at + s * n, degree, cuts[s]!));
  }
  for (let s = 0; s <= last; s++) {
    const a = cuts[s]!;
    const b = cuts[s + 1]!;
    const o = at + s * n;
    if (taylorBound(positive, o, degree, a, b, true) > max) {
      partRange.reset();
      visitPolynomialExtremes(positive, o, degree, b, 0, b, partScratch, partRange, a);
      max = Math.max(max, partRange.maxValue);
    }
    if (taylorBound(negative, o, degree, a, b, false) < min) {
      partRange.reset();
      visitPolynomialExtremes(negative, o, degree, b, 0, b, partScratch, partRange, a);
      min = Math.min(min, partRange.minValue);
    }
  }
  split.positiveMax = max;
  split.negativeMin = min;
}

/** n running sums with Neumaier's compensation (each sum carries the rounding it has dropped). */
class CompensatedSums {
  private readonly sum: Float64Array;
  private readonly compensation: Float64Array;
  constructor(private readonly n: number) {
    this.sum = new Float64Array(n);
    this.compensation = new Float64Array(n);
  }

  clear(): void {
    this.sum.fill(0);
    this.compensation.fill(0);
  }

  /** Adds sign·values[offset + i] to sum i (sign ±1: exact). */
  add(values: Float64Array, offset: number, sign: number): void {
    const { sum, compensation } = this;
    for (let i = 0; i < this.n; i++) {
      const value = sign * values[offset + i]!;
      const s = sum[i]!;
      const t = s + value;
      compensation[i]! += Math.abs(s) >= Math.abs(value) ? s - t + value : value - t + s;
      sum[i] = t;
    }
  }

  writeTo(out: Float64Array, at: number): void {
    const { sum, compensation, n } = this;
    for (let i = 0; i < n; i++) out[at + i] = sum[i]! + compensation[i]!;
  }
}

/**
 * The sign (+1, −1) of a polynomial on [0, h] left of its first sign change, read at the middle of
 * the widest stretch between its sign changes (the first `count` of `roots`, ascending) and
 * carried back across them.
 */
function initialSide(coef: Float64Array, o: number, degree: number, h: number, roots: Float64Array, count: number): number {
  let widest = 0;
  let width = -1;
  for (let j = 0; j <= count; j++) {
    const w = (j < count ? roots[j]! : h) - (j > 0 ? roots[j - 1]! : 0);
    if (w > width) [widest, width] = [j, w];
  }
  const a = widest > 0 ? roots[widest - 1]! : 0;
  const sign = evaluatePolynomial(coef, o, degree, a + 0.5 * width) > 0 ? 1 : -1;
  return widest % 2 === 0 ? sign : -sign;
}

/**
 * True when the polynomial cannot reach zero on [0, h]: |c₀| > Σ|cᵢ|hⁱ (i ≥ 1) bounds the change
 * from the left end. Most span pieces far from their span pass, skipping root isolation. The
 * 1e-12 margin covers rounding in the bound; a piece that fails is simply searched for roots.
 */
function keepsSign(coef: Float64Array, o: number, degree: number, h: number): boolean {
  let change = 0;
  let power = 1;
  for (let i = 1; i <= degree; i++) {
    power *= h;
    change += Math.abs(coef[o + i]!) * power;
  }
  return Math.abs(coef[o]!) > change * (1 + 1e-12);
}

class Tracker {
  max: Extreme = { value: -Infinity, x: 0 };
  min: Extreme = { value: Infinity, x: 0 };
}

/**
 * Exact extremes of the upper (max) and lower (min) envelopes of a list of factored sums: on each
 * sub-interval where no piece changes sign the envelopes are polynomials, whose extremes lie at
 * the sub-interval ends or at sign changes of their derivatives. `peaks`, the best sampled values
 * of the same envelope, only speed the search up (see `seedWithSamples`).
 */
export function envelopeExtremesOf(context: EnvelopeExtremesContext, sets: FactorSet[], peaks?: Float64Array): Extremes {
  const out = { V: new Tracker(), M: new Tracker(), uy: new Tracker() };
  if (peaks) seedWithSamples(out, peaks);
  for (const quantity of ENVELOPE_QUANTITIES) {
    for (const factors of sets) visitFactorSet(context, factors, quantity, out[quantity]);
  }
  return { Mmax: out.M.max, Mmin: out.M.min, Vmax: out.V.max, Vmin: out.V.min, uyMax: out.uy.max, uyMin: out.uy.min };
}

/**
 * Starts the trackers just below the best sampled values of the same envelope (`peaks`: Vmax, Vmin,
 * Mmax, Mmin, uyMax, uyMin, then their x, as `envelopeStationRows` writes them), so the bounds in
 * `visitFactorSet` skip nearly every sub-interval that cannot hold the extreme. The start sits a
 * hair inside the samples (`seedMargin`).
 */
function seedWithSamples(trackers: Record<EnvelopeQuantity, Tracker>, peaks: Float64Array): void {
  ENVELOPE_QUANTITIES.forEach((quantity, q) => {
    const [max, min] = [peaks[2 * q]!, peaks[2 * q + 1]!];
    const margin = seedMargin(max, min);
    if (Number.isNaN(margin)) return;
    trackers[quantity].max = { value: max - margin, x: peaks[6 + 2 * q]! };
    trackers[quantity].min = { value: min + margin, x: peaks[7 + 2 * q]! };
  });
}

/** Exact envelope extremes for a combination id, a load case id or "*" (undefined if unknown). */
export function envelopeExtremes(analysis: Analysis, id: string): Extremes | undefined {
  const sets = envelopeFactorSets(analysis, id);
  return sets ? envelopeExtremesOf(prepareEnvelopeExtremes(analysis), sets) : undefined;
}

function visitFactorSet(context: EnvelopeExtremesContext, factors: FactorSet, quantity: EnvelopeQuantity, tracker: Tracker): void {
  const { analysis } = context;
  const grid = analysis.grid;
  const { offset, degree } = QUANTITY_LAYOUT[quantity];
  const n = degree + 1;
  const fixed = factors.filter((f) => f.factor !== 0 && !analysis.cases[f.caseIndex]!.pattern);
  const patterned = factors.filter((f) => f.factor !== 0 && analysis.cases[f.caseIndex]!.pattern);
  const base = new Float64Array(n);
  const upper = new Float64Array(n);
  const lower = new Float64Array(n);
  const derivative = new Float64Array(degree);
  const candidates = new Float64Array(degree + 2);
  const cursor = new Int32Array(patterned.length);
  seedWithBreakpoints(context, factors, quantity, tracker);
  /** Visits the ends and interior stationary points of poly on [a, b] unless a bound rules it out. */
  const visit = (poly: Float64Array, a: number, b: number, x0: number, h: number, x1: number, isUpper: boolean) => {
    // skip when a bound of poly on [a, b] cannot beat the best so far
    const bound = taylorBound(poly, 0, degree, a, b, isUpper);
    if (isUpper ? bound <= tracker.max.value : bound >= tracker.min.value) return;
    for (let i = 1; i <= degree; i++) derivative[i - 1] = i * poly[i]!;
    const stationary = signChangesInto(derivative, 0, degree - 1, a, b, candidates);
    candidates[stationary] = a;
    candidates[stationary + 1] = b;
    for (let c = 0; c < stationary + 2; c++) {
      const u = candidates[c]!;
      const v = evaluatePolynomial(poly, 0, degree, u);
      // The interval's right end is reported at the breakpoint itself, not x0 + h (rounding).
      if (isUpper ? v > tracker.max.value : v < tracker.min.value) {
        const x = u === h ? x1 : x0 + u;
        if (isUpper) tracker.max = { value: v, x };
        else tracker.min = { value: v, x };
      }
    }
  };
  const active = factors.filter((f) => f.factor !== 0);
  const bound = new Float64Array(2);
  for (let k = 0; k + 1 < grid.length; k++) {
    intervalBound(active, context.ranges, quantity, k, bound);
    const wantUpper = bound[0]! > tracker.max.value;
    const wantLower = bound[1]! < tracker.min.value;
    if (!wantUpper && !wantLower) continue;
    const o = k * COEFFICIENTS_PER_INTERVAL + offset;
    const h = grid[k + 1]! - grid[k]!;
    base.fill(0);
    for (const { caseIndex, factor } of fixed) {
      const coef = analysis.cases[caseIndex]!.curve.coef;
      for (let i = 0; i < n; i++) base[i]! += factor * coef[o + i]!;
    }
    const splits = patterned.map((f) => context.splits[quantity][f.caseIndex]![k]!);
    const cuts = splits.length === 1 ? splits[0]!.cuts : splits.length === 0 ? [0, h] : mergeSorted(splits.map((sp) => sp.cuts));
    cursor.fill(0);
    for (let c = 0; c + 1 < cuts.length; c++) {
      const a = cuts[c]!;
      const b = cuts[c + 1]!;
      if (!(b > a)) continue;
      const mid = 0.5 * (a + b);
      upper.set(base);
      lower.set(base);
      for (let p = 0; p < patterned.length; p++) {
        const factor = patterned[p]!.factor;
        const split = splits[p]!;
        while (split.cuts[cursor[p]! + 1]! < mid) cursor[p]!++;
        const at = split.at + cursor[p]! * n;
        const toUpper = factor > 0 ? split.positive : split.negative;
        const toLower = factor > 0 ? split.negative : split.positive;
        for (let i = 0; i < n; i++) {
          upper[i]! += factor * toUpper[at + i]!;
          lower[i]! += factor * toLower[at + i]!;
        }
      }
      if (wantUpper) visit(upper, a, b, grid[k]!, h, grid[k + 1]!, true);
      if (wantLower) visit(lower, a, b, grid[k]!, h, grid[k + 1]!, false);
    }
  }
}

/** Ascending union of sorted cut lists (k-way merge, duplicates dropped). */
function mergeSorted(lists: number[][]): number[] {
  const out: number[] = [];
  const at = new Int32Array(lists.length);
  for (;;) {
    let best = Infinity;
    for (let i = 0; i < lists.length; i++) if (at[i]! < lists[i]!.length && lists[i]![at[i]!]! < best) best = lists[i]![at[i]!]!;
    if (best === Infinity) return out;
    out.push(best);
    for (let i = 0; i < lists.length; i++) while (at[i]! < lists[i]!.length && lists[i]![at[i]!] === best) at[i]!++;
  }
}

/**
 * Starts the trackers from the envelope at every breakpoint (both sides), so the bounds in
 * `visitFactorSet` can skip most sub-intervals: extremes often sit at supports and loads.
 */
function seedWithBreakpoints(context: EnvelopeExtremesContext, factors: FactorSet, quantity: EnvelopeQuantity, tracker: Tracker): void {
  const { analysis } = context;
  const grid = analysis.grid;
  const ends = context.ends[quantity];
  const stride = 3 * analysis.cases.length;
  const sets = [factors];
  const pair = new Float64Array(2);
  for (let k = 0; k + 1 < grid.length; k++) {
    for (let end = 0; end < 2; end++) {
      envelopeOfSets(sets, ends, (2 * k + end) * stride, pair, 0);
      const x = grid[k + end]!;
      const max = pair[0]!;
      const min = pair[1]!;
      if (max > tracker.max.value) tracker.max = { value: max, x };
      if (min < tracker.min.value) tracker.min = { value: min, x };
    }
  }
}
