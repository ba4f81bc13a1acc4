import type { ProjectUnits, UnitSystem } from "@spanwright/contracts";

/**
 * Display units of reaction values. The API sends SI (N, N·m, m) with the project's units beside
 * them; `unitsFor` gives the same factors locally for tests and for a response without units.
 * US customary factors are exact by definition (NIST SP 811, appendix B):
 * 1 lbf = 4.4482216152605 N, 1 ft = 0.3048 m, so 1 kip = 4448.2216152605 N.
 */

export const LBF_N = 4.4482216152605;
export const FT_M = 0.3048;
export const KIP_N = 1000 * LBF_N;

export type ReactionUnitKind = "force" | "moment" | "length";

export function unitsFor(system: UnitSystem): ProjectUnits {
  switch (system) {
    case "si":
      return {
        system,
        force: { label: "kN", toSI: 1e3 },
        moment: { label: "kN·m", toSI: 1e3 },
        length: { label: "m", toSI: 1 },
      };
    case "us":
      return {
        system,
        force: { label: "kip", toSI: KIP_N },
        moment: { label: "kip·ft", toSI: KIP_N * FT_M },
        length: { label: "ft", toSI: FT_M },
      };
    default: {
      const never: never = system;
      return never;
    }
  }
}

/** display = si / toSI */
export function toDisplay(units: ProjectUnits, kind: ReactionUnitKind, si: number): number {
  return si / units[kind].toSI;
}

/** Decimals for reading reactions: three is finer than any footing design needs (common practice). */
export const REACTION_DECIMALS = 3;

/**
 * Fixed decimals, with "-0.000" shown as "0.000" so a rounding residue never reads as uplift.
 * Uses a plain minus-hyphen so the text pastes into spreadsheets as a number.
 */
export function formatNumber(value: number, decimals = REACTION_DECIMALS): string {
  if (!Number.isFinite(value)) return "—";
  const text = value.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

export function formatReaction(units: ProjectUnits, kind: ReactionUnitKind, si: number, decimals = REACTION_DECIMALS): string {
  return formatNumber(toDisplay(units, kind, si), decimals);
}

/** Percent with sign, one decimal: "+12.5 %", "-3.0 %". */
export function formatPercent(pct: number): string {
  const text = formatNumber(pct, 1);
  return `${pct > 0 && text !== "0.0" ? "+" : ""}${text} %`;
}

/** Signed change: "+1.250", "-0.400". */
export function formatSigned(value: number, decimals = REACTION_DECIMALS): string {
  const text = formatNumber(value, decimals);
  return Number(text) > 0 ? `+${text}` : text;
}
