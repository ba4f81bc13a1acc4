import { describe, expect, it } from "vitest";
import { analyze } from "./analyze.js";
import { beamModelSchema } from "./beamModelSchema.js";
import { envelopeAt } from "./envelopeQueries.js";
import { diagram, extremes, ExtremeTracker, locateInterval, valuesAt, visitPolynomialExtremes } from "./fieldQueries.js";

const E = 2e11;
const I = 8e-5;

/** Two equal spans on pins; dead load D, patterned live load L, combination C = 1.2D + 1.6L. */
function twoSpans() {
  return beamModelSchema.parse({
    format: "spanwright.beam/1",
    nodes: [0, 6, 12].map((x) => ({ x, support: { type: "pinned" } })),
    segments: [{ E, I }, { E, I }],
    loadCases: [
      { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 12, qy1: -2e3, qy2: -2e3 }, { type: "point", x: 3, fy: -10e3 }] },
      { id: "L", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: 12, qy1: -5e3, qy2: -5e3 }] },
    ],
    combinations: [{ id: "C", factors: { D: 1.2, L: 1.6 } }],
  });
}

describe("field queries", () => {
  const analysis = analyze(twoSpans());

  it("locates breakpoints on the requested side", () => {
    expect(locateInterval([0, 3, 6, 12], 3, "right")).toBe(1);
    expect(locateInterval([0, 3, 6, 12], 3, "left")).toBe(0);
    expect(locateInterval([0, 3, 6, 12], 12, "right")).toBe(2);
    expect(locateInterval([0, 3, 6, 12], 0, "left")).toBe(0);
  });

  it("reads V on either side of a point load: the jump equals the load", () => {
    const left = valuesAt(analysis, "D", 3, "left")!;
    const right = valuesAt(analysis, "D", 3, "right")!;
    expect(left.V - right.V).toBeCloseTo(10e3, 8);
    expect(left.M).toBeCloseTo(right.M, 8);
  });

  it("returns undefined for an unknown id", () => {
    expect(valuesAt(analysis, "nope", 1)).toBeUndefined();
    expect(envelopeAt(analysis, "nope", 1)).toBeUndefined();
  });

  it("draws a jump as two points at the same x", () => {
    const d = diagram(analysis, "D", "V", 4)!;
    const at3 = Array.from(d.x).flatMap((x, i) => (x === 3 ? [d.y[i]!] : []));
    expect(at3).toHaveLength(2);
    expect(at3[0]! - at3[1]!).toBeCloseTo(10e3, 8);
  });

  it("finds the exact extreme between samples (root of V)", () => {
    const e = extremes(analysis, "C")!;
    const atMax = valuesAt(analysis, "C", e.Mmax.x)!;
    expect(Math.abs(atMax.V) < 1e-6 || e.Mmax.x === 3).toBe(true);
    const d = diagram(analysis, "C", "M", 64)!;
    expect(e.Mmax.value).toBeGreaterThanOrEqual(Math.max(...d.y) - 1e-9);
  });
});

describe("visitPolynomialExtremes on [lo, h]", () => {
  // Values by hand (common practice): u³ − 3u has its extremes at u = ±1, p(−1) = 2 and p(1) = −2.
  it.each([
    { name: "cubic with both extremes inside", coef: [0, -3, 0, 1], lo: -1.5, hi: 1.5, range: [-2, 2] },
    { name: "cubic whose extremes are its ends", coef: [0, -3, 0, 1], lo: 2, hi: 3, range: [2, 18] },
    { name: "parabola peaking inside", coef: [0, 4, -1], lo: 0, hi: 3, range: [0, 4] },
    { name: "line", coef: [1, -2], lo: 0, hi: 2, range: [-3, 1] },
    { name: "constant", coef: [7], lo: 0, hi: 2, range: [7, 7] },
  ])("gives the least and greatest value of a $name", ({ coef, lo, hi, range }) => {
    const tracker = new ExtremeTracker();
    visitPolynomialExtremes(coef, 0, coef.length - 1, hi, 0, hi, new Float64Array(6), tracker, lo);
    expect(tracker.minValue).toBeCloseTo(range[0]!, 12);
    expect(tracker.maxValue).toBeCloseTo(range[1]!, 12);
  });
});
