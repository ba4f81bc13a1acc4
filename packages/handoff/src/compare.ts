import type { ReactionRow, ReactionRowKind, ReactionTable, SupportInfo } from "./reactionTable.js";

/**
 * Compares two reaction tables (an older revision before, a newer one after). Supports match by
 * position, rows by support, kind and id. Percent change is relative to the older value; a change
 * beyond the threshold is flagged, as is a value that appears or disappears.
 */

export const DEFAULT_THRESHOLD_PCT = 5;

export type ReactionQuantity = "fy" | "mz" | "fyMax" | "fyMin" | "mzMax" | "mzMin";

export interface ValueChange {
  x: number;
  /** The support's label in the newer table, or the older one if it was removed. */
  label: string;
  kind: ReactionRowKind;
  id: string;
  quantity: ReactionQuantity;
  before: number | null;
  after: number | null;
  change: number | null;
  /** Null when there is no older value, or it is zero (a change from zero has no percent). */
  changePct: number | null;
  flagged: boolean;
}

export interface SupportMatch {
  x: number;
  before: SupportInfo | null;
  after: SupportInfo | null;
  status: "kept" | "type-changed" | "added" | "removed";
}

export interface ReactionComparison {
  thresholdPct: number;
  supports: SupportMatch[];
  values: ValueChange[];
  flagged: ValueChange[];
}

// Supports typed in different units round-trip through floating point: 1 µm is the same place.
const SAME_X = 1e-6;

function quantitiesOf(row: ReactionRow): Array<[ReactionQuantity, number]> {
  return row.kind === "envelope"
    ? [["fyMax", row.fyMax], ["fyMin", row.fyMin], ["mzMax", row.mzMax], ["mzMin", row.mzMin]]
    : [["fy", row.fy], ["mz", row.mz]];
}

/**
 * Below this a value is zero for percent purposes: the solver is exact to about 1e-9 relative,
 * so 1e-7 of the largest force (or moment) in either table is rounding residue.
 */
function zeroTolerances(tables: ReactionTable[]): { force: number; moment: number } {
  let force = 0;
  let moment = 0;
  for (const t of tables) {
    for (const row of t.rows) {
      for (const [q, v] of quantitiesOf(row)) {
        if (q.startsWith("fy")) force = Math.max(force, Math.abs(v));
        else moment = Math.max(moment, Math.abs(v));
      }
    }
  }
  return { force: Math.max(1e-7 * force, 1e-9), moment: Math.max(1e-7 * moment, 1e-9) };
}

function matchSupports(before: ReactionTable, after: ReactionTable): SupportMatch[] {
  const matches: SupportMatch[] = [];
  for (const b of before.supports) {
    const a = after.supports.find((s) => Math.abs(s.x - b.x) <= SAME_X) ?? null;
    matches.push({ x: b.x, before: b, after: a, status: !a ? "removed" : a.support === b.support ? "kept" : "type-changed" });
  }
  for (const a of after.supports) {
    if (!matches.some((m) => m.after === a)) matches.push({ x: a.x, before: null, after: a, status: "added" });
  }
  return matches.sort((p, q) => p.x - q.x);
}

export function compareReactionTables(
  before: ReactionTable,
  after: ReactionTable,
  thresholdPct: number = DEFAULT_THRESHOLD_PCT,
): ReactionComparison {
  const supports = matchSupports(before, after);
  const zero = zeroTolerances([before, after]);
  const values: ValueChange[] = [];
  for (const match of supports) {
    const rowsBefore = match.before ? before.rows.filter((r) => r.node === match.before!.node) : [];
    const rowsAfter = match.after ? after.rows.filter((r) => r.node === match.after!.node) : [];
    const keys = new Map<string, { kind: ReactionRowKind; id: string }>();
    for (const r of [...rowsBefore, ...rowsAfter]) keys.set(`${r.kind}\u0000${r.id}`, { kind: r.kind, id: r.id });
    const label = (match.after ?? match.before)!.label;
    for (const { kind, id } of keys.values()) {
      const b = rowsBefore.find((r) => r.kind === kind && r.id === id);
      const a = rowsAfter.find((r) => r.kind === kind && r.id === id);
      const qb = new Map(b ? quantitiesOf(b) : []);
      const qa = new Map(a ? quantitiesOf(a) : []);
      const quantities = [...new Set([...qb.keys(), ...qa.keys()])];
      for (const quantity of quantities) {
        const vb = qb.get(quantity) ?? null;
        const va = qa.get(quantity) ?? null;
        const tol = quantity.startsWith("fy") ? zero.force : zero.moment;
        const change = vb !== null && va !== null ? va - vb : null;
        const changePct = change !== null && vb !== null && Math.abs(vb) > tol ? (100 * change) / Math.abs(vb) : null;
        const flagged =
          change === null ||
          (changePct !== null ? Math.abs(changePct) > thresholdPct : Math.abs(change) > tol);
        values.push({ x: match.x, label, kind, id, quantity, before: vb, after: va, change, changePct, flagged });
      }
    }
  }
  return { thresholdPct, supports, values, flagged: values.filter((v) => v.flagged) };
}

export interface StaleVerdict {
  stale: boolean;
  /** Issued values the newer revision changes beyond the threshold, or no longer has. */
  changed: ValueChange[];
  supportsAdded: SupportMatch[];
  supportsRemoved: SupportMatch[];
}

/**
 * Whether a newer revision makes an issued reaction table outdated: an issued value changed beyond
 * the threshold or gone, or a support added or removed (the foundation below changes). Rows only
 * in the newer table (a new load case) do not by themselves change what was issued.
 */
export function staleReactions(
  issued: ReactionTable,
  newer: ReactionTable,
  thresholdPct: number = DEFAULT_THRESHOLD_PCT,
): StaleVerdict {
  const comparison = compareReactionTables(issued, newer, thresholdPct);
  const changed = comparison.flagged.filter((v) => v.before !== null);
  const supportsAdded = comparison.supports.filter((s) => s.status === "added");
  const supportsRemoved = comparison.supports.filter((s) => s.status === "removed");
  return {
    stale: changed.length > 0 || supportsAdded.length > 0 || supportsRemoved.length > 0,
    changed,
    supportsAdded,
    supportsRemoved,
  };
}
