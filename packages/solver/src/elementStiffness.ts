import { Matrix } from "ml-matrix";

/** Section and length of one beam element; `shearStiffness` = κGA (N), absent for Euler-Bernoulli. */
export interface ElementProperties {
  length: number;
  EI: number;
  shearStiffness?: number;
}

/**
 * Timoshenko shear parameter φ = 12EI/(κGA L²); 0 for Euler-Bernoulli (infinite shear stiffness).
 */
export function shearParameter({ length, EI, shearStiffness }: ElementProperties): number {
  return shearStiffness === undefined ? 0 : (12 * EI) / (shearStiffness * length * length);
}

/**
 * The 4×4 local stiffness matrix of a straight beam element in the DOF order
 * (uy₁, rz₁, uy₂, rz₂), y up and rotations CCW positive, so K·u gives the end forces the nodes
 * exert on the element. Euler-Bernoulli is the Hermite-cubic element; with φ > 0 it is the exact
 * shear-flexible (Timoshenko) element, which reduces to it at φ = 0. Matrix as in any matrix
 * structural analysis text (e.g. Przemieniecki, "Theory of Matrix Structural Analysis", §5.6);
 * exact for a uniform element without span loads, so one element per segment suffices.
 */
export function elementStiffness(properties: ElementProperties): Matrix {
  const L = properties.length;
  const phi = shearParameter(properties);
  const k = properties.EI / ((1 + phi) * L * L * L);
  const a = 12 * k;
  const b = 6 * L * k;
  const c = (4 + phi) * L * L * k;
  const d = (2 - phi) * L * L * k;
  return new Matrix([
    [a, b, -a, b],
    [b, c, -b, d],
    [-a, -b, a, -b],
    [b, d, -b, c],
  ]);
}
