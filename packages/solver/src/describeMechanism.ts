import type { BeamModel } from "./beamModelSchema.js";
import type { SolverFailure } from "./errors.js";
import type { DofMap } from "./numberDofs.js";

/** Metres for messages: up to 12 significant digits, no trailing zeros. */
export function formatMetres(x: number): string {
  return String(Number(x.toPrecision(12)));
}

/**
 * Names the part of the beam that moves in a mechanism mode (a null vector of the stiffness
 * matrix, from the factorisation) in plain words, with x in metres.
 */
export function describeMechanism(model: BeamModel, dofs: DofMap, mode: Float64Array): SolverFailure {
  const nodes = model.nodes;
  const n = nodes.length;
  const length = nodes[n - 1]!.x - nodes[0]!.x;
  const pick = (d: number) => (d >= 0 ? mode[d]! : 0);
  const uy = Array.from(dofs.uy, pick);
  const rzL = Array.from(dofs.rzLeft, pick);
  const rzR = Array.from(dofs.rzRight, pick);
  const scale = Math.max(...uy.map(Math.abs), ...rzL.map((r) => Math.abs(r) * length), ...rzR.map((r) => Math.abs(r) * length));
  const small = (v: number) => Math.abs(v) <= 1e-7 * scale;
  const moves = (e: number) => !small(uy[e]!) || !small(uy[e + 1]!) || !small(rzR[e]! * length) || !small(rzL[e + 1]! * length);
  let first = 0;
  while (first < n - 1 && !moves(first)) first++;
  let last = first;
  while (last + 1 < n - 1 && moves(last + 1)) last++;
  const a = first;
  const b = Math.min(last + 1, n - 1);
  const xa = nodes[a]!.x;
  const xb = nodes[b]!.x;
  const whole = a === 0 && b === n - 1;
  const part = whole ? `the whole beam (x = ${formatMetres(xa)} m to ${formatMetres(xb)} m)` : `the part from x = ${formatMetres(xa)} m to ${formatMetres(xb)} m`;
  const where = `nodes ${a} to ${b} (x = ${formatMetres(xa)} m to ${formatMetres(xb)} m)`;
  const theta = rzR[a]!;
  let rigid = true;
  for (let i = a; i <= b; i++) {
    const expectedUy = uy[a]! + theta * (nodes[i]!.x - xa);
    if (!small(uy[i]! - expectedUy) || (i > a && !small((rzL[i]! - theta) * length)) || (i < b && !small((rzR[i]! - theta) * length))) rigid = false;
  }
  const prefix = "the beam cannot carry load: ";
  if (rigid && small(theta * length)) {
    return { code: "mechanism", message: `${prefix}${part} can move up and down freely; add a support that restrains vertical movement`, where };
  }
  if (rigid) {
    const centre = xa - uy[a]! / theta;
    const nodeIndex = nodes.findIndex((node) => Math.abs(node.x - centre) <= 1e-7 * length);
    const node = nodes[nodeIndex];
    const about = node?.hinge ? `the hinge at x = ${formatMetres(node.x)} m` : node?.support ? `the support at x = ${formatMetres(node.x)} m` : `x = ${formatMetres(centre)} m`;
    return { code: "mechanism", message: `${prefix}${part} can rotate about ${about}; add a support or remove a hinge`, where };
  }
  const hinges = nodes.slice(a, b + 1).filter((node) => node.hinge).map((node) => `x = ${formatMetres(node.x)} m`);
  const through = hinges.length > 0 ? ` through the hinges at ${hinges.join(", ")}` : "";
  return { code: "mechanism", message: `${prefix}${part} can move without bending${through}; add a support or remove a hinge`, where };
}
