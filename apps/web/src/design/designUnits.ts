import type { UnitSystemId } from "../editor/units/unitSystems";
import { formatNumber } from "../editor/units/formatQuantity";

// Display units for section and stress quantities, which the editor's unit table does not name:
// section dimensions read in mm / in, not m / ft. Exact factors: 1 in = 0.0254 m, 1 ksi = 1000 lbf/in²
// with 1 lbf = 4.4482216152605 N (NIST SP 811, appendix B).

export type DesignQuantity =
  | "dimension" // plate sizes, depths
  | "area"
  | "sectionModulus"
  | "secondMoment"
  | "stress" // stresses and moduli
  | "force"
  | "moment"
  | "length" // spans, Lb
  | "deflection"
  | "strain"
  | "ratio";

const IN = 0.0254;
const FT = 0.3048;
const KIP = 4448.2216152605;

interface DisplayUnit {
  readonly symbol: string;
  /** SI value of one display unit. */
  readonly toSi: number;
}

const UNITS: Record<UnitSystemId, Record<DesignQuantity, DisplayUnit>> = {
  si: {
    dimension: { symbol: "mm", toSi: 1e-3 },
    area: { symbol: "mm²", toSi: 1e-6 },
    sectionModulus: { symbol: "mm³", toSi: 1e-9 },
    secondMoment: { symbol: "mm⁴", toSi: 1e-12 },
    stress: { symbol: "MPa", toSi: 1e6 },
    force: { symbol: "kN", toSi: 1e3 },
    moment: { symbol: "kN·m", toSi: 1e3 },
    length: { symbol: "m", toSi: 1 },
    deflection: { symbol: "mm", toSi: 1e-3 },
    strain: { symbol: "µε", toSi: 1e-6 },
    ratio: { symbol: "", toSi: 1 },
  },
  us: {
    dimension: { symbol: "in", toSi: IN },
    area: { symbol: "in²", toSi: IN ** 2 },
    sectionModulus: { symbol: "in³", toSi: IN ** 3 },
    secondMoment: { symbol: "in⁴", toSi: IN ** 4 },
    stress: { symbol: "ksi", toSi: KIP / IN ** 2 },
    force: { symbol: "kip", toSi: KIP },
    moment: { symbol: "kip·ft", toSi: KIP * FT },
    length: { symbol: "ft", toSi: FT },
    deflection: { symbol: "in", toSi: IN },
    strain: { symbol: "µε", toSi: 1e-6 },
    ratio: { symbol: "", toSi: 1 },
  },
};

export function designUnit(system: UnitSystemId, quantity: DesignQuantity): string {
  return UNITS[system][quantity].symbol;
}

export function toDesignDisplay(si: number, system: UnitSystemId, quantity: DesignQuantity): number {
  return si / UNITS[system][quantity].toSi;
}

export function fromDesignDisplay(value: number, system: UnitSystemId, quantity: DesignQuantity): number {
  return value * UNITS[system][quantity].toSi;
}

/** "12.5 MPa"; `significant` digits as in the editor's labels. */
export function formatDesign(si: number, system: UnitSystemId, quantity: DesignQuantity, significant = 4): string {
  const symbol = designUnit(system, quantity);
  const value = formatNumber(toDesignDisplay(si, system, quantity), significant);
  return symbol ? `${value} ${symbol}` : value;
}

/** Editable text for a field: the display value without binary noise. */
export function editableDesign(si: number, system: UnitSystemId, quantity: DesignQuantity): string {
  return String(Number(toDesignDisplay(si, system, quantity).toPrecision(10)));
}

/**
 * The display quantity of a check value from the SI unit the design functions attach to it.
 * Lengths named like spans (L, Lb, Lp, Lr, Lc) read in m / ft; other lengths in mm / in.
 */
export function quantityOfSiUnit(unit: string, symbol = ""): DesignQuantity {
  switch (unit) {
    case "N·m":
      return "moment";
    case "N":
      return "force";
    case "Pa":
      return "stress";
    case "m²":
      return "area";
    case "m³":
      return "sectionModulus";
    case "m⁴":
      return "secondMoment";
    case "m":
      return /^L/.test(symbol) ? "length" : "deflection";
    default:
      return "ratio";
  }
}
