/**
 * Every check is plain data the check table and the report print as is: the inputs, the formula,
 * the clause it comes from, demand, capacity, utilisation = demand / capacity, and pass/fail.
 * Values are SI; `unit` names the unit of demand and capacity.
 */
export interface CheckInput {
  readonly symbol: string;
  readonly description: string;
  readonly value: number | string;
  /** SI unit of `value`, or "" for ratios and labels. */
  readonly unit: string;
}

interface CheckBase {
  /** Stable id of the kind of check, e.g. "aisc360-22-f2". */
  readonly id: string;
  readonly title: string;
  readonly inputs: readonly CheckInput[];
  readonly formula: string;
  /** Clause or source, e.g. "AISC 360-22 §F2.2, eq. F2-2". */
  readonly source: string;
  readonly notes: readonly string[];
}

export interface CoveredCheck extends CheckBase {
  readonly status: "pass" | "fail";
  readonly pass: boolean;
  readonly demand: number;
  readonly capacity: number;
  readonly utilisation: number;
  readonly unit: string;
}

/** The check does not apply to this case (e.g. a slender flange under AISC §F2): say so, never guess. */
export interface NotCoveredCheck extends CheckBase {
  readonly status: "not-covered";
  readonly pass: false;
  readonly reason: string;
}

export type CheckResult = CoveredCheck | NotCoveredCheck;

type Base = Omit<CheckBase, "notes"> & { readonly notes?: readonly string[] };

/** Demand and capacity are compared as magnitudes; capacity must be positive. */
export function coveredCheck(base: Base, demand: number, capacity: number, unit: string): CoveredCheck {
  const d = Math.abs(demand);
  const utilisation = capacity > 0 ? d / capacity : Number.POSITIVE_INFINITY;
  const pass = utilisation <= 1;
  return { notes: [], ...base, status: pass ? "pass" : "fail", pass, demand: d, capacity, utilisation, unit };
}

export function notCoveredCheck(base: Base, reason: string): NotCoveredCheck {
  return { notes: [], ...base, status: "not-covered", pass: false, reason };
}
