import { coveredCheck, type CoveredCheck } from "./checkResult.js";

/** Which deflection a limit applies to, as the columns of IBC 2021 Table 1604.3 name them. */
export type DeflectionLoad = "live" | "snow-or-wind" | "dead-plus-live";

export interface DeflectionLimitPreset {
  readonly id: string;
  readonly label: string;
  /** The limit is L / ratio. */
  readonly ratio: number;
  readonly load: DeflectionLoad;
  readonly source: string;
}

const IBC = "IBC 2021 Table 1604.3 (from memory)";

/** IBC 2021 Table 1604.3 for floor and roof members. "L" for roof members means roof live load. */
export const DEFLECTION_LIMIT_PRESETS: readonly DeflectionLimitPreset[] = [
  { id: "floor-live", label: "Floor members, live load: L/360", ratio: 360, load: "live", source: IBC },
  { id: "floor-total", label: "Floor members, dead + live: L/240", ratio: 240, load: "dead-plus-live", source: IBC },
  { id: "roof-plaster-live", label: "Roof supporting plaster or stucco ceiling, live: L/360", ratio: 360, load: "live", source: IBC },
  { id: "roof-plaster-snow-wind", label: "Roof supporting plaster or stucco ceiling, snow or wind: L/360", ratio: 360, load: "snow-or-wind", source: IBC },
  { id: "roof-plaster-total", label: "Roof supporting plaster or stucco ceiling, dead + live: L/240", ratio: 240, load: "dead-plus-live", source: IBC },
  { id: "roof-nonplaster-live", label: "Roof supporting nonplaster ceiling, live: L/240", ratio: 240, load: "live", source: IBC },
  { id: "roof-nonplaster-snow-wind", label: "Roof supporting nonplaster ceiling, snow or wind: L/240", ratio: 240, load: "snow-or-wind", source: IBC },
  { id: "roof-nonplaster-total", label: "Roof supporting nonplaster ceiling, dead + live: L/180", ratio: 180, load: "dead-plus-live", source: IBC },
  { id: "roof-no-ceiling-live", label: "Roof not supporting a ceiling, live: L/180", ratio: 180, load: "live", source: IBC },
  { id: "roof-no-ceiling-snow-wind", label: "Roof not supporting a ceiling, snow or wind: L/180", ratio: 180, load: "snow-or-wind", source: IBC },
  { id: "roof-no-ceiling-total", label: "Roof not supporting a ceiling, dead + live: L/120", ratio: 120, load: "dead-plus-live", source: IBC },
];

/** A limit from a preset, a user-typed ratio, or a user-typed absolute value (m). */
export type DeflectionLimit =
  | { readonly kind: "preset"; readonly preset: DeflectionLimitPreset }
  | { readonly kind: "ratio"; readonly ratio: number }
  | { readonly kind: "absolute"; readonly value: number };

export type SpanKind = "span" | "cantilever";

export interface DeflectionCheckInput {
  /** Span between supports, or the overhang length of a cantilever, m. */
  readonly length: number;
  readonly spanKind: SpanKind;
  /** Deflection to check (relative to the supports, see `spanDeflection`), m; sign ignored. */
  readonly deflection: number;
  readonly limit: DeflectionLimit;
  /** Which case or combination the deflection comes from, for the report. */
  readonly caseLabel?: string;
}

/**
 * δ ≤ L/ratio. For a cantilever L is twice the overhang length (common practice; IBC 2021
 * Table 1604.3 has a footnote to the same effect, from memory).
 */
export function checkDeflection(input: DeflectionCheckInput): CoveredCheck {
  const reference = input.spanKind === "cantilever" ? 2 * input.length : input.length;
  const { limit } = input;
  const ratio = limit.kind === "preset" ? limit.preset.ratio : limit.kind === "ratio" ? limit.ratio : null;
  const capacity = ratio === null ? (limit.kind === "absolute" ? limit.value : 0) : reference / ratio;
  const source =
    limit.kind === "preset" ? limit.preset.source : limit.kind === "ratio" ? "limit typed by the user" : "absolute limit typed by the user";
  const formula = ratio === null ? "δ ≤ δallow" : input.spanKind === "cantilever" ? `δ ≤ 2·Lc/${ratio}` : `δ ≤ L/${ratio}`;
  return coveredCheck(
    {
      id: "deflection",
      title: `Deflection${input.caseLabel ? ` (${input.caseLabel})` : ""}`,
      inputs: [
        { symbol: input.spanKind === "cantilever" ? "Lc" : "L", description: input.spanKind === "cantilever" ? "overhang length" : "span", value: input.length, unit: "m" },
        { symbol: "δ", description: "deflection relative to the supports", value: Math.abs(input.deflection), unit: "m" },
        ...(ratio === null ? [] : [{ symbol: "n", description: "limit ratio L/n", value: ratio, unit: "" }]),
      ],
      formula,
      source,
      notes: input.spanKind === "cantilever" ? ["cantilever measured against twice the overhang length (common practice)"] : [],
    },
    input.deflection,
    capacity,
    "m",
  );
}

export interface DeflectionSample {
  readonly x: number;
  readonly uy: number;
}

/**
 * Largest deflection within [x1, x2] measured from the chord joining the displacements at the two
 * ends (for a span between supports, so spring or settled supports do not count as deflection), or
 * from the support displacement for a cantilever (`supportAt` names the supported end). Samples
 * catch the peak only as finely as they are spaced; the engine's exact extremes are preferable.
 */
export function spanDeflection(samples: readonly DeflectionSample[], x1: number, x2: number, supportAt: "both" | "left" | "right" = "both"): number {
  const inside = samples.filter((s) => s.x >= x1 - 1e-12 && s.x <= x2 + 1e-12).sort((a, b) => a.x - b.x);
  const first = inside[0];
  const last = inside[inside.length - 1];
  if (!first || !last) return 0;
  const base = (x: number) =>
    supportAt === "left" ? first.uy : supportAt === "right" ? last.uy : first.uy + ((last.uy - first.uy) * (x - first.x)) / (last.x - first.x || 1);
  let worst = 0;
  for (const s of inside) {
    const d = s.uy - base(s.x);
    if (Math.abs(d) > Math.abs(worst)) worst = d;
  }
  return worst;
}
