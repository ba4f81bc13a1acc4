import type { CheckResult } from "@spanwright/solver/design";
import type { BeamLoad, BeamModel, CaseResult, SolveResult } from "./exchange.js";
import { CONTENT_WIDTH, FONT, columnsByWeight, drawTable, heading, paragraph, pdfSafe, type Doc } from "./pdfLayout.js";
import { describeRow, type ReactionTable } from "./reactionTable.js";
import { listSpans, spanAt } from "./spans.js";
import { IN_M, KIP_N, displayUnit, formatNumber, formatQuantity, formatShort, toDisplay, type UnitSystem } from "./units.js";

/** Tabular sections of the calculation report, each drawn at doc.y. */

function supportText(model: BeamModel, node: number, u: UnitSystem): string {
  const s = model.nodes[node]?.support;
  if (!s) return "";
  if (s.type !== "spring") return s.type;
  const parts = [
    s.ky !== undefined ? `ky ${formatShort(u, "springTranslation", s.ky)}` : "",
    s.kr !== undefined ? `kr ${formatShort(u, "springRotation", s.kr)}` : "",
  ];
  return `spring ${parts.filter(Boolean).join(", ")}`;
}

export function drawModelTables(doc: Doc, model: BeamModel, u: UnitSystem): void {
  const len = displayUnit(u, "length").label;
  drawTable(doc, {
    columns: columnsByWeight([["Node", 1], [`x [${len}]`, 1.4, "right"], ["Support", 4], ["Hinge", 1]]),
    rows: model.nodes.map((n, i) => [String(i), formatNumber(toDisplay(u, "length", n.x), 3), supportText(model, i, u), n.hinge ? "yes" : ""]),
  });
  drawTable(doc, {
    columns: columnsByWeight([
      ["Segment", 1], [`From [${len}]`, 1.2, "right"], [`To [${len}]`, 1.2, "right"],
      [`E [${displayUnit(u, "modulus").label}]`, 1.4, "right"], [`I [${displayUnit(u, "inertia").label}]`, 1.6, "right"],
      ["Shear (Timoshenko)", 2.2],
    ]),
    rows: model.segments.map((s, i) => [
      String(i),
      formatNumber(toDisplay(u, "length", model.nodes[i]?.x ?? 0), 3),
      formatNumber(toDisplay(u, "length", model.nodes[i + 1]?.x ?? 0), 3),
      formatNumber(toDisplay(u, "modulus", s.E), 1),
      formatNumber(toDisplay(u, "inertia", s.I), 3),
      s.A !== undefined && s.G !== undefined && s.shearFactor !== undefined ? `A, G, k = ${s.shearFactor}` : "",
    ]),
  });
}

function loadText(load: BeamLoad, model: BeamModel, u: UnitSystem): [string, string, string] {
  const x = (v: number) => formatShort(u, "length", v);
  switch (load.type) {
    case "point":
      return ["point", `x = ${x(load.x)}`, formatShort(u, "force", load.fy)];
    case "moment":
      return ["moment", `x = ${x(load.x)}`, formatShort(u, "moment", load.mz)];
    case "distributed":
      return ["distributed", `x = ${x(load.x1)} to ${x(load.x2)}`, load.qy1 === load.qy2
        ? formatShort(u, "distributed", load.qy1)
        : `${formatShort(u, "distributed", load.qy1)} to ${formatShort(u, "distributed", load.qy2)}`];
    case "settlement":
      return ["settlement", `node ${load.node} (x = ${x(model.nodes[load.node]?.x ?? 0)})`, formatShort(u, "deflection", load.uy)];
    default: {
      const never: never = load;
      return never;
    }
  }
}

export function drawLoadTables(doc: Doc, model: BeamModel, u: UnitSystem): void {
  heading(doc, "Load cases");
  paragraph(doc, "Loads are positive upward (gravity loads negative); moments positive counterclockwise. Cases marked pattern are placed on every combination of spans for the envelopes.");
  drawTable(doc, {
    columns: columnsByWeight([["Case", 1], ["Category", 1.4], ["Pattern", 1], ["Load", 1.4], ["Position", 2.6], ["Magnitude", 2.4, "right"]]),
    rows: model.loadCases.flatMap((lc) => {
      const rows = lc.loads.map((load) => [lc.id, lc.category, lc.pattern ? "yes" : "", ...loadText(load, model, u)]);
      return rows.length > 0 ? rows : [[lc.id, lc.category, lc.pattern ? "yes" : "", "(none)", "", ""]];
    }),
  });
  heading(doc, "Load combinations");
  drawTable(doc, {
    columns: columnsByWeight([["Combination", 1], ["Factors", 5]]),
    rows: model.combinations.map((c) => [c.id, Object.entries(c.factors).map(([id, f]) => `${f} ${id}`).join(" + ")]),
  });
}

export function drawReactionTable(doc: Doc, table: ReactionTable, u: UnitSystem): void {
  const f = displayUnit(u, "force").label;
  const m = displayUnit(u, "moment").label;
  const show = (q: "force" | "moment", v: number) => formatNumber(toDisplay(u, q, v), 2);
  heading(doc, "Support reactions");
  paragraph(doc, `Force and moment the support exerts on the beam, Fy positive upward. Rows marked uplift have the support holding the beam down. Case rows are unfactored.`);
  drawTable(doc, {
    columns: columnsByWeight([
      ["Support", 0.9], [`x [${displayUnit(u, "length").label}]`, 0.9, "right"], ["Case or combination", 2.6],
      [`Fy [${f}]`, 1.1, "right"], [`Mz [${m}]`, 1.1, "right"], [`Fy max / min [${f}]`, 2, "right"],
      [`Mz max / min [${m}]`, 2, "right"], ["", 0.9],
    ]),
    rows: table.rows.map((r) => [
      r.label,
      formatNumber(toDisplay(u, "length", r.x), 3),
      describeRow(r),
      r.kind === "envelope" ? "" : show("force", r.fy),
      r.kind === "envelope" ? "" : show("moment", r.mz),
      r.kind === "envelope" ? `${show("force", r.fyMax)} / ${show("force", r.fyMin)}` : "",
      r.kind === "envelope" ? `${show("moment", r.mzMax)} / ${show("moment", r.mzMin)}` : "",
      r.uplift ? "uplift" : "",
    ]),
    highlight: (i) => table.rows[i]?.uplift === true,
  });
}

function resultIds(model: BeamModel): string[] {
  return [...model.loadCases.map((c) => c.id), ...model.combinations.map((c) => c.id)];
}

export function drawExtremes(doc: Doc, model: BeamModel, result: SolveResult, u: UnitSystem): void {
  const at = (e: { value: number; x: number } | undefined, q: "force" | "moment") =>
    e ? `${formatNumber(toDisplay(u, q, e.value), 2)} @ ${formatNumber(toDisplay(u, "length", e.x), 2)}` : "";
  heading(doc, "Extremes of shear and bending moment");
  paragraph(doc, `Exact extremes over the whole beam, value @ x [${displayUnit(u, "length").label}]. Bending moment positive sagging.`);
  const rows = resultIds(model).map((id) => {
    const e: Partial<CaseResult["extremes"]> = result.results[id]?.extremes ?? {};
    return [id, at(e.Mmax, "moment"), at(e.Mmin, "moment"), at(e.Vmax, "force"), at(e.Vmin, "force")];
  });
  const all = result.envelopes["*"]?.extremes;
  if (all) rows.push(["envelope, all", at(all.Mmax, "moment"), at(all.Mmin, "moment"), at(all.Vmax, "force"), at(all.Vmin, "force")]);
  const m = displayUnit(u, "moment").label;
  const f = displayUnit(u, "force").label;
  drawTable(doc, {
    columns: columnsByWeight([["Case or combination", 1.6], [`M max [${m}]`, 2, "right"], [`M min [${m}]`, 2, "right"], [`V max [${f}]`, 2, "right"], [`V min [${f}]`, 2, "right"]]),
    rows,
  });
}

export function drawDeflections(doc: Doc, model: BeamModel, result: SolveResult, u: UnitSystem): void {
  const spans = listSpans(model);
  const d = displayUnit(u, "deflection").label;
  heading(doc, "Deflections");
  paragraph(doc, `Largest downward and upward deflection, value @ x, and the span over the largest deflection as span length / deflection (compare with the governing limit, e.g. L/360). For an overhang, L is the overhang length.`);
  const ratio = (e: { value: number; x: number }) => {
    const span = spanAt(spans, e.x);
    if (!span || Math.abs(e.value) < 1e-12) return "";
    return `L/${Math.round((span.x2 - span.x1) / Math.abs(e.value))} (span ${span.number})`;
  };
  const ids = resultIds(model);
  drawTable(doc, {
    columns: columnsByWeight([["Case or combination", 1.6], [`Down [${d}] @ x`, 2, "right"], ["Span / deflection", 2, "right"], [`Up [${d}] @ x`, 2, "right"]]),
    rows: ids.map((id) => {
      const e = result.results[id]?.extremes;
      if (!e) return [id, "", "", ""];
      const show = (v: { value: number; x: number }) =>
        `${formatNumber(toDisplay(u, "deflection", v.value), 2)} @ ${formatNumber(toDisplay(u, "length", v.x), 2)}`;
      return [id, show(e.uyMin), ratio(e.uyMin), show(e.uyMax)];
    }),
  });
}

/** One check row of the report: which span and case, and the check as the design package gives it. */
export interface ReportCheckRow {
  readonly span: string;
  readonly caseId: string;
  readonly check: CheckResult;
}

export interface ReportCodeEdition {
  readonly id: string;
  readonly title: string;
  readonly usedFor: string;
}

export interface MemberChecksInput {
  readonly rows: readonly ReportCheckRow[];
  /** Which section and material the checks are for, e.g. "I 300×150, structural steel Fy = 345 MPa". */
  readonly basis?: string;
  readonly codeEditions: readonly ReportCodeEdition[];
  readonly caution: string;
}

// Stresses read in MPa or ksi (common practice), not in the modulus units of the model tables.
const STRESS = { si: { label: "MPa", toSI: 1e6 }, us: { label: "ksi", toSI: KIP_N / (IN_M * IN_M) } } as const;

/**
 * The Latin subset of the report font has no Greek letters or maths signs; the check formulas use
 * them, so spell them out rather than print missing-glyph boxes.
 */
const SPELLED: Record<string, string> = {
  φ: "phi", Ω: "Omega", δ: "delta", σ: "sigma", τ: "tau", λ: "lambda", κ: "kappa", π: "pi", ψ: "psi",
  "≤": "<=", "≥": ">=", "≈": "~", "√": "sqrt", "→": "->",
};
const spellOut = (text: string) => text.replace(/[φΩδστλκπψ≤≥≈√→]/gu, (c) => SPELLED[c] ?? c);

/** Demand or capacity in the report's units; the design package reports SI with a unit name. */
function checkValue(u: UnitSystem, unit: string, si: number): string {
  switch (unit) {
    case "N·m":
      return formatQuantity(u, "moment", si, 2);
    case "N":
      return formatQuantity(u, "force", si, 2);
    case "m":
      return formatQuantity(u, "deflection", si, 2);
    case "Pa":
      return `${formatNumber(si / STRESS[u].toSI, 1)} ${STRESS[u].label}`;
    default:
      return `${formatNumber(si, 3)} ${unit}`;
  }
}

/**
 * "Member checks": one row per span, case and check with clause, demand, capacity, utilisation
 * and result; then each distinct formula with its source, the notes, the code editions used and
 * the design caution.
 */
export function drawMemberChecks(doc: Doc, checks: MemberChecksInput, u: UnitSystem): void {
  heading(doc, "Member checks");
  if (checks.basis) paragraph(doc, `Section and material: ${checks.basis}.`);
  paragraph(doc, checks.caution);
  const columns = columnsByWeight([
    ["Span", 0.5], ["Case", 0.8], ["Check", 3], ["Clause", 3.3], ["Demand", 1.35, "right"], ["Capacity", 1.35, "right"],
    ["Util.", 0.75, "right"], ["Result", 0.75],
  ]);
  // Table cells do not wrap: a long title or clause is shortened here and given in full under "Check formulas".
  doc.font(FONT.regular).fontSize(7.5);
  const fit = (text: string, width: number) => {
    if (doc.widthOfString(pdfSafe(text)) <= width - 8) return text;
    let cut = text;
    while (cut.length > 1 && doc.widthOfString(pdfSafe(`${cut}...`)) > width - 8) cut = cut.slice(0, -1);
    return `${cut.trimEnd()}...`;
  };
  drawTable(doc, {
    columns,
    rows: checks.rows.map(({ span, caseId, check }) =>
      (check.status === "not-covered"
        ? [span, caseId, check.title, check.source, "", "", "", "not covered"]
        : [span, caseId, check.title, check.source, checkValue(u, check.unit, check.demand), checkValue(u, check.unit, check.capacity),
          formatNumber(check.utilisation, 3), check.pass ? "pass" : "FAIL"]
      ).map((cell, j) => fit(spellOut(cell), columns[j]?.width ?? CONTENT_WIDTH)),
    ),
    highlight: (i) => checks.rows[i]?.check.pass === false,
  });
  const formulas = new Map<string, string>();
  const notes = new Set<string>();
  for (const { check } of checks.rows) {
    formulas.set(`${check.title}: ${check.formula}`, check.source);
    for (const n of check.notes) notes.add(n);
    if (check.status === "not-covered") notes.add(`${check.title}: not covered, ${check.reason}`);
  }
  heading(doc, "Check formulas");
  for (const [formula, source] of formulas) paragraph(doc, spellOut(`${formula} (${source})`));
  if (notes.size > 0) paragraph(doc, spellOut(`Notes: ${[...notes].join("; ")}.`));
  heading(doc, "Code editions used");
  for (const e of checks.codeEditions) paragraph(doc, `${e.id}, ${e.title}: ${e.usedFor}.`);
}
