import { describe, expect, it } from "vitest";
import { analyze } from "./analyze.js";
import { beamModelSchema } from "./beamModelSchema.js";
import { envelopeAt } from "./envelopeQueries.js";
import { locateInterval, valuesAt } from "./fieldQueries.js";
import { curveStationRows, envelopeStationRows, placeStations } from "./stationRows.js";

const E = 2e11;
const I = 8e-5;

/** Two spans on pins with a point load mid-span: breakpoints at 0, 3, 6, 12 (invented). */
function model(stations: number[]) {
  return beamModelSchema.parse({
    format: "spanwright.beam/1",
    nodes: [0, 6, 12].map((x) => ({ x, support: { type: "pinned" } })),
    segments: [{ E, I }, { E, I }],
    loadCases: [
      { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 12, qy1: -2e3, qy2: -2e3 }, { type: "point", x: 3, fy: -10e3 }] },
      { id: "L", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: 12, qy1: -5e3, qy2: -5e3 }] },
    ],
    combinations: [
      { id: "C1", factors: { D: 1.4 } },
      { id: "C2", factors: { D: 1.2, L: 1.6 } },
    ],
    stations,
  });
}

describe("placeStations", () => {
  it("finds the same interval as the binary search for stations in any order, right of x except at the right end", () => {
    const stations = [0, 3, 2.9, 6, 12, 1, 3, 11.5, 0, 6.0000001, 12];
    const grid = analyze(model(stations)).grid;
    const places = placeStations(grid, stations);
    stations.forEach((x, i) => {
      const expected = locateInterval(grid, x, x >= 12 ? "left" : "right");
      expect(places.k[i]).toBe(expected);
      expect(places.u[i]).toBe(x - grid[expected]!);
    });
  });
});

describe("station rows", () => {
  const stations = [0, 1.5, 3, 4.5, 6, 7.5, 12, 2];
  const analysis = analyze(model(stations));
  const places = placeStations(analysis.grid, stations);

  it("give a curve's V, M, uy and rz as the point query does (right side, left at the end)", () => {
    const rows = curveStationRows(places, analysis.combinations[1]!.curve);
    stations.forEach((x, i) => {
      const expected = valuesAt(analysis, "C2", x, x >= 12 ? "left" : "right")!;
      expect(rows[i]).toEqual({ x, V: expected.V, M: expected.M, uy: expected.uy, rz: expected.rz });
    });
  });

  // The envelope rows sum a patterned case's pieces by sign before evaluating, the point query
  // after: equal up to rounding, checked to 1e-12 of the quantity's scale along the beam.
  it("give each combination's envelope, then the worst over all combinations for \"*\"", () => {
    const rows = envelopeStationRows(analysis, places);
    expect(rows).toHaveLength(3);
    for (const [r, id] of ["C1", "C2", "*"].entries()) {
      stations.forEach((x, i) => {
        const expected = envelopeAt(analysis, id, x, x >= 12 ? "left" : "right")!;
        const row = rows[r]![i]!;
        expect(row.x).toBe(x);
        for (const key of ["Vmax", "Vmin", "Mmax", "Mmin", "uyMax", "uyMin"] as const) {
          const scale = Math.max(...rows[r]!.map((other) => Math.abs(other[key])));
          expect(Math.abs(row[key] - expected[key])).toBeLessThanOrEqual(1e-12 * scale);
        }
      });
    }
  });

  it("are plain data: JSON and structured clone keep every field", () => {
    const row = curveStationRows(places, analysis.cases[0]!.curve)[1]!;
    expect(Object.keys(row)).toEqual(["x", "V", "M", "uy", "rz"]);
    expect(structuredClone(row)).toEqual(JSON.parse(JSON.stringify(row)));
  });
});
