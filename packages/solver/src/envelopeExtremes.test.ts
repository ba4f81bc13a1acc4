import { describe, expect, it } from "vitest";
import type { Analysis, Curve } from "./analysisTypes.js";
import { prepareEnvelopeExtremes } from "./envelopeExtremes.js";
import { COEFFICIENTS_PER_INTERVAL, V_OFFSET } from "./segmentField.js";

/** A curve on one interval whose shear is c₀ + c₁u (other quantities zero). */
function shearCurve(c0: number, c1: number): Curve {
  const coef = new Float64Array(COEFFICIENTS_PER_INTERVAL);
  coef[V_OFFSET] = c0;
  coef[V_OFFSET + 1] = c1;
  const none = new Float64Array(2);
  return { coef, uy: none, rzLeft: none, rzRight: none, fy: new Float64Array(0), mz: new Float64Array(0) };
}

/** One interval [0, 4] and one patterned case made of the given pieces. */
function patternedAnalysis(pieces: Curve[]): Analysis {
  return {
    theory: "euler-bernoulli",
    nodes: [],
    supportedNodes: [],
    spans: [],
    grid: Float64Array.from([0, 4]),
    cases: [{ id: "L", category: "live", pattern: true, curve: shearCurve(0, 0), pieces: pieces.map((curve, span) => ({ span, curve })) }],
    combinations: [],
    stations: [],
  } as unknown as Analysis;
}

describe("sign splits of a patterned case", () => {
  // Regression: two pieces changing sign one rounding step apart leave a sub-interval one ulp wide,
  // where evaluating a piece gives rounding noise. Each piece must still be on its true side on
  // both wide stretches: both negative before the pair of roots, both positive after.
  it("keep every piece on its true side when two roots are one rounding step apart", () => {
    const r = 0.2527056730124345;
    const r2 = r + Number.EPSILON * r; // the next double above r (r in [0.25, 0.5))
    expect(r2).toBeGreaterThan(r);
    const a = shearCurve(-r, 1); // V = u − r
    const b = shearCurve(-2 * r2, 2); // V = 2(u − r2)
    const split = prepareEnvelopeExtremes(patternedAnalysis([a, b])).splits.V[0]![0]!;
    expect(split.cuts).toEqual([0, r, r2, 4]);
    const n = 3; // V has degree 2
    const sub = (s: number, side: Float64Array) => Array.from(side.subarray(s * n, s * n + n));
    expect(sub(0, split.positive)).toEqual([0, 0, 0]);
    expect(sub(0, split.negative)).toEqual([-r - 2 * r2, 3, 0]);
    expect(sub(2, split.positive)).toEqual([-r - 2 * r2, 3, 0]);
    expect(sub(2, split.negative)).toEqual([0, 0, 0]);
  });

  // A piece added to a side and later taken away must not leave its rounding there: the sums can
  // be far smaller than the pieces that passed through them (here 1 beside pieces of 2⁵⁸ and more).
  it("leave no rounding behind when large pieces move to the other side", () => {
    const big = 2 ** 60;
    const a = shearCurve(big / 4, -big); // positive left of u = 0.25
    const one = shearCurve(1, 0); // positive throughout
    const c = shearCurve(big / 2, -big); // positive left of u = 0.5
    const split = prepareEnvelopeExtremes(patternedAnalysis([a, one, c])).splits.V[0]![0]!;
    expect(split.cuts).toEqual([0, 0.25, 0.5, 4]);
    const n = 3;
    expect(Array.from(split.positive.subarray(2 * n, 3 * n))).toEqual([1, 0, 0]);
    expect(Array.from(split.negative.subarray(2 * n, 3 * n))).toEqual([(3 * big) / 4, -2 * big, 0]);
  });
});
