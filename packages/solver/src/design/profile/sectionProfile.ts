import { exhaustive, invalid, ok, type DesignResult } from "../result.js";
import { firstMomentAbove, widthAt } from "../sections/layeredSection.js";
import { roundFirstMomentAbove, roundWidthAt } from "../sections/roundSections.js";
import { sectionGeometry } from "../sections/sectionGeometry.js";
import { propertiesOfValidShape, type SectionProperties } from "../sections/sectionProperties.js";
import type { SectionShape } from "../sections/sectionShape.js";
import { validateSectionShape } from "../sections/validateSectionShape.js";

/**
 * One point through the depth. Signs: y is measured up from the neutral axis; M > 0 sags, so the
 * curvature κ = M/(E·I) > 0 and the strain ε = −y·κ is tension (positive) below the axis (plane
 * sections remain plane); σ = E·ε.
 */
export interface ProfilePoint {
  /** Depth below the top fibre, m. */ readonly s: number;
  /** Height above the neutral axis, m. */ readonly y: number;
  readonly strain: number;
  /** Bending stress, Pa, tension positive. */ readonly stress: number;
  /** τ = V·Q(y)/(I·b(y)), Pa; null where the shape does not define Q (custom sections). */
  readonly shearStress: number | null;
  /** Width of material at this depth, m; null for custom sections. */ readonly width: number | null;
}

export interface SectionProfile {
  readonly properties: SectionProperties;
  /** κ = M/(E·I), 1/m. */ readonly curvature: number;
  readonly points: readonly ProfilePoint[];
  readonly top: { readonly y: number; readonly strain: number; readonly stress: number };
  readonly bottom: { readonly y: number; readonly strain: number; readonly stress: number };
  /** τ at the neutral axis, V·Q/(I·b), Pa; null if Q or b is unknown. */
  readonly shearStressAtNeutralAxis: number | null;
  /**
   * Timoshenko average shear strain in the exchange format's sign, d(uy)/dx − rz = −V/(κs·G·A),
   * null unless G is given and a shear factor is known.
   */
  readonly shearStrain: number | null;
}

type Cut = { readonly Q: (s: number) => number; readonly b: (s: number) => number } | null;

function cutOf(shape: SectionShape, yTop: number): Cut {
  const g = sectionGeometry(shape);
  switch (g.kind) {
    case "bands":
      return { Q: (s) => firstMomentAbove(g.bands, s, yTop), b: (s) => widthAt(g.bands, s) };
    case "round":
      return { Q: (s) => roundFirstMomentAbove(g.round, s), b: (s) => roundWidthAt(g.round, s) };
    case "custom":
      return null;
    default:
      return exhaustive(g);
  }
}

function depthsToSample(shape: SectionShape, p: SectionProperties, count: number): number[] {
  const g = sectionGeometry(shape);
  const extra = g.kind === "bands" ? g.bands.flatMap((b) => [b.top, b.bottom]) : [];
  const all = [...Array.from({ length: count }, (_, i) => (i * p.depth) / (count - 1)), p.yTop, ...extra];
  return [...new Set(all.map((s) => Math.min(Math.max(s, 0), p.depth)))].sort((a, b) => a - b);
}

/**
 * Strain and stress through the depth of a section at one x along the beam, for the section view.
 * M (N·m, sagging positive) and V (N) come from the beam results; E and G in Pa; `shearFactor`
 * (the Timoshenko shear correction factor) defaults to the section's own.
 */
export function sectionProfile(shapeInput: unknown, M: number, V: number, E: number, G?: number, shearFactor?: number, points = 41): DesignResult<SectionProfile> {
  const valid = validateSectionShape(shapeInput);
  if (!valid.ok) return valid;
  if (!(E > 0)) return invalid("E", "modulus of elasticity E must be greater than zero");
  if (G !== undefined && !(G > 0)) return invalid("G", "shear modulus G must be greater than zero");
  const shape = valid.value;
  const p = propertiesOfValidShape(shape);
  const curvature = M / (E * p.I);
  const cut = cutOf(shape, p.yTop);
  const at = (s: number): ProfilePoint => {
    const y = p.yTop - s;
    const strain = -y * curvature;
    const width = cut ? cut.b(s) : null;
    const shearStress = cut && width ? (V * cut.Q(s)) / (p.I * width) : null;
    return { s, y, strain, stress: E * strain, shearStress, width };
  };
  const fibre = (s: number) => {
    const q = at(s);
    return { y: q.y, strain: q.strain, stress: q.stress };
  };
  const kappaS = shearFactor ?? p.shearFactor;
  return ok({
    properties: p,
    curvature,
    points: depthsToSample(shape, p, Math.max(points, 2)).map(at),
    top: fibre(0),
    bottom: fibre(p.depth),
    shearStressAtNeutralAxis: p.Q !== null && p.bNA ? (V * p.Q) / (p.I * p.bNA) : null,
    shearStrain: G !== undefined && kappaS ? -V / (kappaS * G * p.A) : null,
  });
}
