/**
 * Resultants of applied loads and reactions, for equilibrium checks. Moments are taken about x = 0,
 * counterclockwise positive: a force fy at x contributes x·fy.
 */
import type { LoadSpec, NodeSpec, ReactionRow } from "./exchange";

export interface Resultant {
  fy: number;
  mz: number;
  /** Sum of absolute contributions: the scale against which rounding is judged. */
  fyScale: number;
  mzScale: number;
}

const zero = (): Resultant => ({ fy: 0, mz: 0, fyScale: 0, mzScale: 0 });

function add(r: Resultant, fy: number, mz: number): void {
  r.fy += fy;
  r.mz += mz;
  r.fyScale += Math.abs(fy);
  r.mzScale += Math.abs(mz);
}

/** Resultant of the applied loads scaled by `factor` (settlements apply no force). */
export function loadResultant(loads: readonly LoadSpec[], factor = 1, into: Resultant = zero()): Resultant {
  for (const l of loads) {
    if (l.type === "point") add(into, factor * l.fy, factor * l.x * l.fy);
    else if (l.type === "moment") add(into, 0, factor * l.mz);
    else if (l.type === "distributed") {
      const d = l.x2 - l.x1;
      // ∫q dx = d(q1 + q2)/2; ∫x·q dx = d[q1(2x1 + x2) + q2(x1 + 2x2)]/6 for linear q.
      add(into, (factor * d * (l.qy1 + l.qy2)) / 2, (factor * d * (l.qy1 * (2 * l.x1 + l.x2) + l.qy2 * (l.x1 + 2 * l.x2))) / 6);
    }
  }
  return into;
}

export function reactionResultant(nodes: readonly NodeSpec[], reactions: readonly ReactionRow[], into: Resultant = zero()): Resultant {
  for (const r of reactions) {
    const x = nodes[r.node]!.x;
    add(into, r.fy, x * r.fy + r.mz);
    into.mzScale += Math.abs(r.mz);
  }
  return into;
}
