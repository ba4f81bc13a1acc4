import { coveredCheck, type CoveredCheck } from "./checkResult.js";

export interface BendingStressInput {
  /** Bending moment, N·m, positive sagging (bottom fibre in tension), as in the exchange format. */
  readonly M: number;
  /** Second moment of area, m⁴. */
  readonly I: number;
  /** Centroid below the top fibre, m. */
  readonly yTop: number;
  /** Overall depth, m. */
  readonly depth: number;
  /** Allowable bending stress entered by the user, Pa. */
  readonly allowable: number;
}

/** Extreme fibre stresses σ = M·c/I, tension positive: sagging M compresses the top. */
export function extremeFibreStresses(M: number, I: number, yTop: number, depth: number): { top: number; bottom: number } {
  return { top: (-M * yTop) / I, bottom: (M * (depth - yTop)) / I };
}

/** Elastic bending stress σ = M·c/I at the worse extreme fibre, against a user allowable. */
export function checkBendingStress(input: BendingStressInput): CoveredCheck {
  const { top, bottom } = extremeFibreStresses(input.M, input.I, input.yTop, input.depth);
  const c = Math.abs(top) >= Math.abs(bottom) ? input.yTop : input.depth - input.yTop;
  return coveredCheck(
    {
      id: "elastic-bending-stress",
      title: "Elastic bending stress",
      inputs: [
        { symbol: "M", description: "bending moment", value: input.M, unit: "N·m" },
        { symbol: "I", description: "second moment of area", value: input.I, unit: "m⁴" },
        { symbol: "c", description: "distance from the neutral axis to the governing extreme fibre", value: c, unit: "m" },
        { symbol: "σtop", description: "top fibre stress (tension positive)", value: top, unit: "Pa" },
        { symbol: "σbot", description: "bottom fibre stress (tension positive)", value: bottom, unit: "Pa" },
        { symbol: "σallow", description: "allowable stress (user)", value: input.allowable, unit: "Pa" },
      ],
      formula: "σ = M·c/I ≤ σallow",
      source: "elastic beam theory (Navier); allowable entered by the user",
    },
    Math.max(Math.abs(top), Math.abs(bottom)),
    input.allowable,
    "Pa",
  );
}

export interface ShearStressInput {
  /** Shear force, N. */ readonly V: number;
  /** First moment of area above the neutral axis, m³. */ readonly Q: number;
  /** Second moment of area, m⁴. */ readonly I: number;
  /** Width at the neutral axis, m. */ readonly b: number;
  /** Allowable shear stress entered by the user, Pa. */ readonly allowable: number;
}

/** Shear stress at the neutral axis τ = V·Q/(I·b) (Jourawski), against a user allowable. */
export function checkShearStress(input: ShearStressInput): CoveredCheck {
  const tau = (input.V * input.Q) / (input.I * input.b);
  return coveredCheck(
    {
      id: "elastic-shear-stress",
      title: "Elastic shear stress",
      inputs: [
        { symbol: "V", description: "shear force", value: input.V, unit: "N" },
        { symbol: "Q", description: "first moment of area above the neutral axis", value: input.Q, unit: "m³" },
        { symbol: "I", description: "second moment of area", value: input.I, unit: "m⁴" },
        { symbol: "b", description: "width at the neutral axis", value: input.b, unit: "m" },
        { symbol: "τallow", description: "allowable shear stress (user)", value: input.allowable, unit: "Pa" },
      ],
      formula: "τ = V·Q/(I·b) ≤ τallow",
      source: "elastic beam theory (Jourawski shear formula); allowable entered by the user",
    },
    tau,
    input.allowable,
    "Pa",
  );
}
