/**
 * Independent kinematic stability check for generated beams: the beam is cut at every hinge into
 * rigid parts, each with two freedoms (translation v and rotation θ about its left end), linked by
 * shared deflection at the hinges and restrained by the supports. The beam is a mechanism exactly
 * when this small constraint system has a non-zero solution, i.e. its rank is below 2·parts.
 * Elastic deformation cannot make a mechanism stable, so rigid parts are the right model.
 */
import type { NodeSpec } from "./exchange";

function restrainsDeflection(n: NodeSpec): boolean {
  const s = n.support;
  if (!s) return false;
  if (s.type === "pinned" || s.type === "fixed") return true;
  if (s.type === "spring") return (s.ky ?? 0) > 0;
  return false;
}

function restrainsRotation(n: NodeSpec): boolean {
  const s = n.support;
  if (!s) return false;
  if (s.type === "fixed" || s.type === "guided") return true;
  if (s.type === "spring") return (s.kr ?? 0) > 0;
  return false;
}

/** Rank by Gaussian elimination with partial pivoting and a relative tolerance. */
function rank(rows: number[][], cols: number): number {
  const m = rows.map((r) => [...r]);
  let rk = 0;
  const scale = Math.max(1, ...m.flat().map(Math.abs));
  for (let c = 0; c < cols && rk < m.length; c++) {
    let best = rk;
    for (let i = rk + 1; i < m.length; i++) if (Math.abs(m[i]![c]!) > Math.abs(m[best]![c]!)) best = i;
    if (Math.abs(m[best]![c]!) <= 1e-12 * scale) continue;
    [m[rk], m[best]] = [m[best]!, m[rk]!];
    const p = m[rk]!;
    for (let i = rk + 1; i < m.length; i++) {
      const row = m[i]!;
      const f = row[c]! / p[c]!;
      for (let k = c; k < cols; k++) row[k] = row[k]! - f * p[k]!;
    }
    rk++;
  }
  return rk;
}

/** True when the beam (hinges and supports as given) can carry any load without a mechanism. */
export function isStable(nodes: readonly NodeSpec[]): boolean {
  // Part p spans from node start[p] to the next hinge; u(x) = v_p + θ_p (x − x_start).
  const starts: number[] = [0];
  nodes.forEach((n, i) => {
    if (n.hinge && i > 0 && i < nodes.length - 1) starts.push(i);
  });
  const parts = starts.length;
  const cols = 2 * parts;
  const rows: number[][] = [];
  const partOf = (i: number, side: "left" | "right") => {
    // A hinge node belongs to both parts; `side` picks which one.
    let p = 0;
    for (let k = 0; k < parts; k++) {
      const s = starts[k]!;
      if (s < i || (s === i && side === "right")) p = k;
    }
    return p;
  };
  const deflectionRow = (p: number, x: number) => {
    const row = new Array<number>(cols).fill(0);
    row[2 * p] = 1;
    row[2 * p + 1] = x - nodes[starts[p]!]!.x;
    return row;
  };
  for (let k = 1; k < parts; k++) {
    const h = starts[k]!;
    const left = deflectionRow(k - 1, nodes[h]!.x);
    const right = deflectionRow(k, nodes[h]!.x);
    rows.push(left.map((v, j) => v - right[j]!));
  }
  nodes.forEach((n, i) => {
    const p = partOf(i, "right");
    if (restrainsDeflection(n)) rows.push(deflectionRow(p, n.x));
    if (restrainsRotation(n)) {
      const row = new Array<number>(cols).fill(0);
      row[2 * p + 1] = 1;
      rows.push(row);
    }
  });
  return rank(rows, cols) === cols;
}
