import type { ProjectUnits, ValueChangeJson } from "@spanwright/contracts";
import { describeColumn } from "./pivotReactions";
import { formatPercent, formatReaction, formatSigned, toDisplay } from "./reactionUnits";

/**
 * How a reaction changed between two revisions, for highlighting. Percent change is relative to
 * the older value; "beyond" means its magnitude exceeds the project's threshold (strictly, as the
 * API's stale check does). A value that appeared or vanished always counts as beyond: the
 * foundation designer's table no longer matches.
 */
export type ChangeSeverity = "same" | "within" | "beyond" | "added" | "removed";

export function changeSeverity(value: Pick<ValueChangeJson, "before" | "after" | "change" | "changePct" | "flagged">, thresholdPct: number): ChangeSeverity {
  if (value.before === null) return "added";
  if (value.after === null) return "removed";
  // From (near) zero there is no percent; the API decides with its zero tolerance.
  if (value.changePct === null) return value.flagged ? "beyond" : "same";
  if (Math.abs(value.changePct) > thresholdPct) return "beyond";
  return value.change === 0 ? "same" : "within";
}

export function isHighlighted(severity: ChangeSeverity): boolean {
  return severity === "beyond" || severity === "added" || severity === "removed";
}

export const severityClasses: Record<ChangeSeverity, string> = {
  same: "",
  within: "",
  beyond: "bg-ochre-100 font-semibold text-ochre-800",
  added: "bg-ink-50 text-ink-800",
  removed: "bg-danger-50 text-danger-700",
};

export const severityLabels: Record<ChangeSeverity, string> = {
  same: "unchanged",
  within: "within threshold",
  beyond: "beyond threshold",
  added: "new value",
  removed: "no longer present",
};

export interface CompareRow {
  key: string;
  label: string;
  x: number;
  result: string;
  unitKind: "force" | "moment";
  before: number | null;
  after: number | null;
  change: number | null;
  changePct: number | null;
  severity: ChangeSeverity;
}

export function toCompareRows(values: readonly ValueChangeJson[], thresholdPct: number): CompareRow[] {
  return values.map((v) => ({
    key: `${v.label}:${v.kind}:${v.id}:${v.quantity}`,
    label: v.label,
    x: v.x,
    result: describeColumn({ group: v.kind, id: v.id, quantity: v.quantity }),
    unitKind: v.quantity.startsWith("fy") ? "force" : "moment",
    before: v.before,
    after: v.after,
    change: v.change,
    changePct: v.changePct,
    severity: changeSeverity(v, thresholdPct),
  }));
}

/** Tab-separated text of compare rows, units in the header, for "copy as table". */
export function compareRowsToTsv(rows: readonly CompareRow[], units: ProjectUnits, from: number, to: number): string {
  const header = ["Support", `x (${units.length.label})`, "Result", "Unit", `r${from}`, `r${to}`, "Change", "Change %", "Flag"];
  const lines = rows.map((r) => [
    r.label,
    String(Number(toDisplay(units, "length", r.x).toPrecision(12))),
    r.result,
    units[r.unitKind].label,
    r.before === null ? "" : formatReaction(units, r.unitKind, r.before),
    r.after === null ? "" : formatReaction(units, r.unitKind, r.after),
    r.change === null ? "" : formatSigned(toDisplay(units, r.unitKind, r.change)),
    r.changePct === null ? "" : formatPercent(r.changePct),
    severityLabels[r.severity],
  ]);
  return [header, ...lines].map((l) => l.join("\t")).join("\n");
}
