import { describe, expect, it } from "vitest";
import { AppError } from "../http/appError.js";
import { checkModelSize, measureWork, runSolver, type Engine } from "./engine.js";

const failing = (error: unknown): Engine => ({
  solve: () => {
    throw error;
  },
});

describe("checkModelSize", () => {
  it.each([
    ["1001 nodes", { nodes: new Array(1001).fill({}) }, "nodes"],
    ["51 load cases", { loadCases: new Array(51).fill({ loads: [] }) }, "loadCases"],
    ["501 loads in one case", { loadCases: [{ loads: [] }, { loads: new Array(501).fill({}) }] }, "loadCases[1].loads"],
    ["5001 stations", { stations: new Array(5001).fill(0) }, "stations"],
    // 1000 nodes × 500 loads: each fine alone; together 28 s of solver time on the 2-core server
    ["1000 nodes with 500 loads", { nodes: new Array(1000).fill({}), loadCases: [{ loads: new Array(500).fill({}) }] }, ""],
    ["200 nodes with a patterned case", { nodes: new Array(200).fill({}), loadCases: [{ pattern: true, loads: [] }] }, ""],
  ])("refuses %s, naming where", (_title, model, where) => {
    expect(() => checkModelSize(model)).toThrow(expect.objectContaining({ code: "too-large", details: expect.objectContaining({ where }) }));
  });

  it("accepts a model at the limits and leaves malformed shapes to the solver", () => {
    expect(() => checkModelSize({ nodes: new Array(1000).fill({}), loadCases: new Array(50).fill({ loads: [] }) })).not.toThrow();
    expect(() => checkModelSize(null)).not.toThrow();
    expect(() => checkModelSize({ nodes: "many" })).not.toThrow();
  });
});

describe("measureWork", () => {
  it.each([
    ["nodes × loads", { nodes: new Array(10).fill({}), loadCases: [{ loads: [{}, {}] }, { loads: [{}] }] }, 30],
    ["nodes³ / 20 per patterned case", { nodes: new Array(20).fill({}), loadCases: [{ pattern: true, loads: [] }, { loads: [] }] }, 400],
    ["stations × (cases + combinations)", { stations: [1, 2, 3], loadCases: [{ loads: [] }], combinations: [{}, {}] }, 9],
    ["nothing for malformed shapes", { nodes: "many", loadCases: [null, { loads: 3 }] }, 0],
  ])("counts %s", (_title, model, work) => {
    expect(measureWork(model)).toBe(work);
  });

  it("accepts an everyday beam far inside the bound: 20 spans, 5 cases of 20 loads, 2 patterned", () => {
    const cases = Array.from({ length: 5 }, (_, i) => ({ pattern: i < 2, loads: new Array(20).fill({}) }));
    expect(() => checkModelSize({ nodes: new Array(21).fill({}), loadCases: cases, stations: new Array(200).fill(0) })).not.toThrow();
  });
});

describe("runSolver", () => {
  it("turns a SolverError into a 422-coded AppError with where", async () => {
    const err = Object.assign(new Error("I must be positive"), { name: "SolverError", code: "invalid-model", where: "segments[0].I" });
    await expect(runSolver(failing(err), {})).rejects.toThrow(AppError);
    await expect(runSolver(failing(err), {})).rejects.toThrow(expect.objectContaining({ code: "invalid-model", details: { where: "segments[0].I" } }));
  });

  it("lets programmer errors through unchanged", async () => {
    const bug = new TypeError("undefined is not a function");
    await expect(runSolver(failing(bug), {})).rejects.toBe(bug);
  });

  it("parses the engine's JSON text", async () => {
    await expect(runSolver({ solve: async () => '{"format":"spanwright.result/1"}' }, {})).resolves.toEqual({ format: "spanwright.result/1" });
  });
});
