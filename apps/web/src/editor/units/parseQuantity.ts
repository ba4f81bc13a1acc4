import { findUnit } from "./unitTable";
import { displayUnit, quantityDimensions, type QuantityKind, type UnitSystemId } from "./unitSystems";

export type ParseErrorCode = "empty" | "not-a-number" | "unknown-unit" | "wrong-dimension";
export interface ParseError {
  readonly code: ParseErrorCode;
  readonly message: string;
}
export type ParseResult = { readonly ok: true; readonly value: number } | { readonly ok: false; readonly error: ParseError };

const NUMBER = String.raw`(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?`;
const FRACTION = String.raw`\d+\/\d+`;
// 12 ft 6 in · 12'-6" · 12' 6 1/2" · 12'-6 · 12' : feet, then optional inches with an optional fraction.
const FEET_INCHES = new RegExp(
  String.raw`^([+-]?)\s*(${NUMBER})\s*(?:'|’|ft|feet|foot)\s*-?\s*` +
    String.raw`(?:(${NUMBER})?\s*(${FRACTION})?\s*(?:"|”|''|in|inch|inches)?)?$`,
);
const INCHES_WITH_FRACTION = new RegExp(String.raw`^([+-]?)\s*(?:(${NUMBER})\s+)?(${FRACTION})\s*(?:"|”|''|in|inch|inches)$`);
const NUMBER_THEN_UNIT = new RegExp(String.raw`^([+-]?\s*${NUMBER})\s*(.*)$`);

const FOOT = 0.3048; // m, exact
const INCH = 0.0254; // m, exact

function fail(code: ParseErrorCode, message: string): ParseResult {
  return { ok: false, error: { code, message } };
}

function parseFraction(text: string | undefined): number {
  if (!text) return 0;
  const [num, den] = text.split("/").map(Number);
  return num !== undefined && den ? num / den : 0;
}

function parseLength(text: string): number | null {
  const fi = FEET_INCHES.exec(text);
  if (fi) {
    const sign = fi[1] === "-" ? -1 : 1;
    const inches = Number(fi[3] ?? 0) + parseFraction(fi[4]);
    return sign * (Number(fi[2]) * FOOT + inches * INCH);
  }
  const fr = INCHES_WITH_FRACTION.exec(text);
  if (fr) {
    const sign = fr[1] === "-" ? -1 : 1;
    return sign * (Number(fr[2] ?? 0) + parseFraction(fr[3])) * INCH;
  }
  return null;
}

/**
 * Parses what a user typed into an SI value for a quantity of the given kind. A bare number is in
 * the display unit of the active system; any known unit of the right dimension is accepted
 * ("6500 mm" into a metre field). Thousands separators written as "6,500" are allowed.
 */
export function parseQuantity(input: string, kind: QuantityKind, system: UnitSystemId): ParseResult {
  const text = input.trim().replace(/(\d),(?=\d{3}(?!\d))/g, "$1").replace(/−/g, "-");
  if (text === "") return fail("empty", "Enter a value.");
  const dimension = quantityDimensions[kind];

  if (dimension === "length") {
    const length = parseLength(text);
    if (length !== null) return { ok: true, value: length };
  }

  const match = NUMBER_THEN_UNIT.exec(text);
  if (!match || match[1] === undefined) return fail("not-a-number", `"${input}" is not a number.`);
  const magnitude = Number(match[1].replace(/\s+/g, ""));
  if (!Number.isFinite(magnitude)) return fail("not-a-number", `"${input}" is not a number.`);
  const unitText = (match[2] ?? "").trim();

  if (unitText === "") {
    const unit = displayUnit(system, kind);
    return { ok: true, value: unit ? magnitude * unit.toSi : magnitude };
  }
  if (dimension === null) return fail("wrong-dimension", "This value has no unit.");
  const unit = findUnit(unitText);
  if (!unit) return fail("unknown-unit", `Unknown unit "${unitText}".`);
  if (unit.dimension !== dimension) {
    return fail("wrong-dimension", `${unit.symbol} is not a unit of ${dimension.replace("*", "·")}.`);
  }
  return { ok: true, value: magnitude * unit.toSi };
}
