import type { ReactionRowJson, ReactionSupport, ReactionTableJson } from "@spanwright/contracts";
import type { ReactionUnitKind } from "./reactionUnits";

/**
 * Pivots the API's long reaction rows (one per support and case/combination/envelope) into the
 * table the foundation designer reads: one row per support, one column per value. Values stay SI;
 * formatting happens at the cell.
 */

export type ReactionGroup = "case" | "combination" | "envelope";
export type ReactionQuantity = "fy" | "mz" | "fyMax" | "fyMin" | "mzMax" | "mzMin";

/** Envelope id standing for all combinations, pattern arrangements included. */
export const ALL_COMBINATIONS_ID = "*";

export interface ReactionColumn {
  /** Stable key: `${group}:${id}:${quantity}`. */
  key: string;
  group: ReactionGroup;
  id: string;
  /** Load category, for load-case columns. */
  category: string | null;
  quantity: ReactionQuantity;
  unitKind: ReactionUnitKind;
}

export interface ReactionSupportRow {
  node: number;
  label: string;
  x: number;
  support: string;
  values: Readonly<Record<string, number>>;
  /** Column keys whose value pulls the beam down (uplift). */
  upliftKeys: ReadonlySet<string>;
  hasUplift: boolean;
}

export interface PivotedReactions {
  columns: ReactionColumn[];
  rows: ReactionSupportRow[];
}

export function columnKey(group: ReactionGroup, id: string, quantity: ReactionQuantity): string {
  return `${group}:${id}:${quantity}`;
}

function quantitiesOf(row: ReactionRowJson): Array<[ReactionQuantity, number]> {
  return row.kind === "envelope"
    ? [["fyMax", row.fyMax], ["fyMin", row.fyMin], ["mzMax", row.mzMax], ["mzMin", row.mzMin]]
    : [["fy", row.fy], ["mz", row.mz]];
}

/** Uplift is a downward pull: on fy (cases, combinations) or on the envelope minimum. */
function isUpliftQuantity(quantity: ReactionQuantity): boolean {
  return quantity === "fy" || quantity === "fyMin";
}

/**
 * Moment columns only where a support can carry moment (fixed, or a spring with rotational
 * stiffness) or some moment is non-zero; pinned supports give zero moment by definition.
 */
function showsMoments(table: ReactionTableJson): boolean {
  if (table.supports.some((s) => s.support === "fixed")) return true;
  return table.rows.some((r) => quantitiesOf(r).some(([q, v]) => q.startsWith("mz") && v !== 0));
}

export function pivotReactions(table: ReactionTableJson): PivotedReactions {
  const withMoments = showsMoments(table);
  const columns: ReactionColumn[] = [];
  const seen = new Set<string>();
  const groupOrder: ReactionGroup[] = ["case", "combination", "envelope"];
  for (const group of groupOrder) {
    for (const row of table.rows) {
      if (row.kind !== group) continue;
      for (const [quantity] of quantitiesOf(row)) {
        if (!withMoments && quantity.startsWith("mz")) continue;
        const key = columnKey(group, row.id, quantity);
        if (seen.has(key)) continue;
        seen.add(key);
        columns.push({
          key,
          group,
          id: row.id,
          category: row.kind === "case" ? row.category : null,
          quantity,
          unitKind: quantity.startsWith("fy") ? "force" : "moment",
        });
      }
    }
  }

  const rows = table.supports.map((s: ReactionSupport): ReactionSupportRow => {
    const values: Record<string, number> = {};
    const upliftKeys = new Set<string>();
    for (const row of table.rows) {
      if (row.node !== s.node) continue;
      for (const [quantity, value] of quantitiesOf(row)) {
        const key = columnKey(row.kind, row.id, quantity);
        if (!seen.has(key)) continue;
        values[key] = value;
        if (row.uplift && isUpliftQuantity(quantity)) upliftKeys.add(key);
      }
    }
    return { node: s.node, label: s.label, x: s.x, support: s.support, values, upliftKeys, hasUplift: upliftKeys.size > 0 };
  });
  return { columns, rows };
}

const quantityLabels: Record<ReactionQuantity, string> = {
  fy: "Fy",
  mz: "Mz",
  fyMax: "Fy max",
  fyMin: "Fy min",
  mzMax: "Mz max",
  mzMin: "Mz min",
};

/** "D Fy", "C1 Mz", "All combinations Fy min", "C2 envelope Fy max". */
export function describeColumn(column: Pick<ReactionColumn, "group" | "id" | "quantity">): string {
  const q = quantityLabels[column.quantity];
  switch (column.group) {
    case "case":
    case "combination":
      return `${column.id} ${q}`;
    case "envelope":
      return column.id === ALL_COMBINATIONS_ID ? `All combinations ${q}` : `${column.id} envelope ${q}`;
    default: {
      const never: never = column.group;
      return never;
    }
  }
}

export const groupLabels: Record<ReactionGroup, string> = {
  case: "Load cases (unfactored)",
  combination: "Combinations (factored)",
  envelope: "Envelopes (incl. pattern loading)",
};
