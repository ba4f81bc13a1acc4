import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { bandArea, bandProperties, firstMomentAbove, type Band } from "./layeredSection.js";

/** Random flanged sections (tee-like or I-like) with plates from 5 mm to 1 m. */
const flanged = fc
  .record({
    d: fc.double({ min: 0.05, max: 1.0, noNaN: true }),
    bf: fc.double({ min: 0.02, max: 0.6, noNaN: true }),
    tfRatio: fc.double({ min: 0.02, max: 0.45, noNaN: true }),
    twRatio: fc.double({ min: 0.02, max: 1, noNaN: true }),
    bottomFlange: fc.boolean(),
  })
  .map(({ d, bf, tfRatio, twRatio, bottomFlange }): Band[] => {
    const tf = tfRatio * d, tw = twRatio * bf;
    return bottomFlange
      ? [{ top: 0, bottom: tf, width: bf }, { top: tf, bottom: d - tf, width: tw }, { top: d - tf, bottom: d, width: bf }]
      : [{ top: 0, bottom: tf, width: bf }, { top: tf, bottom: d, width: tw }];
  });

describe("band integration invariants", () => {
  it("the plastic neutral axis halves the area", () => {
    fc.assert(fc.property(flanged, (bands) => {
      const p = bandProperties(bands);
      const above = bandArea(bands.map((b) => ({ ...b, bottom: Math.min(b.bottom, p.yPlastic) })).filter((b) => b.bottom > b.top));
      expect(above / p.A).toBeCloseTo(0.5, 9);
    }));
  });

  it("the shape factor Z/S is at least 1, and at most 1.5 (the rectangle's) for doubly symmetric I-shapes", () => {
    fc.assert(fc.property(flanged, (bands) => {
      const p = bandProperties(bands);
      const depth = bands[bands.length - 1]!.bottom;
      const S = p.I / Math.max(p.yTop, depth - p.yTop);
      expect(p.Z / S).toBeGreaterThanOrEqual(1 - 1e-9);
      if (bands.length === 3) expect(p.Z / S).toBeLessThanOrEqual(1.5 + 1e-9);
    }));
  });

  it("the first moment of the whole area about its centroid is zero", () => {
    fc.assert(fc.property(flanged, (bands) => {
      const p = bandProperties(bands);
      const depth = bands[bands.length - 1]!.bottom;
      expect(Math.abs(firstMomentAbove(bands, depth, p.yTop)) / (p.A * depth)).toBeLessThan(1e-9);
    }));
  });
});
