import type { Load } from "../model/BeamDocument";

/** Shifts loads lying at or right of `from` by dx (m); a distributed load straddling `from` stretches. */
export function shiftLoads(loads: readonly Load[], dx: number, from: number): readonly Load[] {
  if (dx === 0) return loads;
  return loads.map((l) => {
    switch (l.type) {
      case "point":
      case "moment":
        return l.x >= from ? { ...l, x: l.x + dx } : l;
      case "distributed":
        return {
          ...l,
          x1: l.x1 >= from ? l.x1 + dx : l.x1,
          x2: l.x2 >= from ? l.x2 + dx : l.x2,
        };
      case "settlement":
        return l;
      default:
        return exhaustive(l);
    }
  });
}

/** Intensity of a linearly varying load at x (N/m). */
export function intensityAt(l: { x1: number; x2: number; qy1: number; qy2: number }, x: number): number {
  return l.qy1 + ((l.qy2 - l.qy1) * (x - l.x1)) / (l.x2 - l.x1);
}

/**
 * Keeps loads inside [x0, x1]: distributed loads are cut at the ends (intensity interpolated so the
 * remaining part is unchanged) or dropped when wholly outside. Returns null when a point load or
 * moment lies outside, because moving it silently would change the engineering.
 */
export function clipLoadsToRange(loads: readonly Load[], x0: number, x1: number): readonly Load[] | null {
  let touched = false;
  const out: Load[] = [];
  for (const l of loads) {
    if (l.type === "point" || l.type === "moment") {
      if (l.x < x0 || l.x > x1) return null;
      out.push(l);
    } else if (l.type === "distributed") {
      if (l.x2 <= x0 || l.x1 >= x1) {
        touched = true;
        continue;
      }
      const a = Math.max(l.x1, x0);
      const b = Math.min(l.x2, x1);
      if (a === l.x1 && b === l.x2) out.push(l);
      else {
        touched = true;
        out.push({ ...l, x1: a, x2: b, qy1: intensityAt(l, a), qy2: intensityAt(l, b) });
      }
    } else out.push(l);
  }
  return touched ? out : loads;
}

export function exhaustive(value: never): never {
  throw new Error(`unhandled case ${JSON.stringify(value)}`);
}
