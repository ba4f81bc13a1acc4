import { coveredCheck, type CoveredCheck } from "./checkResult.js";
import { availableStrength, strengthFormula, type DesignMethod } from "./designMethod.js";
import { E_STEEL } from "./aiscF2.js";

/** Webs without transverse stiffeners, AISC 360-22 §G2.1(b)(2): kv = 5.34. */
export const KV_UNSTIFFENED = 5.34;

export interface G2ShearStrength {
  readonly Aw: number;
  readonly Cv1: number;
  readonly Vn: number;
  readonly phi: number;
  readonly omega: number;
  readonly clause: string;
}

/**
 * Nominal shear strength of an unstiffened I-shape web, AISC 360-22 §G2.1, eq. G2-1:
 *   Vn = 0.6·Fy·Aw·Cv1, Aw = d·tw.
 * (a) rolled I-shapes with h/tw ≤ 2.24√(E/Fy): Cv1 = 1.0, φv = 1.00, Ωv = 1.50.
 * (b) otherwise φv = 0.90, Ωv = 1.67 and, with kv = 5.34,
 *     h/tw ≤ 1.10√(kv·E/Fy): Cv1 = 1.0 (G2-3); else Cv1 = 1.10√(kv·E/Fy)/(h/tw) (G2-4).
 */
export function g2ShearStrength(d: number, tw: number, h: number, Fy: number, E: number, fabrication: "rolled" | "built-up"): G2ShearStrength {
  const Aw = d * tw;
  const ratio = h / tw;
  if (fabrication === "rolled" && ratio <= 2.24 * Math.sqrt(E / Fy)) {
    return { Aw, Cv1: 1, Vn: 0.6 * Fy * Aw, phi: 1.0, omega: 1.5, clause: "AISC 360-22 §G2.1(a), eq. G2-1" };
  }
  const limit = 1.1 * Math.sqrt((KV_UNSTIFFENED * E) / Fy);
  const Cv1 = ratio <= limit ? 1 : limit / ratio;
  const clause = ratio <= limit ? "AISC 360-22 §G2.1(b)(1), eqs. G2-1 and G2-3" : "AISC 360-22 §G2.1(b)(2), eqs. G2-1 and G2-4";
  return { Aw, Cv1, Vn: 0.6 * Fy * Aw * Cv1, phi: 0.9, omega: 1.67, clause };
}

export interface G2CheckInput {
  /** Overall depth, m. */ readonly d: number;
  /** Web thickness, m. */ readonly tw: number;
  /** Clear web height, m (rolled: between fillets; d − 2tf is slightly conservative). */ readonly h: number;
  /** Pa. */ readonly Fy: number;
  /** Pa, default 200 GPa. */ readonly E?: number;
  /** Required shear strength Vu (LRFD) or Va (ASD), N; sign ignored. */ readonly Vr: number;
  readonly method: DesignMethod;
  readonly fabrication: "rolled" | "built-up";
}

export function checkAiscG2Shear(input: G2CheckInput): CoveredCheck {
  const E = input.E ?? E_STEEL;
  const s = g2ShearStrength(input.d, input.tw, input.h, input.Fy, E, input.fabrication);
  return coveredCheck(
    {
      id: "aisc360-22-g2",
      title: `Shear, AISC 360-22 §G2.1 (${input.method})`,
      inputs: [
        { symbol: "Fy", description: "specified minimum yield stress", value: input.Fy, unit: "Pa" },
        { symbol: "Aw", description: "web area d·tw", value: s.Aw, unit: "m²" },
        { symbol: "h/tw", description: "web slenderness", value: input.h / input.tw, unit: "" },
        { symbol: "Cv1", description: "web shear strength coefficient", value: s.Cv1, unit: "" },
        { symbol: "Vn", description: "nominal shear strength 0.6·Fy·Aw·Cv1", value: s.Vn, unit: "N" },
      ],
      formula: `Vr ≤ ${strengthFormula(input.method, "Vn", s.phi, s.omega)}`,
      source: s.clause,
    },
    input.Vr,
    availableStrength(s.Vn, input.method, s.phi, s.omega),
    "N",
  );
}
