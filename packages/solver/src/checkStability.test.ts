import { describe, expect, it } from "vitest";
import { beamModelSchema, type BeamNode } from "./beamModelSchema.js";
import { findRigidMotion } from "./checkStability.js";
import { numberDofs } from "./numberDofs.js";
import { solve } from "./solve.js";

function isMechanism(nodes: BeamNode[]): boolean {
  const model = beamModelSchema.parse({ format: "spanwright.beam/1", nodes, segments: nodes.slice(1).map(() => ({ E: 2e11, I: 1e-4 })) });
  return findRigidMotion(model, numberDofs(model)) !== undefined;
}

const pin = { type: "pinned" as const };
const fixed = { type: "fixed" as const };
const guided = { type: "guided" as const };

describe("findRigidMotion (kinematic stability of rigid parts; common practice)", () => {
  it.each([
    { name: "simply supported", nodes: [{ x: 0, support: pin }, { x: 6, support: pin }], mechanism: false },
    { name: "cantilever", nodes: [{ x: 0, support: fixed }, { x: 3 }], mechanism: false },
    { name: "no supports", nodes: [{ x: 0 }, { x: 3 }], mechanism: true },
    { name: "a single pin", nodes: [{ x: 0, support: pin }, { x: 3 }], mechanism: true },
    { name: "guided at both ends", nodes: [{ x: 0, support: guided }, { x: 3, support: guided }], mechanism: true },
    { name: "guided and pinned", nodes: [{ x: 0, support: guided }, { x: 3, support: pin }], mechanism: false },
    { name: "a drop-in span between cantilevers", nodes: [{ x: 0, support: fixed }, { x: 2, hinge: true }, { x: 4, hinge: true }, { x: 6, support: fixed }], mechanism: false },
    { name: "three hinges in one span", nodes: [{ x: 0, support: fixed }, { x: 2, hinge: true }, { x: 3, hinge: true }, { x: 4, hinge: true }, { x: 6, support: fixed }], mechanism: true },
    { name: "a hinge on a pinned support", nodes: [{ x: 0, support: fixed }, { x: 4, hinge: true, support: pin }, { x: 8, support: pin }], mechanism: false },
    // Fixture from the verification suite: pin, hinge 0.125 m away, pin (three collinear hinges).
    { name: "pin, hinge, pin, overhang", nodes: [{ x: 0, support: pin }, { x: 0.125, hinge: true }, { x: 2.5, support: pin }, { x: 8 }], mechanism: true },
    {
      // Fixture from the verification suite: 5 restraints for 3 parts (6 rigid freedoms).
      name: "spring, hinge, guide, hinge, pin",
      nodes: [
        { x: 0, support: { type: "spring" as const, ky: 1e7 } },
        { x: 0.3375, hinge: true },
        { x: 2.25, support: guided },
        { x: 3.075, hinge: true },
        { x: 7.75, support: pin },
        { x: 14.5 },
      ],
      mechanism: true,
    },
    { name: "two supports very close together", nodes: [{ x: 0, support: pin }, { x: 1e-4, support: pin }, { x: 100 }], mechanism: false },
    // Found by the mechanism property test: 5 restraints for 3 parts, with a spring 0.1 m from a
    // hinge. The two rows are nearly parallel, and the rounding of the pivots of AᵀA (which squares
    // that) hid the zero pivot: the beam was solved, its reactions not balancing the load.
    { name: "guide, hinge, spring 0.1 m from a hinge, pin", nodes: nearlyDependent(false), mechanism: true },
    { name: "the same with a pin on the middle part", nodes: nearlyDependent(true), mechanism: false },
  ])("$name: mechanism = $mechanism", ({ nodes, mechanism }) => {
    expect(isMechanism(nodes)).toBe(mechanism);
  });
});

function nearlyDependent(pinInTheMiddle: boolean): BeamNode[] {
  return [
    { x: 0 },
    { x: 0.1375 },
    { x: 2.75, support: guided },
    { x: 5, hinge: true },
    { x: 5.45, ...(pinInTheMiddle ? { support: pin } : {}) },
    { x: 11.75, support: { type: "spring" as const, ky: 1e5 } },
    { x: 11.85, hinge: true },
    { x: 13.75, support: pin },
  ];
}

describe("a beam with nearly dependent restraints", () => {
  const model = (pinInTheMiddle: boolean) => ({
    format: "spanwright.beam/1",
    nodes: nearlyDependent(pinInTheMiddle),
    segments: Array.from({ length: 7 }, () => ({ E: 2e11, I: 1e-4 })),
    loadCases: [{ id: "D", category: "dead", loads: [{ type: "point", x: 1, fy: -1000 }] }],
  });

  it("is refused as a mechanism naming what moves, not solved", () => {
    expect(() => solve(model(false))).toThrow(expect.objectContaining({ code: "mechanism", message: expect.stringContaining("through the hinges at x = 5 m, x = 11.85 m") }));
  });

  it("with one more pin is solved, its reactions balancing the load (statics)", () => {
    const reactions = solve(model(true)).results.D!.reactions;
    expect(reactions.reduce((sum, r) => sum + r.fy, 0)).toBeCloseTo(1000, 6);
  });
});
