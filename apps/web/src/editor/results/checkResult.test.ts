import { describe, expect, it } from "vitest";
import { buildSolveResult, tryAnalyze } from "@spanwright/solver";
import { createTemplate } from "../model/templates";
import { toExchange } from "../model/exchange";
import { resultAtStations, resultIds } from "./checkResult";

describe("check stations read from the worker's analysis", () => {
  const model = toExchange(createTemplate("two-equal-spans", "si"));
  const xs = [0, 1.5, 3, 6, 9, 12].filter((x) => x <= model.nodes[model.nodes.length - 1]!.x);

  it("equal the engine's own result when solved with the same stations", () => {
    const plain = tryAnalyze(model);
    const withStations = tryAnalyze({ ...model, stations: xs });
    if (!plain.ok || !withStations.ok) throw new Error("template should solve");
    const ours = resultAtStations(plain.value, resultIds(plain.value), xs);
    const engine = buildSolveResult(withStations.value);
    for (const id of resultIds(plain.value)) {
      const expected = engine.results[id]!.stations;
      const got = ours.results[id]!.stations!;
      expect(got.map((s) => s.x)).toEqual(expected.map((s) => s.x));
      got.forEach((s, i) => {
        const scale = Math.max(1, Math.abs(expected[i]!.M));
        expect(Math.abs(s.M - expected[i]!.M) / scale).toBeLessThan(1e-9);
        expect(s.V).toBeCloseTo(expected[i]!.V, 6);
        expect(s.uy).toBeCloseTo(expected[i]!.uy, 12);
      });
    }
  });

  it("leaves out an id the analysis does not know", () => {
    const plain = tryAnalyze(model);
    if (!plain.ok) throw new Error("template should solve");
    expect(resultAtStations(plain.value, ["nope"], xs).results["nope"]).toBeUndefined();
  });
});
