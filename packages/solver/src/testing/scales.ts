/**
 * Magnitudes against which "exact to 1e-9 relative" is judged when the exact answer is zero or
 * small: floating-point noise in a stiffness solution is proportional to the forces flowing
 * through the system, which for an imposed settlement δ is about (largest stiffness)·δ.
 */
import type { BeamModel, LoadSpec } from "./exchange";

export interface ProblemScale {
  /** N: applied forces, moments over the shortest segment, load resultants, settlement forces. */
  force: number;
  /** N·m: force scale times the beam length. */
  moment: number;
  /** m: largest imposed settlement. */
  settlement: number;
  /** m: beam length and shortest segment. */
  length: number;
  shortest: number;
}

export function problemScale(model: BeamModel, loads: readonly LoadSpec[], factor = 1): ProblemScale {
  const xs = model.nodes.map((n) => n.x);
  const lengths = xs.slice(1).map((x, i) => x - xs[i]!);
  const shortest = Math.min(...lengths);
  const length = xs[xs.length - 1]! - xs[0]!;
  let kMax = 0;
  model.segments.forEach((s, i) => {
    const L = lengths[i]!;
    kMax = Math.max(kMax, (12 * s.E * s.I) / L ** 3);
  });
  for (const n of model.nodes) {
    if (n.support?.type === "spring") kMax = Math.max(kMax, n.support.ky ?? 0, (n.support.kr ?? 0) / shortest ** 2);
  }
  let force = 0;
  let settlement = 0;
  for (const l of loads) {
    if (l.type === "point") force += Math.abs(l.fy);
    else if (l.type === "moment") force += Math.abs(l.mz) / shortest;
    else if (l.type === "distributed") force += ((Math.abs(l.qy1) + Math.abs(l.qy2)) / 2) * (l.x2 - l.x1);
    else {
      settlement = Math.max(settlement, Math.abs(l.uy));
      force += Math.abs(l.uy) * kMax;
    }
  }
  force *= Math.abs(factor);
  settlement *= Math.abs(factor);
  return { force, moment: force * length, settlement, length, shortest };
}

/** The combined scale of several factored load lists on one model. */
export function combinedScale(model: BeamModel, parts: readonly [readonly LoadSpec[], number][]): ProblemScale {
  const scales = parts.map(([loads, f]) => problemScale(model, loads, f));
  const first = scales[0]!;
  return {
    force: scales.reduce((s, p) => s + p.force, 0),
    moment: scales.reduce((s, p) => s + p.moment, 0),
    settlement: Math.max(...scales.map((p) => p.settlement)),
    length: first.length,
    shortest: first.shortest,
  };
}

type StationKey = "V" | "M" | "uy" | "rz";

/** Scale of one station quantity: the largest value seen, or the problem's own magnitude. */
export function quantityScale(key: StationKey, rows: readonly Record<StationKey, number>[], ps: ProblemScale): number {
  const seen = rows.reduce((m, r) => Math.max(m, Math.abs(r[key])), 0);
  const uy = rows.reduce((m, r) => Math.max(m, Math.abs(r.uy)), ps.settlement);
  switch (key) {
    case "V":
      return Math.max(seen, ps.force);
    case "M":
      return Math.max(seen, ps.moment);
    case "uy":
      return Math.max(seen, ps.settlement);
    case "rz":
      return Math.max(seen, uy / ps.shortest);
    default: {
      const never: never = key;
      return never;
    }
  }
}
