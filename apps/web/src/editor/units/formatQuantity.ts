import { displayUnit, displayUnitLabel, toDisplay, type QuantityKind, type UnitSystemId } from "./unitSystems";

/** Rounds away binary noise (0.30000000000000004) while keeping every digit a user could type. */
export function cleanNumber(value: number, significant = 10): number {
  if (!Number.isFinite(value) || value === 0) return value === 0 ? 0 : value;
  return Number(value.toPrecision(significant));
}

/** The display-unit number as an editable string (no unit), exact to 10 significant digits. */
export function formatEditable(si: number, system: UnitSystemId, kind: QuantityKind): string {
  return String(cleanNumber(toDisplay(si, system, kind)));
}

/** A short label, e.g. "-12.5 kN"; `significant` digits for canvas and result labels. */
export function formatQuantity(si: number, system: UnitSystemId, kind: QuantityKind, significant = 4): string {
  const value = toDisplay(si, system, kind);
  const label = displayUnitLabel(system, kind);
  return label ? `${formatNumber(value, significant)} ${label}` : formatNumber(value, significant);
}

export function formatNumber(value: number, significant = 4): string {
  if (!Number.isFinite(value)) return String(value);
  if (Math.abs(value) < 1e-12) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e6 || abs < 1e-3) return value.toExponential(significant - 1).replace(/\.?0+e/, "e");
  const rounded = Number(value.toPrecision(significant));
  return String(rounded);
}

/** US lengths read best as feet and inches (12'-6 1/4"); rounds to 1/16 in. */
export function formatFeetInches(metres: number): string {
  const sign = metres < 0 ? "-" : "";
  const sixteenths = Math.round((Math.abs(metres) / 0.0254) * 16);
  const feet = Math.floor(sixteenths / (12 * 16));
  const rest = sixteenths - feet * 12 * 16;
  const inches = Math.floor(rest / 16);
  let frac = rest - inches * 16;
  let den = 16;
  while (frac > 0 && frac % 2 === 0) {
    frac /= 2;
    den /= 2;
  }
  const fracText = frac > 0 ? ` ${frac}/${den}` : "";
  return `${sign}${feet}'-${inches}${fracText}"`;
}

export function unitSymbol(system: UnitSystemId, kind: QuantityKind): string {
  return displayUnit(system, kind)?.symbol ?? "";
}
