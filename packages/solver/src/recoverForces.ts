import type { AssembledSystem } from "./assembleStiffness.js";
import type { Curve } from "./analysisTypes.js";
import type { BandedSymmetricMatrix } from "./bandedMatrix.js";
import type { BeamModel } from "./beamModelSchema.js";
import type { BasisLoads, LoadGrid } from "./loadGrid.js";
import { elementDofs, type DofMap } from "./numberDofs.js";
import type { SegmentSection } from "./segmentField.js";

/** Everything one analysis shares between its right-hand sides. */
export interface SolveContext {
  model: BeamModel;
  grid: LoadGrid;
  dofs: DofMap;
  sections: SegmentSection[];
  lengths: Float64Array;
  system: AssembledSystem;
  factors: BandedSymmetricMatrix;
  supportedNodes: number[];
}

/**
 * Steps of iterative refinement. A short, stiff segment next to soft ones makes the plain solve
 * lose digits (error ≈ ε·k_stiff/k_soft); one step with the residual computed from element
 * deformations (below) restores nearly full precision at the cost of one more back-substitution.
 */
export const REFINEMENT_STEPS = 1;

/**
 * f − K·u over the free DOFs, with each element's end forces computed from its deformation
 * (end rotations relative to the chord) so the rigid-body part cancels exactly and the residual
 * is accurate even where K·u is a small difference of large terms.
 */
export function residual(context: SolveContext, curve: Curve, loads: Float64Array, r: Float64Array): void {
  const { model, dofs, lengths, system } = context;
  r.set(loads);
  for (let e = 0; e < lengths.length; e++) {
    const chord = (curve.uy[e + 1]! - curve.uy[e]!) / lengths[e]!;
    const phi1 = curve.rzRight[e]! - chord;
    const phi2 = curve.rzLeft[e + 1]! - chord;
    const k = system.elements;
    const map = elementDofs(dofs, e);
    for (let a = 0; a < 4; a++) {
      if (map[a]! < 0) continue;
      r[map[a]!]! -= k[16 * e + 4 * a + 1]! * phi1 + k[16 * e + 4 * a + 3]! * phi2;
    }
  }
  for (let i = 0; i < model.nodes.length; i++) {
    const support = model.nodes[i]!.support;
    if (support?.type !== "spring") continue;
    if (dofs.uy[i]! >= 0) r[dofs.uy[i]!]! -= (support.ky ?? 0) * curve.uy[i]!;
    if (dofs.rzLeft[i]! >= 0) r[dofs.rzLeft[i]!]! -= (support.kr ?? 0) * curve.rzLeft[i]!;
  }
}

/**
 * Internal forces recovered from displacements lose digits in short, stiff segments (they come
 * from differences of nearly equal nodal values). Nodal equilibrium is exact, so along each chain
 * of segments between supports the forces are propagated by statics from the best-known point:
 * a free beam end (where V and M are the applied end loads, exactly), or else the most flexible
 * segment of the chain (smallest EI/L³, whose displacement-based forces are the most accurate).
 */
export function balanceChains(context: SolveContext, basis: BasisLoads, particular: Float64Array, startV: Float64Array, startM: Float64Array): void {
  const { model, grid, sections, lengths } = context;
  const nSeg = sections.length;
  const pointAt = (node: number) => grid.segmentFirstInterval[node]!;
  const endV = (e: number) => startV[e]! + particular[4 * e]!;
  const endM = (e: number) => startM[e]! + startV[e]! * lengths[e]! + particular[4 * e + 1]!;
  // Across an unsupported node j: V jumps by the point load, M drops by the applied CCW moment.
  const forward = (e: number) => {
    const j = pointAt(e + 1);
    startV[e + 1] = endV(e) + basis.fy[j]!;
    startM[e + 1] = endM(e) - basis.mz[j]!;
  };
  const backward = (e: number) => {
    const j = pointAt(e);
    const Vend = startV[e]! - basis.fy[j]!;
    const Mend = startM[e]! + basis.mz[j]!;
    const L = lengths[e - 1]!;
    startV[e - 1] = Vend - particular[4 * (e - 1)]!;
    startM[e - 1] = Mend - startV[e - 1]! * L - particular[4 * (e - 1) + 1]!;
  };
  let first = 0;
  while (first < nSeg) {
    let last = first;
    while (last + 1 < nSeg && model.nodes[last + 1]!.support === undefined) last++;
    const freeLeft = first === 0 && model.nodes[0]!.support === undefined;
    const freeRight = last === nSeg - 1 && model.nodes[nSeg]!.support === undefined;
    let reference: number;
    if (freeLeft) {
      reference = first;
      startV[first] = basis.fy[0]!;
      startM[first] = -basis.mz[0]!;
    } else if (freeRight) {
      reference = last;
      const j = pointAt(nSeg);
      const Vend = -basis.fy[j]!;
      const Mend = basis.mz[j]!;
      startV[last] = Vend - particular[4 * last]!;
      startM[last] = Mend - startV[last]! * lengths[last]! - particular[4 * last + 1]!;
    } else {
      reference = first;
      for (let e = first + 1; e <= last; e++) {
        const flexible = (s: number) => sections[s]!.EI / lengths[s]! ** 3;
        if (flexible(e) < flexible(reference)) reference = e;
      }
    }
    for (let e = reference; e < last; e++) forward(e);
    for (let e = reference; e > first; e--) backward(e);
    first = last + 1;
  }
}

/**
 * Reactions from the jumps of the exact fields at each support: V(x⁺) − V(x⁻) = R + P and
 * M(x⁺) − M(x⁻) = −(m_R + m) (CCW moments lower M). Springs give −k·u directly; a component the
 * support does not restrain is exactly zero.
 */
export function recoverReactions(context: SolveContext, basis: BasisLoads, curve: Curve, startV: Float64Array, startM: Float64Array, endV: Float64Array, endM: Float64Array): void {
  const { model, grid } = context;
  const nSeg = context.sections.length;
  context.supportedNodes.forEach((node, r) => {
    const support = model.nodes[node]!.support!;
    const j = grid.segmentFirstInterval[node]!;
    const jumpV = (node < nSeg ? startV[node]! : 0) - endV[node]!;
    const jumpM = (node < nSeg ? startM[node]! : 0) - endM[node]!;
    switch (support.type) {
      case "spring":
        curve.fy[r] = -(support.ky ?? 0) * curve.uy[node]!;
        curve.mz[r] = -(support.kr ?? 0) * curve.rzRight[node]!;
        break;
      case "pinned":
        curve.fy[r] = jumpV - basis.fy[j]!;
        break;
      case "guided":
        curve.mz[r] = -jumpM - basis.mz[j]!;
        break;
      case "fixed":
        curve.fy[r] = jumpV - basis.fy[j]!;
        curve.mz[r] = -jumpM - basis.mz[j]!;
        break;
      default: {
        const never: never = support;
        return never;
      }
    }
  });
}
