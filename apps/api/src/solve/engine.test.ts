import { describe, expect, it } from "vitest";
import { AppError } from "../http/appError.js";
import { checkModelSize, runSolver, type Engine } from "./engine.js";

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
  ])("refuses %s, naming where", (_title, model, where) => {
    expect(() => checkModelSize(model)).toThrow(expect.objectContaining({ code: "too-large", details: expect.objectContaining({ where }) }));
  });

  it("accepts a model at the limits and leaves malformed shapes to the solver", () => {
    expect(() => checkModelSize({ nodes: new Array(1000).fill({}), loadCases: new Array(50).fill({ loads: [] }) })).not.toThrow();
    expect(() => checkModelSize(null)).not.toThrow();
    expect(() => checkModelSize({ nodes: "many" })).not.toThrow();
  });
});

describe("runSolver", () => {
  it("turns a SolverError into a 422-coded AppError with where", () => {
    const err = Object.assign(new Error("I must be positive"), { name: "SolverError", code: "invalid-model", where: "segments[0].I" });
    expect(() => runSolver(failing(err), {})).toThrow(AppError);
    expect(() => runSolver(failing(err), {})).toThrow(expect.objectContaining({ code: "invalid-model", details: { where: "segments[0].I" } }));
  });

  it("lets programmer errors through unchanged", () => {
    const bug = new TypeError("undefined is not a function");
    expect(() => runSolver(failing(bug), {})).toThrow(bug);
  });
});
