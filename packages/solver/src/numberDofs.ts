import type { BeamModel } from "./beamModelSchema.js";

/**
 * Global numbering of the free degrees of freedom: uy and rz per node, numbered left to right so
 * the stiffness matrix is banded. A hinged node has two rotations, rzLeft (seen by the segment on
 * its left) and rzRight, numbered [rzLeft, uy, rzRight] to keep the half-bandwidth at 3.
 * Restrained DOFs (uy of pinned/fixed, rz of fixed/guided) get −1 and stay out of the system.
 */
export interface DofMap {
  count: number;
  halfBandwidth: number;
  uy: Int32Array;
  rzLeft: Int32Array;
  rzRight: Int32Array;
}

export function restrainsUy(type: string | undefined): boolean {
  return type === "pinned" || type === "fixed";
}

export function restrainsRz(type: string | undefined): boolean {
  return type === "fixed" || type === "guided";
}

export function numberDofs(model: Pick<BeamModel, "nodes">): DofMap {
  const n = model.nodes.length;
  const uy = new Int32Array(n).fill(-1);
  const rzLeft = new Int32Array(n).fill(-1);
  const rzRight = new Int32Array(n).fill(-1);
  let next = 0;
  for (let i = 0; i < n; i++) {
    const node = model.nodes[i]!;
    const type = node.support?.type;
    if (node.hinge) {
      rzLeft[i] = next++;
      if (!restrainsUy(type)) uy[i] = next++;
      rzRight[i] = next++;
      continue;
    }
    if (!restrainsUy(type)) uy[i] = next++;
    if (!restrainsRz(type)) rzLeft[i] = rzRight[i] = next++;
  }
  let halfBandwidth = 0;
  for (let e = 0; e + 1 < n; e++) {
    const dofs = elementDofs({ count: next, halfBandwidth: 0, uy, rzLeft, rzRight }, e).filter((d) => d >= 0);
    if (dofs.length > 1) halfBandwidth = Math.max(halfBandwidth, Math.max(...dofs) - Math.min(...dofs));
  }
  return { count: next, halfBandwidth, uy, rzLeft, rzRight };
}

/** The global DOFs of segment e in the element order (uy₁, rz₁, uy₂, rz₂); −1 where restrained. */
export function elementDofs(dofs: DofMap, e: number): [number, number, number, number] {
  return [dofs.uy[e]!, dofs.rzRight[e]!, dofs.uy[e + 1]!, dofs.rzLeft[e + 1]!];
}
