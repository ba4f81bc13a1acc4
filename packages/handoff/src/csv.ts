import { stringify } from "csv-stringify/sync";
import { describeRow, type ReactionRow, type ReactionTable } from "./reactionTable.js";
import { displayUnit, formatNumber, toDisplay, type UnitSystem } from "./units.js";

/**
 * Reaction table exports. Both keep the contract's sign: the force the support exerts on the
 * beam, positive upward; a negative Fy is uplift (the support holds the beam down).
 */

export interface ReactionCsvOptions {
  units: UnitSystem;
  /** Decimals shown in the project-unit export; the SI export keeps full precision. */
  decimals?: number;
}

/** Column names of the SI export; stable, for scripts and spreadsheets that read it. */
export const SI_CSV_COLUMNS = [
  "support",
  "node",
  "x_m",
  "support_type",
  "row_kind",
  "id",
  "category",
  "fy_N",
  "mz_Nm",
  "fy_max_N",
  "fy_min_N",
  "mz_max_Nm",
  "mz_min_Nm",
  "uplift",
] as const;

export type SiCsvColumn = (typeof SI_CSV_COLUMNS)[number];

function valuesOf(row: ReactionRow) {
  const isEnvelope = row.kind === "envelope";
  return {
    category: row.kind === "case" ? row.category : "",
    fy: isEnvelope ? undefined : row.fy,
    mz: isEnvelope ? undefined : row.mz,
    fyMax: isEnvelope ? row.fyMax : undefined,
    fyMin: isEnvelope ? row.fyMin : undefined,
    mzMax: isEnvelope ? row.mzMax : undefined,
    mzMin: isEnvelope ? row.mzMin : undefined,
  };
}

/** Reaction table for people: project units in the header, e.g. "Fy [kN]". */
export function reactionTableCsv(table: ReactionTable, options: ReactionCsvOptions): string {
  const { units } = options;
  const decimals = options.decimals ?? 3;
  const f = displayUnit(units, "force").label;
  const m = displayUnit(units, "moment").label;
  const x = displayUnit(units, "length").label;
  const header = [
    "Support", `x [${x}]`, "Support type", "Row", "Case or combination", "Category",
    `Fy [${f}]`, `Mz [${m}]`, `Fy max [${f}]`, `Fy min [${f}]`, `Mz max [${m}]`, `Mz min [${m}]`, "Uplift",
  ];
  const show = (quantity: "force" | "moment", si: number | undefined) =>
    si === undefined ? "" : formatNumber(toDisplay(units, quantity, si), decimals);
  const body = table.rows.map((row) => {
    const v = valuesOf(row);
    return [
      row.label,
      formatNumber(toDisplay(units, "length", row.x), 3),
      row.support,
      row.kind,
      describeRow(row),
      v.category,
      show("force", v.fy),
      show("moment", v.mz),
      show("force", v.fyMax),
      show("force", v.fyMin),
      show("moment", v.mzMax),
      show("moment", v.mzMin),
      row.uplift ? "uplift" : "",
    ];
  });
  return stringify([header, ...body]);
}

/**
 * Machine-readable reaction table in SI base units (N, N·m, m). Numbers are written with
 * JavaScript's shortest round-trip form, so parsing them back gives the solver's doubles exactly.
 */
export function reactionTableSiCsv(table: ReactionTable): string {
  const num = (value: number | undefined) => (value === undefined ? "" : String(value));
  const records = table.rows.map((row): Record<SiCsvColumn, string> => {
    const v = valuesOf(row);
    return {
      support: row.label,
      node: String(row.node),
      x_m: String(row.x),
      support_type: row.support,
      row_kind: row.kind,
      id: row.id,
      category: v.category,
      fy_N: num(v.fy),
      mz_Nm: num(v.mz),
      fy_max_N: num(v.fyMax),
      fy_min_N: num(v.fyMin),
      mz_max_Nm: num(v.mzMax),
      mz_min_Nm: num(v.mzMin),
      uplift: row.uplift ? "true" : "false",
    };
  });
  return stringify(records, { header: true, columns: [...SI_CSV_COLUMNS] });
}

/** "beam-b2-rev-3-reactions.csv": safe for mail attachments and downloads. */
export function exportFileName(beam: string, revision: number | string, suffix: string): string {
  const slug = `${beam}-rev-${revision}`.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");
  return `${slug || "beam"}-${suffix}`;
}
