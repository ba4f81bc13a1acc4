import { describe, expect, it } from "vitest";
import type { BeamNode } from "./beamModelSchema.js";
import { elementDofs, numberDofs } from "./numberDofs.js";

const at = (x: number, extra: Partial<BeamNode> = {}): BeamNode => ({ x, ...extra });

describe("numberDofs", () => {
  it.each([
    { name: "free-free beam", nodes: [at(0), at(1), at(2)], count: 6, band: 3 },
    { name: "simply supported", nodes: [at(0, { support: { type: "pinned" } }), at(4, { support: { type: "pinned" } })], count: 2, band: 1 },
    { name: "fixed-fixed", nodes: [at(0, { support: { type: "fixed" } }), at(2), at(4, { support: { type: "fixed" } })], count: 2, band: 1 },
    { name: "guided end", nodes: [at(0, { support: { type: "guided" } }), at(3)], count: 3, band: 2 },
    {
      name: "hinge on a pinned node",
      nodes: [at(0, { support: { type: "fixed" } }), at(3, { hinge: true, support: { type: "pinned" } }), at(5)],
      count: 4,
      band: 2,
    },
    { name: "free hinge", nodes: [at(0, { support: { type: "fixed" } }), at(3, { hinge: true }), at(5), at(6)], count: 7, band: 3 },
  ])("numbers the free DOFs of a $name", ({ nodes, count, band }) => {
    const dofs = numberDofs({ nodes });
    expect(dofs.count).toBe(count);
    expect(dofs.halfBandwidth).toBe(band);
  });

  it("gives a hinged node separate left and right rotations around its uy", () => {
    const dofs = numberDofs({ nodes: [at(0, { support: { type: "fixed" } }), at(3, { hinge: true }), at(5)] });
    expect([dofs.rzLeft[1], dofs.uy[1], dofs.rzRight[1]]).toEqual([0, 1, 2]);
    expect(elementDofs(dofs, 0)).toEqual([-1, -1, 1, 0]);
    expect(elementDofs(dofs, 1)).toEqual([1, 2, 3, 4]);
  });
});
