import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Analysis, Curve } from "./analysisTypes.js";
import { analyze } from "./analyze.js";
import { beamModelSchema } from "./beamModelSchema.js";
import { envelopeExtremesOf, prepareEnvelopeExtremes } from "./envelopeExtremes.js";
import { ENVELOPE_QUANTITIES, envelopeFactorSets, evaluateCaseParts } from "./envelopeQueries.js";
import { envelopeStationRows, placeStations } from "./stationRows.js";
import { beamShapeArb, loadsArb, stationsArb, toModel } from "./testing/arbitraries.js";
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
    const sub = (s: number, side: Float64Array) => Array.from(side.subarray(split.at + s * n, split.at + s * n + n));
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
    expect(Array.from(split.positive.subarray(split.at + 2 * n, split.at + 3 * n))).toEqual([1, 0, 0]);
    expect(Array.from(split.negative.subarray(split.at + 2 * n, split.at + 3 * n))).toEqual([(3 * big) / 4, -2 * big, 0]);
  });
});

describe("interval ranges of the cases", () => {
  // An invented three-span beam with an overhang: a patterned live load, a dead load with a point
  // load. The ranges prune whole intervals, so each must hold every value of its part (a bound) and
  // be reached (exact: within rounding of the densest sample).
  const analysis = analyze(
    beamModelSchema.parse({
      format: "spanwright.beam/1",
      nodes: [{ x: 0, support: { type: "pinned" } }, { x: 5, support: { type: "pinned" } }, { x: 11, support: { type: "pinned" } }, { x: 15, support: { type: "pinned" } }, { x: 17 }],
      segments: [{ E: 2e11, I: 8e-5 }, { E: 2e11, I: 8e-5 }, { E: 2e11, I: 8e-5 }, { E: 2e11, I: 8e-5 }],
      loadCases: [
        { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 17, qy1: -10e3, qy2: -10e3 }, { type: "point", x: 7, fy: -30e3 }] },
        { id: "L", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: 17, qy1: -20e3, qy2: -5e3 }] },
      ],
    }),
  );
  const { ranges } = prepareEnvelopeExtremes(analysis);
  const grid = analysis.grid;
  const parts = new Float64Array(3 * analysis.cases.length);

  it.each(ENVELOPE_QUANTITIES)("bound and reach the values of every case and part (%s)", (quantity) => {
    for (let k = 0; k + 1 < grid.length; k++) {
      const h = grid[k + 1]! - grid[k]!;
      // per case: [least value, greatest value] for D; [least negative part, greatest positive part] for L
      const seen = [Infinity, -Infinity, Infinity, -Infinity];
      for (let i = 0; i <= 4000; i++) {
        evaluateCaseParts(analysis, k, (h * i) / 4000, quantity, parts);
        seen[0] = Math.min(seen[0]!, parts[0]!);
        seen[1] = Math.max(seen[1]!, parts[0]!);
        seen[2] = Math.min(seen[2]!, parts[5]!);
        seen[3] = Math.max(seen[3]!, parts[4]!);
      }
      // [least, greatest] of D, then of L's negative and positive parts
      const range = ranges.flatMap((r) => [r[quantity][4 * k]!, r[quantity][4 * k + 1]!]);
      const scale = Math.max(...seen.map(Math.abs));
      seen.forEach((value, i) => {
        const isLeast = i % 2 === 0;
        expect(isLeast ? range[i]! <= value + 1e-12 * scale : range[i]! >= value - 1e-12 * scale, `${quantity} interval ${k} bound ${i}`).toBe(true);
        expect(Math.abs(range[i]! - value), `${quantity} interval ${k} bound ${i} reached`).toBeLessThan(1e-6 * scale);
      });
    }
  });
});

describe("envelope extremes skipping intervals", () => {
  // The interval ranges and the station seeds only skip work: the extremes, value and x, must be
  // those of the search over every sub-interval of every interval (ranges made unbounded).
  it("equal the search over every interval", () => {
    const arb = beamShapeArb().chain((shape) =>
      fc.record({
        shape: fc.constant(shape),
        a: loadsArb(shape.nodes),
        b: loadsArb(shape.nodes),
        c: loadsArb(shape.nodes),
        stations: stationsArb(shape.nodes, 40),
        factors: fc.array(fc.double({ min: -2, max: 2, noNaN: true }), { minLength: 6, maxLength: 6 }),
      }),
    );
    fc.assert(
      fc.property(arb, ({ shape, a, b, c, stations, factors }) => {
        const model = toModel(
          shape,
          [
            { id: "A", category: "dead", loads: a },
            { id: "B", category: "live", pattern: true, loads: b },
            { id: "C", category: "snow", pattern: true, loads: c },
          ],
          {
            combinations: [
              { id: "X", factors: { A: factors[0]!, B: factors[1]!, C: factors[2]! } },
              { id: "Y", factors: { A: factors[3]!, B: factors[4]!, C: factors[5]! } },
            ],
            stations,
          },
        );
        const analysis = analyze(beamModelSchema.parse(model));
        const context = prepareEnvelopeExtremes(analysis);
        const infinite = (values: Float64Array) => values.map((v, i) => (i % 4 === 0 ? -Infinity : i % 4 === 1 ? Infinity : v));
        const unbounded = { ...context, ranges: context.ranges.map((r) => ({ V: infinite(r.V), M: infinite(r.M), uy: infinite(r.uy) })) };
        const places = placeStations(analysis.grid, analysis.stations);
        const peaks = new Float64Array(12 * analysis.combinations.length);
        envelopeStationRows(analysis, places, context, peaks);
        analysis.combinations.forEach((combination, i) => {
          const sets = envelopeFactorSets(analysis, combination.id)!;
          const expected = envelopeExtremesOf(unbounded, sets);
          expect(envelopeExtremesOf(context, sets)).toEqual(expected);
          expect(envelopeExtremesOf(context, sets, peaks.subarray(12 * i, 12 * i + 12))).toEqual(expected);
        });
      }),
      { numRuns: 150 },
    );
  }, 60_000);
});
