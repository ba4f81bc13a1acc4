import { describe, expect, it } from "vitest";
import { analyze } from "./analyze.js";
import { beamModelSchema } from "./beamModelSchema.js";
import { envelopeAt, envelopeDiagram, reactionEnvelope } from "./envelopeQueries.js";
import { envelopeExtremes } from "./envelopeExtremes.js";
import { extremes, valuesAt } from "./fieldQueries.js";

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

/** The same combination with the live load on the given spans only (for brute force). */
function arrangement(spans: number[]) {
  const base = twoSpans();
  return analyze({
    ...base,
    loadCases: [
      base.loadCases[0]!,
      { id: "L", category: "live", loads: spans.map((s) => ({ type: "distributed" as const, x1: 6 * s, x2: 6 * s + 6, qy1: -5e3, qy2: -5e3 })) },
    ],
  });
}

describe("pattern envelopes equal the worst arrangement (brute force over 2² arrangements)", () => {
  const analysis = analyze(twoSpans());
  const arrangements = [[], [0], [1], [0, 1]].map(arrangement);

  it.each([1.5, 3, 4.2, 6, 7.5, 11])("at x = %f m", (x) => {
    const env = envelopeAt(analysis, "C", x)!;
    const values = arrangements.map((a) => valuesAt(a, "C", x)!);
    for (const [key, max, min] of [["M", env.Mmax, env.Mmin], ["V", env.Vmax, env.Vmin], ["uy", env.uyMax, env.uyMin]] as const) {
      const all = values.map((v) => v[key]);
      expect(max).toBeCloseTo(Math.max(...all), 6);
      expect(min).toBeCloseTo(Math.min(...all), 6);
    }
  });

  it("gives envelope extremes equal to the worst arrangement's extremes", () => {
    const env = envelopeExtremes(analysis, "C")!;
    const each = arrangements.map((a) => extremes(a, "C")!);
    expect(env.Mmax.value).toBeCloseTo(Math.max(...each.map((e) => e.Mmax.value)), 6);
    expect(env.Mmin.value).toBeCloseTo(Math.min(...each.map((e) => e.Mmin.value)), 6);
    expect(env.uyMin.value).toBeCloseTo(Math.min(...each.map((e) => e.uyMin.value)), 12);
    expect(envelopeExtremes(analysis, "*")!.Mmax.value).toBe(env.Mmax.value);
  });

  it("gives reaction envelopes equal to the worst arrangement", () => {
    const rows = reactionEnvelope(analysis, "C")!;
    rows.forEach((row, r) => {
      const fy = arrangements.map((a) => a.combinations[0]!.curve.fy[r]!);
      expect(row.fyMax).toBeCloseTo(Math.max(...fy), 6);
      expect(row.fyMin).toBeCloseTo(Math.min(...fy), 6);
    });
  });

  it("samples the envelope diagram with max ≥ min everywhere", () => {
    const d = envelopeDiagram(analysis, "*", "M", 8)!;
    d.max.forEach((v, i) => expect(v).toBeGreaterThanOrEqual(d.min[i]!));
  });
});
