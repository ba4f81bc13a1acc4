import { iShapeLtbProperties, type IShapeLtbProperties } from "../sections/iShapeProperties.js";
import type { IShape } from "../sections/sectionShape.js";
import { flangeClass, webClass } from "./aiscCompactness.js";
import { coveredCheck, notCoveredCheck, type CheckInput, type CheckResult } from "./checkResult.js";
import { availableStrength, strengthFormula, type DesignMethod } from "./designMethod.js";

/** AISC 360-22 §F1(a): φb = 0.90 (LRFD), Ωb = 1.67 (ASD). */
export const PHI_B = 0.9;
export const OMEGA_B = 1.67;
/** AISC 360-22 Symbols: E = 29 000 ksi = 200 000 MPa. */
export const E_STEEL = 200e9;

export type F2LimitState = "yielding" | "inelastic-ltb" | "elastic-ltb";

export interface F2Strength {
  /** Plastic moment Fy·Zx (F2-1), N·m. */ readonly Mp: number;
  /** Limiting unbraced length for yielding (F2-5), m. */ readonly Lp: number;
  /** Limiting unbraced length for inelastic LTB (F2-6), m. */ readonly Lr: number;
  /** Nominal flexural strength, N·m. */ readonly Mn: number;
  readonly limitState: F2LimitState;
  /** Critical stress of F2-4 when elastic LTB governs, Pa. */ readonly Fcr: number | null;
}

/**
 * Nominal flexural strength of a doubly symmetric compact I-shape bent about its major axis,
 * AISC 360-22 §F2 (c = 1). Units SI: Pa, m, N·m.
 */
export function f2NominalStrength(p: Pick<IShapeLtbProperties, "Sx" | "Zx" | "ry" | "rts" | "J" | "ho">, Fy: number, E: number, Lb: number, Cb: number): F2Strength {
  const c = 1;
  const Mp = Fy * p.Zx;
  const Lp = 1.76 * p.ry * Math.sqrt(E / Fy);
  const jTerm = (p.J * c) / (p.Sx * p.ho);
  const Lr = 1.95 * p.rts * (E / (0.7 * Fy)) * Math.sqrt(jTerm + Math.sqrt(jTerm ** 2 + 6.76 * ((0.7 * Fy) / E) ** 2));
  if (Lb <= Lp) return { Mp, Lp, Lr, Mn: Mp, limitState: "yielding", Fcr: null };
  if (Lb <= Lr) {
    const Mn = Cb * (Mp - (Mp - 0.7 * Fy * p.Sx) * ((Lb - Lp) / (Lr - Lp)));
    return Mn >= Mp ? { Mp, Lp, Lr, Mn: Mp, limitState: "yielding", Fcr: null } : { Mp, Lp, Lr, Mn, limitState: "inelastic-ltb", Fcr: null };
  }
  const slenderness = (Lb / p.rts) ** 2;
  const Fcr = ((Cb * Math.PI ** 2 * E) / slenderness) * Math.sqrt(1 + 0.078 * jTerm * slenderness);
  const Mn = Fcr * p.Sx;
  return Mn >= Mp ? { Mp, Lp, Lr, Mn: Mp, limitState: "yielding", Fcr } : { Mp, Lp, Lr, Mn, limitState: "elastic-ltb", Fcr };
}

export interface F2CheckInput {
  /** Plates of the I-shape, m. */
  readonly shape: IShape;
  /** Tabulated properties (e.g. AISC Manual Table 1-1) replacing the plate-derived ones. */
  readonly properties?: Partial<IShapeLtbProperties>;
  /** Specified minimum yield stress, Pa. */ readonly Fy: number;
  /** Default 200 GPa. */ readonly E?: number;
  /** Unbraced length of the compression flange, m. */ readonly Lb: number;
  /** From eq. F1-1 (see `cbFromFunction`); 1.0 is always permitted. */ readonly Cb: number;
  /** Where Cb came from, shown beside it; default eq. F1-1. */ readonly CbBasis?: "F1-1" | "taken as 1.0";
  /** Required flexural strength Mu (LRFD) or Ma (ASD), N·m; sign ignored. */ readonly Mr: number;
  readonly method: DesignMethod;
}

const LIMIT_STATE_CLAUSE: Record<F2LimitState, string> = {
  yielding: "AISC 360-22 §F2.1, eq. F2-1",
  "inelastic-ltb": "AISC 360-22 §F2.2, eq. F2-2",
  "elastic-ltb": "AISC 360-22 §F2.2, eqs. F2-3 and F2-4",
};

/** Flexure of a doubly symmetric compact I-shape by AISC 360-22 §F2; other classes are "not covered". */
export function checkAiscF2Flexure(input: F2CheckInput): CheckResult {
  const E = input.E ?? E_STEEL;
  const overrides = Object.fromEntries(Object.entries(input.properties ?? {}).filter(([, v]) => v !== undefined));
  const p: IShapeLtbProperties = { ...iShapeLtbProperties(input.shape), ...overrides };
  const flange = flangeClass(p.bf, p.tf, E, input.Fy);
  const web = webClass(p.h, p.tw, E, input.Fy);
  const inputs: CheckInput[] = [
    { symbol: "Fy", description: "specified minimum yield stress", value: input.Fy, unit: "Pa" },
    { symbol: "E", description: "modulus of elasticity", value: E, unit: "Pa" },
    { symbol: "Zx", description: "plastic section modulus", value: p.Zx, unit: "m³" },
    { symbol: "Sx", description: "elastic section modulus", value: p.Sx, unit: "m³" },
    { symbol: "ry", description: "minor-axis radius of gyration", value: p.ry, unit: "m" },
    { symbol: "rts", description: "effective radius of gyration (F2-7)", value: p.rts, unit: "m" },
    { symbol: "J", description: "torsional constant", value: p.J, unit: "m⁴" },
    { symbol: "ho", description: "distance between flange centroids", value: p.ho, unit: "m" },
    { symbol: "bf/2tf", description: "flange slenderness (Table B4.1b case 10)", value: flange.lambda, unit: "" },
    { symbol: "h/tw", description: "web slenderness (Table B4.1b case 15)", value: web.lambda, unit: "" },
    { symbol: "Lb", description: "unbraced length", value: input.Lb, unit: "m" },
    { symbol: "Cb", description: `LTB modification factor (${input.CbBasis ?? "F1-1"})`, value: input.Cb, unit: "" },
  ];
  const base = { id: "aisc360-22-f2", title: `Flexure, AISC 360-22 §F2 (${input.method})`, inputs };
  if (flange.class !== "compact" || web.class !== "compact") {
    const which = flange.class !== "compact" ? `flange is ${flange.class} (bf/2tf = ${flange.lambda.toFixed(2)} > λp = ${flange.lambdaP.toFixed(2)})` : `web is ${web.class} (h/tw = ${web.lambda.toFixed(1)} > λp = ${web.lambdaP.toFixed(1)})`;
    return notCoveredCheck(
      { ...base, formula: "—", source: "AISC 360-22 Table B4.1b; §F3–§F5 apply" },
      `not covered: the ${which}; §F2 covers compact sections only (§F3, §F4 or §F5 governs)`,
    );
  }
  const s = f2NominalStrength(p, input.Fy, E, input.Lb, input.Cb);
  const capacity = availableStrength(s.Mn, input.method, PHI_B, OMEGA_B);
  return coveredCheck(
    {
      ...base,
      inputs: [
        ...inputs,
        { symbol: "Mp", description: "plastic moment Fy·Zx", value: s.Mp, unit: "N·m" },
        { symbol: "Lp", description: "limiting length, yielding (F2-5)", value: s.Lp, unit: "m" },
        { symbol: "Lr", description: "limiting length, inelastic LTB (F2-6)", value: s.Lr, unit: "m" },
        ...(s.Fcr === null ? [] : [{ symbol: "Fcr", description: "critical stress (F2-4)", value: s.Fcr, unit: "Pa" }]),
        { symbol: "Mn", description: `nominal strength (${s.limitState})`, value: s.Mn, unit: "N·m" },
      ],
      formula: `Mr ≤ ${strengthFormula(input.method, "Mn", PHI_B, OMEGA_B)}`,
      source: LIMIT_STATE_CLAUSE[s.limitState],
      notes: ["section properties from plates (fillets ignored) unless tabulated values were supplied"],
    },
    input.Mr,
    capacity,
    "N·m",
  );
}
