import { parse } from "csv-parse/sync";
import type { BeamLoad, BeamModel, LoadCategory } from "./exchange.js";
import { inputUnitFactor, inputUnitKind, type InputUnitKind } from "./units.js";

/**
 * Uploaded load schedule: a CSV with the columns case, type, position, magnitude. Values carry
 * their units ("-12 kN", "-3 kN/m", "2.5 kip/ft", "15 kN·m"; positions "3 m", "1500 mm",
 * "0..6 m", "10 ft"). Signs follow the contract: loads positive upward, so gravity is negative;
 * moments positive counterclockwise. A distributed load may vary linearly: "-3..-5 kN/m".
 * Parsing is all-or-nothing: any error leaves ok false and the caller applies nothing.
 */

export const SCHEDULE_COLUMNS = ["case", "type", "position", "magnitude"] as const;
export type ScheduleColumn = (typeof SCHEDULE_COLUMNS)[number];

export type ScheduleErrorCode =
  | "malformed-csv"
  | "empty-file"
  | "wrong-columns"
  | "too-many-rows"
  | "missing-value"
  | "unknown-type"
  | "unknown-unit"
  | "unit-mismatch"
  | "not-a-number"
  | "bad-range"
  | "out-of-range"
  | "unknown-case"
  | "bad-case-id";

export interface ScheduleError {
  /** Line in the file, header = 1, as a spreadsheet shows it; 0 for whole-file problems. */
  row: number;
  column: ScheduleColumn | null;
  code: ScheduleErrorCode;
  message: string;
}

export interface ScheduleRow {
  row: number;
  caseId: string;
  load: BeamLoad;
}

export interface ScheduleCasePreview {
  id: string;
  /** True when the case is not in the model and applying the schedule adds it. */
  willCreate: boolean;
  loads: BeamLoad[];
}

export interface LoadSchedulePreview {
  rows: ScheduleRow[];
  cases: ScheduleCasePreview[];
}

export interface LoadScheduleResult {
  ok: boolean;
  preview: LoadSchedulePreview;
  errors: ScheduleError[];
}

export interface LoadScheduleOptions {
  /** "create": a case not in the model is flagged willCreate; "error": it is a row error. */
  unknownCase?: "error" | "create";
  maxRows?: number;
}

const NUMBER = String.raw`[+-]?(?:\d+(?:\.\d+)?|\.\d+)(?:[eE][+-]?\d+)?`;
const VALUE_PATTERN = new RegExp(String.raw`^\s*(${NUMBER})(?:\s*\.\.\s*(${NUMBER}))?\s*(.*?)\s*$`);
const CASE_ID_PATTERN = /^[A-Za-z0-9_.-]{1,32}$/;
const LOAD_TYPES = ["point", "moment", "distributed"] as const;
type ScheduleLoadType = (typeof LOAD_TYPES)[number];

interface Measured {
  values: number[];
  /** SI values. */
  si: number[];
}

type Measure = { ok: true; value: Measured } | { ok: false; code: ScheduleErrorCode; message: string };

function measure(text: string, kind: InputUnitKind): Measure {
  const match = VALUE_PATTERN.exec(text);
  if (!match) return { ok: false, code: "not-a-number", message: `"${text}" does not start with a number` };
  const [, first, second, unit = ""] = match;
  if (unit === "") return { ok: false, code: "unknown-unit", message: `"${text}" has no unit` };
  const factor = inputUnitFactor(kind, unit);
  if (factor === undefined) {
    const other = inputUnitKind(unit);
    return other
      ? { ok: false, code: "unit-mismatch", message: `"${unit}" is a ${other} unit; expected a ${kind} unit` }
      : { ok: false, code: "unknown-unit", message: `unknown unit "${unit}"` };
  }
  const values = [first, second].filter((v): v is string => v !== undefined).map(Number);
  return { ok: true, value: { values, si: values.map((v) => v * factor) } };
}

const MAGNITUDE_KIND: Record<ScheduleLoadType, InputUnitKind> = {
  point: "force",
  moment: "moment",
  distributed: "distributed",
};

type Record4 = Record<ScheduleColumn, string>;

function parseRow(rec: Record4, row: number, extent: [number, number]): ScheduleRow | ScheduleError[] {
  const errors: ScheduleError[] = [];
  const fail = (column: ScheduleColumn, code: ScheduleErrorCode, message: string) =>
    errors.push({ row, column, code, message });
  for (const column of SCHEDULE_COLUMNS) if (rec[column] === "") fail(column, "missing-value", `${column} is empty`);
  if (errors.length > 0) return errors;

  if (!CASE_ID_PATTERN.test(rec.case)) fail("case", "bad-case-id", "case ids are 1-32 letters, digits, _ . -");
  const type = rec.type.toLowerCase() as ScheduleLoadType;
  if (!LOAD_TYPES.includes(type)) {
    fail("type", "unknown-type", `type "${rec.type}" is not point, moment or distributed`);
    return errors;
  }
  const position = measure(rec.position, "length");
  const magnitude = measure(rec.magnitude, MAGNITUDE_KIND[type]);
  if (!position.ok) fail("position", position.code, position.message);
  if (!magnitude.ok) fail("magnitude", magnitude.code, magnitude.message);
  if (!position.ok || !magnitude.ok) return errors;

  const xs = position.value.si;
  const qs = magnitude.value.si;
  const tolerance = 1e-9 * Math.max(1, Math.abs(extent[1] - extent[0]));
  if (type === "distributed" ? xs.length !== 2 : xs.length !== 1) {
    fail("position", "bad-range", type === "distributed" ? "a distributed load needs x1..x2" : `a ${type} load sits at one x`);
  } else if (xs.some((x) => x < extent[0] - tolerance || x > extent[1] + tolerance)) {
    fail("position", "out-of-range", `position is outside the beam (${extent[0]} m to ${extent[1]} m)`);
  } else if (type === "distributed" && !(xs[1]! > xs[0]!)) {
    fail("position", "bad-range", "x1 must be less than x2");
  }
  if (type !== "distributed" && qs.length !== 1) fail("magnitude", "bad-range", `a ${type} load has one magnitude`);
  if (errors.length > 0) return errors;

  // Clamp to the beam ends: "0..12 m" typed for a 12 m beam must not fail on rounding.
  const clamp = (x: number) => Math.min(extent[1], Math.max(extent[0], x));
  const load: BeamLoad =
    type === "point"
      ? { type, x: clamp(xs[0]!), fy: qs[0]! }
      : type === "moment"
        ? { type, x: clamp(xs[0]!), mz: qs[0]! }
        : { type, x1: clamp(xs[0]!), x2: clamp(xs[1]!), qy1: qs[0]!, qy2: qs[1] ?? qs[0]! };
  return { row, caseId: rec.case, load };
}

type Parsed = { ok: true; records: Array<{ record: string[]; info: { lines: number } }> } | { ok: false; error: ScheduleError };

function readCsv(text: string): Parsed {
  try {
    const records = parse(text, {
      bom: true,
      trim: true,
      skip_empty_lines: true,
      relax_column_count: true,
      info: true,
    }) as unknown as Array<{ record: string[]; info: { lines: number } }>;
    return { ok: true, records };
  } catch (error) {
    const line = typeof (error as { lines?: unknown }).lines === "number" ? (error as { lines: number }).lines : 0;
    return { ok: false, error: { row: line, column: null, code: "malformed-csv", message: (error as Error).message } };
  }
}

/** Parses a load schedule against the beam it will go into; see the module comment. */
export function parseLoadSchedule(text: string, model: BeamModel, options: LoadScheduleOptions = {}): LoadScheduleResult {
  const unknownCase = options.unknownCase ?? "error";
  const maxRows = options.maxRows ?? 2000;
  const empty: LoadSchedulePreview = { rows: [], cases: [] };
  const done = (errors: ScheduleError[], preview = empty): LoadScheduleResult => ({ ok: errors.length === 0, preview, errors });

  const parsed = readCsv(text);
  if (!parsed.ok) return done([parsed.error]);
  const [head, ...body] = parsed.records;
  if (!head || body.length === 0) return done([{ row: 0, column: null, code: "empty-file", message: "no load rows in the file" }]);
  const header = head.record.map((h) => h.toLowerCase());
  const missing = SCHEDULE_COLUMNS.filter((c) => !header.includes(c));
  const extra = header.filter((h) => !(SCHEDULE_COLUMNS as readonly string[]).includes(h));
  if (missing.length > 0 || extra.length > 0 || header.length !== SCHEDULE_COLUMNS.length) {
    const parts = [missing.length ? `missing ${missing.join(", ")}` : "", extra.length ? `unexpected ${extra.join(", ")}` : ""];
    const message = `columns must be ${SCHEDULE_COLUMNS.join(", ")}: ${parts.filter(Boolean).join("; ") || "duplicated columns"}`;
    return done([{ row: head.info.lines, column: null, code: "wrong-columns", message }]);
  }
  if (body.length > maxRows) {
    return done([{ row: 0, column: null, code: "too-many-rows", message: `at most ${maxRows} load rows` }]);
  }

  const first = model.nodes[0]?.x ?? 0;
  const extent: [number, number] = [first, model.nodes[model.nodes.length - 1]?.x ?? first];
  const known = new Set(model.loadCases.map((c) => c.id));
  const combinationIds = new Set(model.combinations.map((c) => c.id));
  const errors: ScheduleError[] = [];
  const rows: ScheduleRow[] = [];
  for (const { record, info } of body) {
    const row = info.lines;
    if (record.length !== SCHEDULE_COLUMNS.length) {
      errors.push({ row, column: null, code: "wrong-columns", message: `expected ${SCHEDULE_COLUMNS.length} values, found ${record.length}` });
      continue;
    }
    const rec = Object.fromEntries(SCHEDULE_COLUMNS.map((c) => [c, record[header.indexOf(c)] ?? ""])) as Record4;
    const result = parseRow(rec, row, extent);
    if (Array.isArray(result)) {
      errors.push(...result);
      continue;
    }
    if (combinationIds.has(result.caseId)) {
      errors.push({ row, column: "case", code: "bad-case-id", message: `"${result.caseId}" is a combination, not a load case` });
    } else if (!known.has(result.caseId) && unknownCase === "error") {
      errors.push({ row, column: "case", code: "unknown-case", message: `no load case "${result.caseId}" in this beam` });
    } else {
      rows.push(result);
    }
  }
  if (errors.length > 0) return done(errors);

  const cases = new Map<string, ScheduleCasePreview>();
  for (const r of rows) {
    const entry = cases.get(r.caseId) ?? { id: r.caseId, willCreate: !known.has(r.caseId), loads: [] };
    entry.loads.push(r.load);
    cases.set(r.caseId, entry);
  }
  return done([], { rows, cases: [...cases.values()] });
}

/** A new model with the previewed loads appended; new cases get `category`. */
export function applyLoadSchedule(model: BeamModel, preview: LoadSchedulePreview, category: LoadCategory = "other"): BeamModel {
  const loadCases = model.loadCases.map((lc) => {
    const add = preview.cases.find((c) => c.id === lc.id);
    return add ? { ...lc, loads: [...lc.loads, ...add.loads] } : lc;
  });
  for (const c of preview.cases) {
    if (c.willCreate) loadCases.push({ id: c.id, category, loads: [...c.loads] });
  }
  return { ...model, loadCases };
}
