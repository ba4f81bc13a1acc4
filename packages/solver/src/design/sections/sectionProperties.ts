import { exhaustive, ok, type DesignResult } from "../result.js";
import { bandProperties, firstMomentAbove, widthAt } from "./layeredSection.js";
import { roundArea, roundFirstMomentAbove, roundPlasticModulus, roundSecondMoment, roundWidthAt } from "./roundSections.js";
import { sectionGeometry, shapeDepth } from "./sectionGeometry.js";
import type { SectionKind, SectionShape } from "./sectionShape.js";
import { validateSectionShape } from "./validateSectionShape.js";

/** Strong-axis properties, SI: m, m², m³, m⁴. `null` where a custom section leaves a value unknown. */
export interface SectionProperties {
  readonly kind: SectionKind;
  readonly A: number;
  /** Second moment of area about the horizontal centroidal axis. */
  readonly I: number;
  readonly depth: number;
  /** Centroid (elastic neutral axis) below the top fibre. */
  readonly yTop: number;
  /** Elastic section modulus to the top fibre, I / yTop. */
  readonly Stop: number;
  /** Elastic section modulus to the bottom fibre, I / (depth − yTop). */
  readonly Sbot: number;
  /** Plastic section modulus about the plastic neutral axis. */
  readonly Z: number | null;
  /** Plastic neutral axis below the top fibre (equal areas above and below). */
  readonly yPlastic: number | null;
  /** First moment of the area above the neutral axis, about it (for τ = V·Q/(I·b)). */
  readonly Q: number | null;
  /** Width of material at the neutral axis. */
  readonly bNA: number | null;
  /** Shear area As = κ·A for Timoshenko beams. */
  readonly shearArea: number | null;
  /** κ = As/A, the contract's `shearFactor`. */
  readonly shearFactor: number | null;
  /** Where the shear area comes from. */
  readonly shearAreaBasis: string;
}

/**
 * Shear correction factors. Cowper (1966), "The shear coefficient in Timoshenko's beam theory",
 * J. Appl. Mech. 33: rectangle κ = 10(1+ν)/(12+11ν), solid circle κ = 6(1+ν)/(7+6ν). We use
 * ν = 0 for both, giving the familiar 5/6 and 6/7 (at ν = 0.3 Cowper gives 0.850 and 0.886).
 */
export const SHEAR_FACTOR_RECTANGLE = 5 / 6;
export const SHEAR_FACTOR_SOLID_CIRCLE = 6 / 7;
/** Thin-walled circular tube, κ = 0.5 (Cowper 1966, thin-walled limit at ν = 0). */
export const SHEAR_FACTOR_THIN_TUBE = 0.5;

export function cowperShearFactor(shape: "rectangle" | "circle", poissonRatio: number): number {
  const nu = poissonRatio;
  return shape === "rectangle" ? (10 * (1 + nu)) / (12 + 11 * nu) : (6 * (1 + nu)) / (7 + 6 * nu);
}

function shearArea(shape: SectionShape, A: number): { As: number | null; basis: string } {
  switch (shape.kind) {
    case "rectangle":
      return { As: SHEAR_FACTOR_RECTANGLE * A, basis: "5/6·A (Cowper 1966, ν = 0)" };
    case "circle":
      return { As: SHEAR_FACTOR_SOLID_CIRCLE * A, basis: "6/7·A (Cowper 1966, ν = 0)" };
    case "hollow-circle":
      return { As: SHEAR_FACTOR_THIN_TUBE * A, basis: "0.5·A (thin-walled tube, Cowper 1966)" };
    case "box":
      return { As: 2 * shape.tw * shape.h, basis: "2·h·tw, the two webs over the full depth (common practice)" };
    case "i-shape":
    case "channel":
    case "tee":
      return { As: shape.d * shape.tw, basis: "d·tw, web over the full depth (common practice)" };
    case "custom":
      return { As: shape.shearArea ?? null, basis: shape.shearArea === undefined ? "not given" : "typed by the user" };
    default:
      return exhaustive(shape);
  }
}

/** Properties of a shape that has already passed `validateSectionShape`. */
export function propertiesOfValidShape(shape: SectionShape): SectionProperties {
  const depth = shapeDepth(shape);
  const geometry = sectionGeometry(shape);
  let core: Pick<SectionProperties, "A" | "I" | "yTop" | "Z" | "yPlastic" | "Q" | "bNA">;
  switch (geometry.kind) {
    case "bands": {
      const p = bandProperties(geometry.bands);
      core = {
        A: p.A,
        I: p.I,
        yTop: p.yTop,
        Z: p.Z,
        yPlastic: p.yPlastic,
        Q: firstMomentAbove(geometry.bands, p.yTop, p.yTop),
        bNA: widthAt(geometry.bands, p.yTop),
      };
      break;
    }
    case "round": {
      const g = geometry.round;
      core = {
        A: roundArea(g),
        I: roundSecondMoment(g),
        yTop: g.ro,
        Z: roundPlasticModulus(g),
        yPlastic: g.ro,
        Q: roundFirstMomentAbove(g, g.ro),
        bNA: roundWidthAt(g, g.ro),
      };
      break;
    }
    case "custom": {
      if (shape.kind !== "custom") throw new Error("custom geometry for a parametric shape");
      core = {
        A: shape.A,
        I: shape.I,
        yTop: shape.yTop ?? shape.depth / 2,
        Z: shape.Z ?? null,
        yPlastic: null,
        Q: shape.Q ?? null,
        bNA: shape.bNA ?? null,
      };
      break;
    }
    default:
      return exhaustive(geometry);
  }
  const { As, basis } = shearArea(shape, core.A);
  return {
    kind: shape.kind,
    ...core,
    depth,
    Stop: core.I / core.yTop,
    Sbot: core.I / (depth - core.yTop),
    shearArea: As,
    shearFactor: As === null ? null : As / core.A,
    shearAreaBasis: basis,
  };
}

/** Validates unknown input as a `SectionShape` and computes its strong-axis properties. */
export function sectionProperties(input: unknown): DesignResult<SectionProperties> {
  const shape = validateSectionShape(input);
  return shape.ok ? ok(propertiesOfValidShape(shape.value)) : shape;
}
