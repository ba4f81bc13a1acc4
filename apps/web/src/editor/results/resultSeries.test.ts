import { describe, expect, it } from "vitest";
import { analyze, beamModelSchema } from "@spanwright/solver";
import { createTemplate } from "../model/templates";
import { toExchange } from "../model/exchange";
import { readAt, reactionsFor, seriesFor, targetName, defaultTarget } from "./resultSeries";

// Simple span L = 6 m under a uniform load q (template: D = 5 kN/m, L = 8 kN/m, both downward).
// Handbook simple-beam case (AISC Steel Construction Manual Table 3-23, case 1, cited from
// memory): M_max = qL²/8 at midspan,
// reactions qL/2, deflection 5qL⁴/(384EI).
const L = 6;
const E = 2e11;
const I = 8e-5;

describe("results read from the engine for the editor", () => {
  const doc = createTemplate("simple-span", "si");
  const analysis = analyze(beamModelSchema.parse(toExchange(doc)));

  it("moment extreme of the dead case is qL²/8 at midspan", () => {
    const series = seriesFor(analysis, "D", false, "M")!;
    expect(series.max!.value).toBeCloseTo((5000 * L * L) / 8, 6);
    expect(series.max!.x).toBeCloseTo(L / 2, 9);
  });

  it("hover reads exact deflection 5qL⁴/384EI at midspan", () => {
    const values = readAt(analysis, "D", false, L / 2)!;
    expect(values.uy[0]).toBeCloseTo((-5 * 5000 * L ** 4) / (384 * E * I), 12);
  });

  it("the default view is the envelope over all combinations, whose moment includes the factors", () => {
    const target = defaultTarget(doc)!;
    expect(target).toEqual({ kind: "envelope", id: "*" });
    const name = targetName(doc, target)!;
    const series = seriesFor(analysis, name, true, "M")!;
    expect(series.lines).toHaveLength(2);
    // 1.2·5 + 1.6·8 = 18.8 kN/m on one span: the pattern cannot make it worse than all loaded.
    expect(series.max!.value).toBeCloseTo((18800 * L * L) / 8, 4);
  });

  it("reactions of the dead case are qL/2 upward at each support", () => {
    const rows = reactionsFor(analysis, "D", false);
    expect(rows.map((r) => r.fy[0])).toEqual([expect.closeTo(15000, 6), expect.closeTo(15000, 6)]);
  });

  it("searches an envelope's extremes once per analysis, for every quantity the views ask for", () => {
    const first = seriesFor(analysis, "*", true, "V")!;
    const again = seriesFor(analysis, "*", true, "V")!;
    expect(again.max).toBe(first.max); // the same object: not searched again
    const other = analyze(beamModelSchema.parse(toExchange(doc)));
    expect(seriesFor(other, "*", true, "V")!.max).not.toBe(first.max);
    expect(seriesFor(other, "*", true, "V")!.max).toEqual(first.max);
  });

  it("rotation has no envelope in the contract", () => {
    expect(seriesFor(analysis, "*", true, "rz")).toBeNull();
  });
});
