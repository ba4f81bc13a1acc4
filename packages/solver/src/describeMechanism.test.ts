import { describe, expect, it } from "vitest";
import type { BeamNode } from "./beamModelSchema.js";
import { SolverError } from "./errors.js";
import { solve } from "./solve.js";

const steel = { E: 2e11, I: 8e-5 };

function beam(nodes: BeamNode[]) {
  return {
    format: "spanwright.beam/1",
    nodes,
    segments: nodes.slice(1).map(() => steel),
    loadCases: [{ id: "D", category: "dead", loads: [{ type: "point", x: nodes[1]!.x / 2, fy: -1000 }] }],
  };
}

function mechanismOf(model: unknown): SolverError {
  try {
    solve(model);
  } catch (error) {
    if (error instanceof SolverError) return error;
    throw error;
  }
  throw new Error("expected a mechanism");
}

describe("mechanism errors name the free part in plain words", () => {
  it.each([
    {
      name: "no supports",
      nodes: [{ x: 0 }, { x: 4 }, { x: 9 }],
      message: /the whole beam \(x = 0 m to 9 m\) can move up and down freely/,
      where: "nodes 0 to 2 (x = 0 m to 9 m)",
    },
    {
      name: "a single pin (rigid rotation)",
      nodes: [{ x: 0, support: { type: "pinned" as const } }, { x: 5 }],
      message: /the whole beam \(x = 0 m to 5 m\) can rotate about the support at x = 0 m/,
      where: "nodes 0 to 1 (x = 0 m to 5 m)",
    },
    {
      name: "a hinge that frees the overhang",
      nodes: [{ x: 0, support: { type: "pinned" as const } }, { x: 6, support: { type: "pinned" as const } }, { x: 8.5, hinge: true }, { x: 12 }],
      message: /the part from x = 8\.5 m to 12 m can rotate about the hinge at x = 8\.5 m/,
      where: "nodes 2 to 3 (x = 8.5 m to 12 m)",
    },
    {
      name: "guided supports only",
      nodes: [{ x: 0, support: { type: "guided" as const } }, { x: 3 }, { x: 7, support: { type: "guided" as const } }],
      message: /the whole beam \(x = 0 m to 7 m\) can move up and down freely/,
      where: "nodes 0 to 2 (x = 0 m to 7 m)",
    },
    {
      name: "three hinges inside one span",
      nodes: [{ x: 0, support: { type: "fixed" as const } }, { x: 2, hinge: true }, { x: 3, hinge: true }, { x: 4, hinge: true }, { x: 6, support: { type: "fixed" as const } }],
      message: /the part from x = 2 m to 4 m can move without bending through the hinges at x = 2 m, x = 3 m, x = 4 m/,
      where: "nodes 1 to 3 (x = 2 m to 4 m)",
    },
    {
      name: "a rotational spring only",
      nodes: [{ x: 0, support: { type: "spring" as const, kr: 1e6 } }, { x: 5 }],
      message: /can move up and down freely/,
      where: "nodes 0 to 1 (x = 0 m to 5 m)",
    },
  ])("reports $name", ({ nodes, message, where }) => {
    const error = mechanismOf(beam(nodes));
    expect(error.code).toBe("mechanism");
    expect(error.message).toMatch(/^the beam cannot carry load: /);
    expect(error.message).toMatch(message);
    expect(error.where).toBe(where);
  });

  it("accepts a soft but real spring (relative pivot test, not a mechanism)", () => {
    const model = beam([{ x: 0, support: { type: "fixed" } }, { x: 5, hinge: true }, { x: 8, support: { type: "spring", ky: 1 } }]);
    expect(() => solve(model)).not.toThrow();
  });
});
