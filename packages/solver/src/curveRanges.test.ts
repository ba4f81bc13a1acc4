import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Analysis, Curve } from "./analysisTypes.js";
import { analyze } from "./analyze.js";
import { beamModelSchema } from "./beamModelSchema.js";
import { combinationExtremes, curveRanges, extremesOfRanges } from "./curveRanges.js";
import { curveExtremes } from "./fieldQueries.js";
import { COEFFICIENTS_PER_INTERVAL, M_OFFSET } from "./segmentField.js";
import { stationValues, placeStations } from "./stationRows.js";
import { beamShapeArb, loadsArb, stationsArb, toModel } from "./testing/arbitraries.js";

/**
 * The pruned searches must give exactly what the plain left-to-right search over every interval
 * gives (`curveExtremes`): the same values and the same x, also where an extreme repeats.
 */
describe("extremes from interval ranges", () => {
  it("equal the full search for cases and combinations, with or without station samples", () => {
    const arb = beamShapeArb().chain((shape) =>
      fc.record({
        shape: fc.constant(shape),
        a: loadsArb(shape.nodes),
        b: loadsArb(shape.nodes),
        stations: stationsArb(shape.nodes, 30),
        fa: fc.double({ min: -2, max: 2, noNaN: true }),
        fb: fc.double({ min: -2, max: 2, noNaN: true }),
      }),
    );
    fc.assert(
      fc.property(arb, ({ shape, a, b, stations, fa, fb }) => {
        const model = toModel(shape, [{ id: "A", category: "dead", loads: a }, { id: "B", category: "live", pattern: true, loads: b }], {
          combinations: [{ id: "C", factors: { A: fa, B: fb } }],
          stations,
        });
        const analysis = analyze(beamModelSchema.parse(model));
        const ranges = analysis.cases.map((c) => curveRanges(analysis.grid, c.curve));
        analysis.cases.forEach((c, i) => expect(extremesOfRanges(ranges[i]!)).toEqual(curveExtremes(analysis.grid, c.curve)));
        const combination = analysis.combinations[0]!;
        const expected = curveExtremes(analysis.grid, combination.curve);
        expect(combinationExtremes(analysis, combination, ranges)).toEqual(expected);
        const places = placeStations(analysis.grid, analysis.stations);
        expect(combinationExtremes(analysis, combination, ranges, { values: stationValues(places, combination.curve), x: places.x })).toEqual(expected);
      }),
      { numRuns: 200 },
    );
  }, 60_000);

  it("keep the first x of a repeated extreme", () => {
    // M = u(1 − u) on both intervals of [0, 1, 2]: equal peaks of 1/4 at x = 0.5 and 1.5, exactly
    // (by hand: the derivative 1 − 2u vanishes at u = 1/2)
    const coef = new Float64Array(2 * COEFFICIENTS_PER_INTERVAL);
    for (const k of [0, 1]) coef.set([0, 1, -1], k * COEFFICIENTS_PER_INTERVAL + M_OFFSET);
    const none = new Float64Array(3);
    const curve: Curve = { coef, uy: none, rzLeft: none, rzRight: none, fy: none, mz: none };
    const twice: Curve = { ...curve, coef: coef.map((c) => 2 * c) };
    const analysis = { grid: Float64Array.from([0, 1, 2]), cases: [{ curve }], combinations: [] } as unknown as Analysis;
    const ranges = [curveRanges(analysis.grid, curve)];
    expect(extremesOfRanges(ranges[0]!).Mmax).toEqual({ value: 0.25, x: 0.5 });
    const combination = { factors: [{ caseIndex: 0, factor: 2 }], curve: twice };
    expect(combinationExtremes(analysis, combination, ranges).Mmax).toEqual({ value: 0.5, x: 0.5 });
    const places = placeStations(analysis.grid, [0, 0.5, 1, 1.5, 2]);
    expect(combinationExtremes(analysis, combination, ranges, { values: stationValues(places, twice), x: places.x }).Mmax).toEqual({ value: 0.5, x: 0.5 });
  });
});
