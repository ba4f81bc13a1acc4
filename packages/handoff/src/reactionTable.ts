import type { BeamModel, LoadCategory, SolveResult, SupportType } from "./exchange.js";

/**
 * The reaction table handed to the foundation designer: plain rows, SI units, contract signs
 * (the force the support exerts on the beam, fy positive upward, mz positive counterclockwise).
 */

export interface SupportInfo {
  node: number;
  /** Support label in beam order: S1, S2, … */
  label: string;
  x: number;
  support: SupportType;
}

interface RowBase {
  node: number;
  label: string;
  x: number;
  support: SupportType;
  id: string;
  /** True when the support pulls the beam down (fy < 0, or fyMin < 0 for envelopes). */
  uplift: boolean;
}

export interface CaseRow extends RowBase {
  kind: "case";
  category: LoadCategory;
  fy: number;
  mz: number;
}

export interface CombinationRow extends RowBase {
  kind: "combination";
  fy: number;
  mz: number;
}

/** Envelope of one combination over its pattern arrangements, or of all combinations (id "*"). */
export interface EnvelopeRow extends RowBase {
  kind: "envelope";
  fyMax: number;
  fyMin: number;
  mzMax: number;
  mzMin: number;
}

export type ReactionRow = CaseRow | CombinationRow | EnvelopeRow;
export type ReactionRowKind = ReactionRow["kind"];

export interface ReactionTable {
  supports: SupportInfo[];
  rows: ReactionRow[];
}

export const ALL_COMBINATIONS_ID = "*";

export type ReactionTableErrorCode = "missing-result";

export class ReactionTableError extends Error {
  constructor(
    readonly code: ReactionTableErrorCode,
    message: string,
    readonly where: string,
  ) {
    super(message);
    this.name = "ReactionTableError";
  }
}

export function listSupports(model: BeamModel): SupportInfo[] {
  const supports: SupportInfo[] = [];
  model.nodes.forEach((node, index) => {
    if (node.support) {
      supports.push({ node: index, label: `S${supports.length + 1}`, x: node.x, support: node.support.type });
    }
  });
  return supports;
}

/**
 * Reactions this close to zero are rounding residue, not uplift. The solver is exact to about
 * 1e-9 relative, so 1e-7 of the largest reaction in the table leaves a wide margin.
 */
function upliftTolerance(result: SolveResult): number {
  let largest = 0;
  for (const entry of Object.values(result.results)) {
    for (const r of entry.reactions) largest = Math.max(largest, Math.abs(r.fy));
  }
  return Math.max(1e-7 * largest, 1e-9);
}

export function buildReactionTable(model: BeamModel, result: SolveResult): ReactionTable {
  const supports = listSupports(model);
  const tolerance = upliftTolerance(result);
  const rows: ReactionRow[] = [];
  const byNode = <T extends { node: number }>(list: T[], where: string, node: number): T => {
    const found = list.find((r) => r.node === node);
    if (!found) throw new ReactionTableError("missing-result", `no reaction for node ${node}`, where);
    return found;
  };
  const caseResult = (id: string) => {
    const found = result.results[id];
    if (!found) throw new ReactionTableError("missing-result", `no result for "${id}"`, `results.${id}`);
    return found;
  };
  const envelopeIds = [...model.combinations.map((c) => c.id), ALL_COMBINATIONS_ID];

  for (const s of supports) {
    const base = { node: s.node, label: s.label, x: s.x, support: s.support };
    for (const lc of model.loadCases) {
      const r = byNode(caseResult(lc.id).reactions, `results.${lc.id}.reactions`, s.node);
      rows.push({ ...base, kind: "case", id: lc.id, category: lc.category, fy: r.fy, mz: r.mz, uplift: r.fy < -tolerance });
    }
    for (const combo of model.combinations) {
      const r = byNode(caseResult(combo.id).reactions, `results.${combo.id}.reactions`, s.node);
      rows.push({ ...base, kind: "combination", id: combo.id, fy: r.fy, mz: r.mz, uplift: r.fy < -tolerance });
    }
    for (const id of envelopeIds) {
      const envelope = result.envelopes[id];
      // No combinations means no "*" envelope worth a row.
      if (!envelope) {
        if (model.combinations.length === 0) continue;
        throw new ReactionTableError("missing-result", `no envelope for "${id}"`, `envelopes.${id}`);
      }
      const r = byNode(envelope.reactions, `envelopes.${id}.reactions`, s.node);
      rows.push({
        ...base,
        kind: "envelope",
        id,
        fyMax: r.fyMax,
        fyMin: r.fyMin,
        mzMax: r.mzMax,
        mzMin: r.mzMin,
        uplift: r.fyMin < -tolerance,
      });
    }
  }
  return { supports, rows };
}

/** Supports that see uplift in any row, for a warning line above the table. */
export function supportsWithUplift(table: ReactionTable): SupportInfo[] {
  const nodes = new Set(table.rows.filter((r) => r.uplift).map((r) => r.node));
  return table.supports.filter((s) => nodes.has(s.node));
}

/** "D (dead)", "C1", "envelope C1", "envelope, all combinations". */
export function describeRow(row: ReactionRow): string {
  switch (row.kind) {
    case "case":
      return `${row.id} (${row.category})`;
    case "combination":
      return row.id;
    case "envelope":
      return row.id === ALL_COMBINATIONS_ID ? "envelope, all combinations" : `envelope ${row.id}`;
    default: {
      const never: never = row;
      return never;
    }
  }
}
