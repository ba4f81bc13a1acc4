import { unitBySymbol, type Dimension, type UnitDefinition } from "./unitTable";

export type UnitSystemId = "si" | "us";
export const unitSystemIds: readonly UnitSystemId[] = ["si", "us"];
export const unitSystemLabels: Record<UnitSystemId, string> = { si: "SI (m, kN)", us: "US customary (ft, kip)" };

/** What a value means, which decides its display unit (the same dimension can show differently). */
export type QuantityKind =
  | "position" // x along the beam
  | "length" // span lengths
  | "deflection"
  | "settlement"
  | "force"
  | "distributed"
  | "moment"
  | "modulus"
  | "area"
  | "secondMoment"
  | "springK" // translational spring, force per length
  | "springKr" // rotational spring, moment per radian
  | "rotation"
  | "factor";

export const quantityDimensions: Record<QuantityKind, Dimension | null> = {
  position: "length",
  length: "length",
  deflection: "length",
  settlement: "length",
  force: "force",
  distributed: "force/length",
  moment: "force*length",
  modulus: "pressure",
  area: "length^2",
  secondMoment: "length^4",
  springK: "force/length",
  springKr: "force*length",
  rotation: "angle",
  factor: null,
};

const displaySymbols: Record<UnitSystemId, Record<Exclude<QuantityKind, "factor">, string>> = {
  si: {
    position: "m",
    length: "m",
    deflection: "mm",
    settlement: "mm",
    force: "kN",
    distributed: "kN/m",
    moment: "kN·m",
    modulus: "MPa",
    area: "mm²",
    secondMoment: "mm⁴",
    springK: "kN/mm",
    springKr: "kN·m",
    rotation: "mrad",
  },
  us: {
    position: "ft",
    length: "ft",
    deflection: "in",
    settlement: "in",
    force: "kip",
    distributed: "kip/ft",
    moment: "kip·ft",
    modulus: "ksi",
    area: "in²",
    secondMoment: "in⁴",
    springK: "kip/in",
    springKr: "kip·ft",
    rotation: "mrad",
  },
};

/** The display unit of a quantity, or null for dimensionless values (factors). */
export function displayUnit(system: UnitSystemId, kind: QuantityKind): UnitDefinition | null {
  if (kind === "factor") return null;
  return unitBySymbol(displaySymbols[system][kind]);
}

/** Rotational springs show per radian. */
export function displayUnitLabel(system: UnitSystemId, kind: QuantityKind): string {
  const unit = displayUnit(system, kind);
  if (!unit) return "";
  return kind === "springKr" ? `${unit.symbol}/rad` : unit.symbol;
}

export function toDisplay(si: number, system: UnitSystemId, kind: QuantityKind): number {
  const unit = displayUnit(system, kind);
  return unit ? si / unit.toSi : si;
}

export function fromDisplay(value: number, system: UnitSystemId, kind: QuantityKind): number {
  const unit = displayUnit(system, kind);
  return unit ? value * unit.toSi : value;
}
