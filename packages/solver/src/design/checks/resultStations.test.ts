import { describe, expect, it } from "vitest";
import { checkStations, stationsFromResult } from "./resultStations.js";

describe("stations for checks", () => {
  it("include span ends, braces and the exact quarter points of each unbraced segment", () => {
    const xs = checkStations([0, 6, 10], [3], 4);
    for (const x of [0, 0.75, 1.5, 2.25, 3, 3.75, 4.5, 5.25, 6, 7, 8, 9, 10]) expect(xs).toContain(x);
    expect(new Set(xs).size).toBe(xs.length);
  });

  it("read one case's stations from a result in the exchange format, sorted by x", () => {
    const result = { results: { C1: { stations: [{ x: 2, V: 0, M: 1, uy: 0 }, { x: 1, V: 0, M: 2, uy: 0 }] } } };
    expect(stationsFromResult(result, "C1").map((s) => s.x)).toEqual([1, 2]);
    expect(stationsFromResult(result, "missing")).toEqual([]);
  });
});
