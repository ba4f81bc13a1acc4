import type { Material } from "../materials/material.js";
import { propertiesOfValidShape } from "../sections/sectionProperties.js";
import type { SectionShape } from "../sections/sectionShape.js";
import { checkDeflection, spanDeflection, type DeflectionLimit } from "./deflectionCheck.js";
import type { DesignMethod } from "./designMethod.js";
import { bracePointsEvery, checkStations } from "./resultStations.js";
import { steelBeamChecks, type CbRule, type SpanCheckRow, type SpanRef, type StationLike } from "./steelBeamChecks.js";
import { checkBendingStress, checkShearStress } from "./stressChecks.js";

/** Stations of one load case or combination, sorted by x (see `stationsFromResult`). */
export interface CheckedCase {
  readonly id: string;
  readonly stations: readonly StationLike[];
}

export interface BeamCheckInput {
  /** A shape that passed `validateSectionShape`. */
  readonly shape: SectionShape;
  readonly material: Material;
  readonly method: DesignMethod;
  readonly spans: readonly SpanRef[];
  /** x of lateral braces of the compression flange besides the span ends (`bracePointsEvery`). */
  readonly bracePoints: readonly number[];
  /** Cases or combinations for the strength checks. */
  readonly strength: readonly CheckedCase[];
  /** Cases or combinations checked for deflection, each with its limit (one id may appear under several limits). */
  readonly deflection: readonly (CheckedCase & { readonly limit: DeflectionLimit })[];
  /** Allowable stresses of the elastic checks, Pa; null leaves that check out. Unused by the AISC path. */
  readonly allowableBending: number | null;
  readonly allowableShear: number | null;
  /** How Cb is found in the AISC path; default eq. F1-1 from the moment diagram. */
  readonly cb?: CbRule;
}

/**
 * Which rules produced the rows: AISC 360-22 F2/G2 for a doubly symmetric I-shape whose material
 * gives Fy, elastic σ = M·c/I and τ = V·Q/(I·b) otherwise. Deflections are checked either way.
 */
export type BeamCheckBasis = "aisc-360-22" | "elastic";

export interface BeamCheckTable {
  readonly basis: BeamCheckBasis;
  readonly rows: SpanCheckRow[];
}

const EPS = 1e-9;

function inSpan(stations: readonly StationLike[], x1: number, x2: number): StationLike[] {
  return stations.filter((s) => s.x >= x1 - EPS && s.x <= x2 + EPS);
}

/** The value of largest magnitude, with its sign (a hogging peak stresses the other fibre first). */
function peak(values: readonly number[]): number {
  return values.reduce((m, v) => (Math.abs(v) > Math.abs(m) ? v : m), 0);
}

function deflectionRows(input: BeamCheckInput, span: SpanRef): SpanCheckRow[] {
  const supportAt = span.kind === "cantilever" ? (span.supportAt ?? "left") : "both";
  return input.deflection.map(({ id, stations, limit }) => {
    const deflection = spanDeflection(stations, span.x1, span.x2, supportAt);
    const check = checkDeflection({ length: span.x2 - span.x1, spanKind: span.kind, deflection, limit, caseLabel: id });
    return { span: span.label, caseId: id, x1: span.x1, x2: span.x2, check };
  });
}

function elasticRows(input: BeamCheckInput): SpanCheckRow[] {
  const p = propertiesOfValidShape(input.shape);
  const rows: SpanCheckRow[] = [];
  for (const span of input.spans) {
    for (const { id, stations } of input.strength) {
      const here = inSpan(stations, span.x1, span.x2);
      if (here.length === 0) continue;
      const at = { span: span.label, caseId: id, x1: span.x1, x2: span.x2 };
      if (input.allowableBending !== null)
        rows.push({ ...at, check: checkBendingStress({ M: peak(here.map((s) => s.M)), I: p.I, yTop: p.yTop, depth: p.depth, allowable: input.allowableBending }) });
      if (input.allowableShear !== null && p.Q !== null && p.bNA !== null)
        rows.push({ ...at, check: checkShearStress({ V: peak(here.map((s) => s.V)), Q: p.Q, I: p.I, b: p.bNA, allowable: input.allowableShear }) });
    }
    rows.push(...deflectionRows(input, span));
  }
  return rows;
}

/**
 * The per-span member-check table of one beam, in span order: strength rows per case, then the
 * deflection rows. A doubly symmetric I-shape whose material gives Fy is checked by AISC 360-22
 * §F2 (per unbraced segment, Cb by eq. F1-1 unless `cb` says 1.0) and §G2; any other section, or
 * an I-shape without Fy, elastically against the allowables given. The one implementation behind
 * the Checks tab and the PDF report, so both print the same numbers.
 */
export function assembleBeamChecks(input: BeamCheckInput): BeamCheckTable {
  const { shape, material } = input;
  if (shape.kind === "i-shape" && material.Fy !== undefined) {
    const rows = steelBeamChecks({
      shape,
      Fy: material.Fy,
      E: material.E,
      method: input.method,
      spans: input.spans,
      bracePoints: input.bracePoints,
      strength: input.strength,
      deflection: input.deflection,
      ...(input.cb ? { cb: input.cb } : {}),
    });
    return { basis: "aisc-360-22", rows };
  }
  return { basis: "elastic", rows: elasticRows(input) };
}

/**
 * x positions (m) at which the checks need results for these spans and a compression flange braced
 * every `Lb` (null: at the supports only): span ends, brace points and quarter points.
 */
export function checkStationsForSpans(spans: readonly SpanRef[], Lb: number | null): number[] {
  return checkStations([...new Set(spans.flatMap((s) => [s.x1, s.x2]))], bracePointsEvery(spans, Lb));
}
