/**
 * Share of deflection due to shear deformation. Closed forms for the maximum deflection of
 * standard cases, bending part + shear part (Timoshenko and Gere, Mechanics of Materials;
 * Roark's Formulas for Stress and Strain, 8th ed., §8.10):
 *   simple span, UDL:          5wL⁴/(384EI) + wL²/(8κGA)
 *   simple span, central load:  PL³/(48EI)  + PL/(4κGA)
 *   cantilever, tip load:       PL³/(3EI)   + PL/(κGA)
 *   cantilever, UDL:            wL⁴/(8EI)   + wL²/(2κGA)
 *   fixed-fixed, UDL:           wL⁴/(384EI) + wL²/(8κGA)
 *   fixed-fixed, central load:  PL³/(192EI) + PL/(4κGA)
 * The shear/bending ratio is independent of the load: r = c·EI/(κGA·L²), share = r/(1 + r).
 */
export type ShearShareCase =
  | "simple-udl"
  | "simple-midpoint-load"
  | "cantilever-tip-load"
  | "cantilever-udl"
  | "fixed-udl"
  | "fixed-midpoint-load";

/** c in r = c·EI/(κGA·L²), from the closed forms above. */
const RATIO_COEFFICIENT: Record<ShearShareCase, number> = {
  "simple-udl": 48 / 5,
  "simple-midpoint-load": 12,
  "cantilever-tip-load": 3,
  "cantilever-udl": 4,
  "fixed-udl": 48,
  "fixed-midpoint-load": 48,
};

/** Common practice: shear deformation matters for span-to-depth ratios below about 10. */
export const SHEAR_HINT_SPAN_TO_DEPTH = 10;

export interface ShearShareInput {
  readonly case: ShearShareCase;
  /** Span (or overhang) length, m. */ readonly L: number;
  /** Section depth, m. */ readonly depth: number;
  /** Pa. */ readonly E: number;
  /** m⁴. */ readonly I: number;
  /** Pa. */ readonly G: number;
  /** Shear area κ·A, m². */ readonly shearArea: number;
}

export interface SpanDepthHint {
  readonly spanToDepth: number;
  readonly threshold: number;
  readonly shearMatters: boolean;
  readonly message: string;
}

export function spanDepthHint(L: number, depth: number, threshold = SHEAR_HINT_SPAN_TO_DEPTH): SpanDepthHint {
  const spanToDepth = L / depth;
  const shearMatters = spanToDepth < threshold;
  const message = shearMatters
    ? `L/d = ${spanToDepth.toFixed(1)} is below about ${threshold}: shear deformation is likely significant, consider Timoshenko theory (common practice).`
    : `L/d = ${spanToDepth.toFixed(1)}: shear deformation is usually small at this slenderness (common practice).`;
  return { spanToDepth, threshold, shearMatters, message };
}

export interface ShearShare {
  /** Shear deflection / total deflection, 0…1. */ readonly share: number;
  /** Shear deflection / bending deflection. */ readonly shearToBending: number;
  readonly hint: SpanDepthHint;
  readonly source: string;
}

/** Share of the maximum deflection due to shear for one of the standard cases. */
export function shearShare(input: ShearShareInput): ShearShare {
  const r = (RATIO_COEFFICIENT[input.case] * input.E * input.I) / (input.G * input.shearArea * input.L ** 2);
  return {
    share: r / (1 + r),
    shearToBending: r,
    hint: spanDepthHint(input.L, input.depth),
    source: `closed form for ${input.case} (Timoshenko & Gere; Roark 8th ed. §8.10)`,
  };
}

/**
 * Share from two solves of the same span: the deflection at the same point by Timoshenko and by
 * Euler-Bernoulli theory (the difference is the shear part). Returns 0 when both are zero.
 */
export function shearShareFromSolves(uyTimoshenko: number, uyEulerBernoulli: number): number {
  if (Math.abs(uyTimoshenko) <= Number.MIN_VALUE) return 0;
  return (uyTimoshenko - uyEulerBernoulli) / uyTimoshenko;
}
