import { describe, expect, it } from "vitest";
import { cbFromFunction, cbFromSamples } from "./aiscCb.js";

const L = 10;
/** Simply supported beam under uniform load w: M(x) = w·x·(L − x)/2 (sagging positive). */
const udl = (x: number) => (5 * x * (L - x)) / 2;

describe("Cb by AISC 360-22 eq. F1-1", () => {
  it("uniform moment gives Cb = 1.0 (AISC 360-22 Commentary §F1)", () => {
    expect(cbFromFunction(() => -120, 0, L).Cb).toBeCloseTo(1.0, 12);
  });

  it("UDL on a simple span braced at the ends only gives 12.5/11 = 1.14 (AISC Manual Table 3-1, common reference value)", () => {
    // Mmax = 1, MA = MC = 0.75, MB = 1 (as fractions of wL²/8): 12.5/(2.5 + 2.25 + 4 + 2.25) = 1.136.
    expect(cbFromFunction(udl, 0, L).Cb).toBeCloseTo(12.5 / 11, 6);
  });

  it("UDL, middle third between braces gives 1.01 (AISC Manual Table 3-1)", () => {
    expect(cbFromFunction(udl, L / 3, (2 * L) / 3).Cb).toBeCloseTo(1.01, 2);
  });

  it("linear moment from M to 0 gives 12.5/(2.5 + 2.25 + 2 + 0.75) = 1.67", () => {
    expect(cbFromFunction((x) => 100 * (1 - x / L), 0, L).Cb).toBeCloseTo(12.5 / 7.5, 6);
  });

  it("reverse curvature (M to −M) uses absolute values: 12.5/(2.5 + 1.5 + 0 + 1.5) = 2.27", () => {
    expect(cbFromFunction((x) => 100 * (1 - (2 * x) / L), 0, L).Cb).toBeCloseTo(12.5 / 5.5, 6);
  });

  it("samples that include the quarter points give the same Cb as the function", () => {
    const samples = Array.from({ length: 41 }, (_, i) => ({ x: (i * L) / 40, M: udl((i * L) / 40) }));
    expect(cbFromSamples(samples, 0, L).Cb).toBeCloseTo(12.5 / 11, 6);
  });

  it("a segment carrying no moment falls back to the permitted Cb = 1.0", () => {
    expect(cbFromFunction(() => 0, 0, L).Cb).toBe(1);
  });
});
