// Exact factors to SI for the units engineers type. A table rather than a units package: the
// general packages either lack structural units (convert-units has no kip, kip/ft or kip·ft) or
// are large for the editor chunk (mathjs units pull in the expression parser), and the conversions
// needed are a few dozen exact products of the definitions below (NIST SP 811, appendix B):
//   1 in = 0.0254 m exactly; 1 ft = 12 in = 0.3048 m exactly;
//   1 lbf = 4.4482216152605 N exactly (from 1 lb = 0.45359237 kg and g = 9.80665 m/s²);
//   1 kip = 1000 lbf; 1 psi = 1 lbf/in²; 1 ksi = 1000 psi.

export type Dimension =
  | "length"
  | "force"
  | "force/length" // distributed load, translational spring stiffness
  | "force*length" // moment, rotational spring stiffness per radian
  | "pressure" // modulus of elasticity, stress
  | "length^2"
  | "length^4"
  | "angle";

export interface UnitDefinition {
  readonly symbol: string; // how it is displayed
  readonly dimension: Dimension;
  readonly toSi: number; // SI value of one of this unit
  readonly aliases: readonly string[]; // other spellings accepted when parsing (compared lowercase-insensitive where safe)
}

const IN = 0.0254;
const FT = 0.3048;
const LBF = 4.4482216152605;
const KIP = 1000 * LBF;

export const unitDefinitions: readonly UnitDefinition[] = [
  { symbol: "m", dimension: "length", toSi: 1, aliases: ["meter", "meters", "metre", "metres"] },
  { symbol: "mm", dimension: "length", toSi: 1e-3, aliases: [] },
  { symbol: "cm", dimension: "length", toSi: 1e-2, aliases: [] },
  { symbol: "ft", dimension: "length", toSi: FT, aliases: ["'", "feet", "foot", "’"] },
  { symbol: "in", dimension: "length", toSi: IN, aliases: ['"', "inch", "inches", "”", "''"] },
  { symbol: "N", dimension: "force", toSi: 1, aliases: [] },
  { symbol: "kN", dimension: "force", toSi: 1e3, aliases: [] },
  { symbol: "MN", dimension: "force", toSi: 1e6, aliases: [] },
  { symbol: "lbf", dimension: "force", toSi: LBF, aliases: ["lb", "lbs"] },
  { symbol: "kip", dimension: "force", toSi: KIP, aliases: ["kips", "k"] },
  { symbol: "N/m", dimension: "force/length", toSi: 1, aliases: [] },
  { symbol: "kN/m", dimension: "force/length", toSi: 1e3, aliases: [] },
  { symbol: "kN/mm", dimension: "force/length", toSi: 1e6, aliases: [] },
  { symbol: "N/mm", dimension: "force/length", toSi: 1e3, aliases: [] },
  { symbol: "MN/m", dimension: "force/length", toSi: 1e6, aliases: [] },
  { symbol: "kip/ft", dimension: "force/length", toSi: KIP / FT, aliases: ["klf", "k/ft"] },
  { symbol: "kip/in", dimension: "force/length", toSi: KIP / IN, aliases: ["k/in"] },
  { symbol: "lbf/ft", dimension: "force/length", toSi: LBF / FT, aliases: ["plf", "lb/ft"] },
  { symbol: "lbf/in", dimension: "force/length", toSi: LBF / IN, aliases: ["lb/in"] },
  { symbol: "N·m", dimension: "force*length", toSi: 1, aliases: ["Nm", "N-m", "N*m", "N.m"] },
  { symbol: "kN·m", dimension: "force*length", toSi: 1e3, aliases: ["kNm", "kN-m", "kN*m", "kN.m", "kN·m/rad", "kNm/rad", "kN-m/rad"] },
  { symbol: "kip·ft", dimension: "force*length", toSi: KIP * FT, aliases: ["kip-ft", "kipft", "k-ft", "kip*ft", "ft-kip", "kip·ft/rad", "kip-ft/rad"] },
  { symbol: "kip·in", dimension: "force*length", toSi: KIP * IN, aliases: ["kip-in", "k-in", "kip*in", "in-kip"] },
  { symbol: "lbf·ft", dimension: "force*length", toSi: LBF * FT, aliases: ["lb-ft", "lbf-ft", "ft-lb"] },
  { symbol: "Pa", dimension: "pressure", toSi: 1, aliases: [] },
  { symbol: "kPa", dimension: "pressure", toSi: 1e3, aliases: [] },
  { symbol: "MPa", dimension: "pressure", toSi: 1e6, aliases: ["N/mm2", "N/mm²"] },
  { symbol: "GPa", dimension: "pressure", toSi: 1e9, aliases: ["kN/mm2", "kN/mm²"] },
  { symbol: "psi", dimension: "pressure", toSi: LBF / (IN * IN), aliases: [] },
  { symbol: "ksi", dimension: "pressure", toSi: KIP / (IN * IN), aliases: [] },
  { symbol: "m²", dimension: "length^2", toSi: 1, aliases: ["m2", "m^2"] },
  { symbol: "mm²", dimension: "length^2", toSi: 1e-6, aliases: ["mm2", "mm^2"] },
  { symbol: "cm²", dimension: "length^2", toSi: 1e-4, aliases: ["cm2", "cm^2"] },
  { symbol: "in²", dimension: "length^2", toSi: IN * IN, aliases: ["in2", "in^2", "sq in"] },
  { symbol: "m⁴", dimension: "length^4", toSi: 1, aliases: ["m4", "m^4"] },
  { symbol: "mm⁴", dimension: "length^4", toSi: 1e-12, aliases: ["mm4", "mm^4"] },
  { symbol: "cm⁴", dimension: "length^4", toSi: 1e-8, aliases: ["cm4", "cm^4"] },
  { symbol: "in⁴", dimension: "length^4", toSi: IN ** 4, aliases: ["in4", "in^4"] },
  { symbol: "rad", dimension: "angle", toSi: 1, aliases: [] },
  { symbol: "mrad", dimension: "angle", toSi: 1e-3, aliases: [] },
  { symbol: "°", dimension: "angle", toSi: Math.PI / 180, aliases: ["deg"] },
];

const bySpelling = new Map<string, UnitDefinition>();
for (const def of unitDefinitions) {
  for (const spelling of [def.symbol, ...def.aliases]) bySpelling.set(normaliseSpelling(spelling), def);
}

/** Spelling keys keep case (MN vs mN matters little here, but "m" and "M" must not merge). */
function normaliseSpelling(s: string): string {
  return s.replace(/\s+/g, "").replace(/[⋅×]/g, "·");
}

export function findUnit(spelling: string): UnitDefinition | undefined {
  const key = normaliseSpelling(spelling);
  return bySpelling.get(key) ?? bySpelling.get(key.replace(/·/g, "-"));
}

export function unitBySymbol(symbol: string): UnitDefinition {
  const def = unitDefinitions.find((d) => d.symbol === symbol);
  if (!def) throw new Error(`unknown unit symbol ${symbol}`);
  return def;
}
