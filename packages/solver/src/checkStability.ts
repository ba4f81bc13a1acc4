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
  if (!factored.ok) return toDofVector(model, dofs, partStart, partOfNode, factored.mode, length);
  const held = heldParts(model, partStart, partOfNode);
  if (held.every(Boolean)) return undefined;
  // A mechanism the pivots missed: its constraints are nearly dependent (a support close to a
  // hinge), and in AᵀA rounding grows with the square of that. Pin the held parts outright, so
  // only the free ones are left to move, and take the first pivot that is small by a looser measure.
  for (let p = 0; p < parts; p++) {
    if (!held[p]) continue;
    addToBanded(normal, 2 * p, 2 * p, 1);
    addToBanded(normal, 2 * p + 1, 2 * p + 1, 1);
  }
  // ends by a tolerance of 1 at the latest: no pivot exceeds its own diagonal entry
  for (let tolerance = 1e-12; ; tolerance *= 10) {
    const loose = factorBanded(normal, tolerance);
    if (!loose.ok) return toDofVector(model, dofs, partStart, partOfNode, loose.mode, length);
  }
}

/**
 * Which rigid parts the supports hold, decided exactly (no rounding): a part is held once it has
 * two independent restraints among the points where its deflection is zero (its supports that
 * hold uy, a support at a hinge it shares, and the hinges it shares with held parts; two points at
 * different x) and a support that holds its rotation. Propagated until nothing changes. A part
 * never held can move: with at most one independent restraint per free part plus the hinges
 * between them, the free parts have fewer constraints than freedoms.
 */
function heldParts(model: BeamModel, partStart: number[], partOfNode: Int32Array): boolean[] {
  const nodes = model.nodes;
  const n = nodes.length;
  const parts = partStart.length;
  const points: Set<number>[] = Array.from({ length: parts }, () => new Set<number>());
  const rotation: boolean[] = new Array(parts).fill(false);
  const hinge = (i: number) => nodes[i]!.hinge === true && i > 0 && i < n - 1;
  for (let i = 0; i < n; i++) {
    const support = nodes[i]!.support;
    if (!support) continue;
    const p = partOfNode[i]!;
    const holdsUy = support.type === "pinned" || support.type === "fixed" || (support.type === "spring" && (support.ky ?? 0) > 0);
    const holdsRz = support.type === "fixed" || support.type === "guided" || (support.type === "spring" && (support.kr ?? 0) > 0);
    if (holdsUy) {
      points[p]!.add(nodes[i]!.x);
      // the deflection is shared at a hinge: the part on its left is held there too
      if (hinge(i)) points[p - 1]!.add(nodes[i]!.x);
    }
    if (holdsRz) rotation[p] = true;
  }
  const held: boolean[] = new Array(parts).fill(false);
  for (let changed = true; changed; ) {
    changed = false;
    for (let p = 0; p < parts; p++) {
      if (held[p]) continue;
      const at = new Set(points[p]);
      if (p > 0 && held[p - 1]) at.add(nodes[partStart[p]!]!.x);
      if (p + 1 < parts && held[p + 1]) at.add(nodes[partStart[p + 1]!]!.x);
      if (at.size + (rotation[p] ? 1 : 0) >= 2) {
        held[p] = true;
        changed = true;
      }
    }
  }
  return held;
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
