/**
 * Display units. The exchange format is SI base units (N, m, N·m); everything a person reads or
 * types goes through these factors. US customary factors are exact by definition
 * (NIST SP 811, appendix B): 1 lbf = 4.4482216152605 N, 1 ft = 0.3048 m, 1 in = 0.0254 m.
 */

export type UnitSystem = "si" | "us";

/** Physical quantities the hand-off documents show. */
export type Quantity =
  | "force"
  | "moment"
  | "length"
  | "distributed"
  | "deflection"
  | "modulus"
  | "inertia"
  | "springTranslation"
  | "springRotation";

export interface DisplayUnit {
  /** Label shown in headers, e.g. "kN·m". */
  label: string;
  /** SI value of one display unit: si = display × toSI. */
  toSI: number;
}

export const LBF_N = 4.4482216152605;
export const FT_M = 0.3048;
export const IN_M = 0.0254;
export const KIP_N = 1000 * LBF_N;

const UNITS: Record<UnitSystem, Record<Quantity, DisplayUnit>> = {
  si: {
    force: { label: "kN", toSI: 1e3 },
    moment: { label: "kN·m", toSI: 1e3 },
    length: { label: "m", toSI: 1 },
    distributed: { label: "kN/m", toSI: 1e3 },
    deflection: { label: "mm", toSI: 1e-3 },
    modulus: { label: "GPa", toSI: 1e9 },
    // 10⁶ mm⁴ = 1e-6 m⁴: the usual size of steel-section tables (common practice).
    inertia: { label: "10⁶ mm⁴", toSI: 1e-6 },
    springTranslation: { label: "kN/m", toSI: 1e3 },
    springRotation: { label: "kN·m/rad", toSI: 1e3 },
  },
  us: {
    force: { label: "kip", toSI: KIP_N },
    moment: { label: "kip·ft", toSI: KIP_N * FT_M },
    length: { label: "ft", toSI: FT_M },
    distributed: { label: "kip/ft", toSI: KIP_N / FT_M },
    deflection: { label: "in", toSI: IN_M },
    modulus: { label: "ksi", toSI: KIP_N / (IN_M * IN_M) },
    inertia: { label: "in⁴", toSI: IN_M ** 4 },
    springTranslation: { label: "kip/in", toSI: KIP_N / IN_M },
    springRotation: { label: "kip·ft/rad", toSI: KIP_N * FT_M },
  },
};

export function displayUnit(system: UnitSystem, quantity: Quantity): DisplayUnit {
  return UNITS[system][quantity];
}

export function toDisplay(system: UnitSystem, quantity: Quantity, si: number): number {
  return si / UNITS[system][quantity].toSI;
}

export function fromDisplay(system: UnitSystem, quantity: Quantity, value: number): number {
  return value * UNITS[system][quantity].toSI;
}

/**
 * Formats a value for reading: fixed decimals, "-0" shown as "0" so a tiny negative rounding
 * residue never reads as uplift.
 */
export function formatNumber(value: number, decimals = 3): string {
  const text = value.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

/** A value with its unit, e.g. "-12.000 kN". */
export function formatQuantity(system: UnitSystem, quantity: Quantity, si: number, decimals = 3): string {
  return `${formatNumber(toDisplay(system, quantity, si), decimals)} ${UNITS[system][quantity].label}`;
}

/** Compact form for sentences and drawings: trailing zeros dropped, e.g. "6.5 m", "-2 kN/m". */
export function formatShort(system: UnitSystem, quantity: Quantity, si: number, significant = 6): string {
  const value = Number(toDisplay(system, quantity, si).toPrecision(significant));
  return `${Object.is(value, -0) ? 0 : value} ${UNITS[system][quantity].label}`;
}

/** Units a person may type in an uploaded file, by the kind of quantity they measure. */
export type InputUnitKind = "force" | "moment" | "distributed" | "length";

const INPUT_UNITS: Record<InputUnitKind, Record<string, number>> = {
  force: { n: 1, kn: 1e3, mn: 1e6, lbf: LBF_N, lb: LBF_N, kip: KIP_N, kips: KIP_N },
  moment: {
    "n·m": 1,
    "kn·m": 1e3,
    "lbf·ft": LBF_N * FT_M,
    "lb·ft": LBF_N * FT_M,
    "kip·ft": KIP_N * FT_M,
    "lbf·in": LBF_N * IN_M,
    "kip·in": KIP_N * IN_M,
  },
  distributed: {
    "n/m": 1,
    "kn/m": 1e3,
    "n/mm": 1e3,
    "lbf/ft": LBF_N / FT_M,
    "lb/ft": LBF_N / FT_M,
    plf: LBF_N / FT_M,
    "kip/ft": KIP_N / FT_M,
    klf: KIP_N / FT_M,
    "kip/in": KIP_N / IN_M,
  },
  length: { m: 1, mm: 1e-3, cm: 1e-2, ft: FT_M, in: IN_M },
};

/** Spellings of the product sign in moment units: "kN·m", "kN*m", "kN.m", "kN-m", "kNm". */
function normaliseUnit(text: string): string {
  const t = text.trim().toLowerCase().replace(/\s+/g, "");
  const product = t.replace(/[*.\-⋅]/g, "·");
  if (/^(k?n|lbf?|kip)(m|ft|in)$/.test(product) && !product.includes("·")) {
    return product.replace(/(m|ft|in)$/, "·$1");
  }
  return product;
}

/** SI factor of a typed unit, or undefined when the unit is not one of `kind`. */
export function inputUnitFactor(kind: InputUnitKind, unit: string): number | undefined {
  return INPUT_UNITS[kind][normaliseUnit(unit)];
}

/** The kind a typed unit measures, or undefined when unknown. */
export function inputUnitKind(unit: string): InputUnitKind | undefined {
  const key = normaliseUnit(unit);
  return (Object.keys(INPUT_UNITS) as InputUnitKind[]).find((kind) => key in INPUT_UNITS[kind]);
}
