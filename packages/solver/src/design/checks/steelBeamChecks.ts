import type { IShapeLtbProperties } from "../sections/iShapeProperties.js";
import type { IShape } from "../sections/sectionShape.js";
import { cbFromSamples } from "./aiscCb.js";
import { checkAiscF2Flexure } from "./aiscF2.js";
import { checkAiscG2Shear } from "./aiscG2.js";
import type { CheckResult } from "./checkResult.js";
import { checkDeflection, spanDeflection, type DeflectionLimit, type SpanKind } from "./deflectionCheck.js";
import type { DesignMethod } from "./designMethod.js";

/** The fields of the exchange format's `results[id].stations[]` these checks read (SI, contract signs). */
export interface StationLike {
  readonly x: number;
  readonly V: number;
  readonly M: number;
  readonly uy: number;
}

export interface SpanRef {
  readonly label: string;
  readonly x1: number;
  readonly x2: number;
  /** A cantilever is supported at `supportAt` only. */
  readonly kind: SpanKind;
  readonly supportAt?: "left" | "right";
}

/**
 * How Cb is found: by eq. F1-1 from the moment diagram of each unbraced segment, or taken as 1.0,
 * which AISC 360-22 §F1 always permits as conservative (from memory).
 */
export type CbRule = "equation-f1-1" | "unity";

export interface SteelBeamCheckInput {
  readonly shape: IShape;
  readonly properties?: Partial<IShapeLtbProperties>;
  readonly Fy: number;
  readonly E?: number;
  readonly method: DesignMethod;
  readonly fabrication?: "rolled" | "built-up";
  readonly spans: readonly SpanRef[];
  /** x of lateral braces of the compression flange in addition to the span ends. */
  readonly bracePoints: readonly number[];
  /** Factored (LRFD) or ASD combinations with dense stations; include quarter points of each segment for exact Cb. */
  readonly strength: readonly { readonly id: string; readonly stations: readonly StationLike[] }[];
  /** Cases or combinations to check for deflection, each with its limit. */
  readonly deflection: readonly { readonly id: string; readonly stations: readonly StationLike[]; readonly limit: DeflectionLimit }[];
  /** Default "equation-f1-1". */
  readonly cb?: CbRule;
}

export interface SpanCheckRow {
  readonly span: string;
  readonly caseId: string;
  /** Part of the beam the check covers, m. */
  readonly x1: number;
  readonly x2: number;
  readonly check: CheckResult;
}

function within<T extends { x: number }>(stations: readonly T[], x1: number, x2: number): T[] {
  return stations.filter((s) => s.x >= x1 - 1e-9 && s.x <= x2 + 1e-9);
}

function segmentsOf(span: SpanRef, braces: readonly number[]): [number, number][] {
  const cuts = [...new Set([span.x1, span.x2, ...braces.filter((b) => b > span.x1 && b < span.x2)])].sort((a, b) => a - b);
  return cuts.slice(1).map((x, i) => [cuts[i]!, x]);
}

/**
 * The check table of a steel I-beam: per span and combination, AISC 360-22 §F2 flexure for each
 * unbraced segment (Lb = segment length, Cb by eq. F1-1 from the stations) and §G2.1 shear; per
 * span and chosen case, the deflection limit. Demands are the largest magnitudes among the stations.
 */
export function steelBeamChecks(input: SteelBeamCheckInput): SpanCheckRow[] {
  const rows: SpanCheckRow[] = [];
  const { shape } = input;
  for (const span of input.spans) {
    for (const combo of input.strength) {
      for (const [xa, xb] of segmentsOf(span, input.bracePoints)) {
        const seg = within(combo.stations, xa, xb);
        if (seg.length === 0) continue;
        const Mr = Math.max(...seg.map((s) => Math.abs(s.M)));
        const unity = input.cb === "unity";
        const Cb = unity ? 1 : cbFromSamples(seg, xa, xb).Cb;
        const check = checkAiscF2Flexure({ shape, properties: input.properties, Fy: input.Fy, E: input.E, Lb: xb - xa, Cb, ...(unity ? { CbBasis: "taken as 1.0" as const } : {}), Mr, method: input.method });
        rows.push({ span: span.label, caseId: combo.id, x1: xa, x2: xb, check });
      }
      const inSpan = within(combo.stations, span.x1, span.x2);
      if (inSpan.length === 0) continue;
      const Vr = Math.max(...inSpan.map((s) => Math.abs(s.V)));
      const check = checkAiscG2Shear({
        d: shape.d, tw: shape.tw, h: input.properties?.h ?? shape.d - 2 * shape.tf, Fy: input.Fy, E: input.E, Vr, method: input.method,
        fabrication: input.fabrication ?? "rolled",
      });
      rows.push({ span: span.label, caseId: combo.id, x1: span.x1, x2: span.x2, check });
    }
    for (const d of input.deflection) {
      const supportAt = span.kind === "cantilever" ? (span.supportAt ?? "left") : "both";
      const delta = spanDeflection(d.stations, span.x1, span.x2, supportAt);
      const check = checkDeflection({ length: span.x2 - span.x1, spanKind: span.kind, deflection: delta, limit: d.limit, caseLabel: d.id });
      rows.push({ span: span.label, caseId: d.id, x1: span.x1, x2: span.x2, check });
    }
  }
  return rows;
}

/** The row with the highest utilisation; rows that are not covered come first, since they need attention. */
export function governingRow(rows: readonly SpanCheckRow[]): SpanCheckRow | undefined {
  const notCovered = rows.find((r) => r.check.status === "not-covered");
  if (notCovered) return notCovered;
  return rows.reduce<SpanCheckRow | undefined>((worst, r) => {
    if (r.check.status === "not-covered") return worst;
    if (!worst || worst.check.status === "not-covered") return r;
    return r.check.utilisation > worst.check.utilisation ? r : worst;
  }, undefined);
}
