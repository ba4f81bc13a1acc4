import type { BeamModel } from "./beamModelSchema.js";
import { addToBanded, createBandedMatrix, factorBanded } from "./bandedMatrix.js";
import type { DofMap } from "./numberDofs.js";

/**
 * A rank test on geometry alone is far better conditioned than pivots of the stiffness matrix,
 * whose rounding grows with the contrast between stiff and soft segments. The tolerance applies
 * to pivots of AᵀA (A: constraint rows of order 1), where rounding stays near 1e-16.
 */
export const KINEMATIC_TOLERANCE = 1e-13;

/**
 * Kinematic stability: is the beam, taken as rigid parts joined at its hinges, held by its
 * supports? Each part p has a deflection v_p at its left end and a rotation θ_p (scaled by the
 * beam length so both unknowns are in metres); hinges keep uy continuous, supports hold uy
 * (pinned, fixed, ky) or rz (fixed, guided, kr). Elastic bending never helps a mechanism, so the
 * beam can carry load exactly when these constraints leave no rigid motion. Returns the rigid
 * motion as a vector over the free DOFs (for `describeMechanism`), or undefined when stable.
 */
export function findRigidMotion(model: BeamModel, dofs: DofMap): Float64Array | undefined {
  const nodes = model.nodes;
  const n = nodes.length;
  const length = nodes[n - 1]!.x - nodes[0]!.x;
  // partStart[p]: first node of part p; an interior hinge node starts a new part (and ends the last).
  const partOfNode = new Int32Array(n);
  const partStart: number[] = [];
  for (let i = 0; i < n; i++) {
    if (i === 0 || (nodes[i]!.hinge && i < n - 1)) partStart.push(i);
    partOfNode[i] = partStart.length - 1;
  }
  const parts = partStart.length;
  const normal = createBandedMatrix(2 * parts, 3);
  // Adds the outer product of one constraint row (≤ 3 non-zeros at i0…) to AᵀA.
  const row = new Float64Array(3);
  const cols = new Int32Array(3);
  const addRow = (count: number) => {
    for (let a = 0; a < count; a++) for (let b = 0; b <= a; b++) addToBanded(normal, cols[a]!, cols[b]!, row[a]! * row[b]!);
  };
  const set = (slot: number, col: number, value: number) => {
    cols[slot] = col;
    row[slot] = value;
  };
  const lever = (p: number, x: number) => (x - nodes[partStart[p]!]!.x) / length;
  for (let i = 0; i < n; i++) {
    const node = nodes[i]!;
    const p = partOfNode[i]!;
    if (node.hinge && i > 0 && i < n - 1 && p > 0) {
      // Left part p−1 ends here; the right part p starts here (lever 0).
      set(0, 2 * (p - 1), 1);
      set(1, 2 * (p - 1) + 1, lever(p - 1, node.x));
      set(2, 2 * p, -1);
      addRow(3);
    }
    const support = node.support;
    if (!support) continue;
    const holdsUy = support.type === "pinned" || support.type === "fixed" || (support.type === "spring" && (support.ky ?? 0) > 0);
    const holdsRz = support.type === "fixed" || support.type === "guided" || (support.type === "spring" && (support.kr ?? 0) > 0);
    if (holdsUy) {
      set(0, 2 * p, 1);
      set(1, 2 * p + 1, lever(p, node.x));
      addRow(2);
    }
    if (holdsRz) {
      set(0, 2 * p + 1, 1);
      addRow(1);
    }
  }
  const factored = factorBanded(normal, KINEMATIC_TOLERANCE);
  if (factored.ok) return undefined;
  return toDofVector(model, dofs, partStart, partOfNode, factored.mode, length);
}

function toDofVector(model: BeamModel, dofs: DofMap, partStart: number[], partOfNode: Int32Array, mode: Float64Array, length: number): Float64Array {
  const out = new Float64Array(dofs.count);
  const nodes = model.nodes;
  const motion = (p: number, x: number) => mode[2 * p]! + (mode[2 * p + 1]! * (x - nodes[partStart[p]!]!.x)) / length;
  for (let i = 0; i < nodes.length; i++) {
    const p = partOfNode[i]!;
    const node = nodes[i]!;
    const hinged = node.hinge && i > 0 && i < nodes.length - 1;
    const left = hinged ? p - 1 : p;
    if (dofs.uy[i]! >= 0) out[dofs.uy[i]!] = motion(p, node.x);
    if (dofs.rzLeft[i]! >= 0) out[dofs.rzLeft[i]!] = mode[2 * left + 1]! / length;
    if (dofs.rzRight[i]! >= 0) out[dofs.rzRight[i]!] = mode[2 * p + 1]! / length;
  }
  return out;
}
