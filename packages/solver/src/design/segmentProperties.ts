import type { Material } from "./materials/material.js";
import { invalid, ok, type DesignResult } from "./result.js";
import type { SectionProperties } from "./sections/sectionProperties.js";

/** Stiffness fields of one exchange-format segment (`segments[i]`), SI units. */
export interface SegmentStiffness {
  readonly E: number;
  readonly I: number;
  readonly A?: number;
  readonly G?: number;
  readonly shearFactor?: number;
}

/**
 * The segment fields a section and material give the engine. Euler-Bernoulli needs E and I;
 * Timoshenko also needs A, G and the shear correction factor (exchange format, "theory").
 */
export function segmentStiffness(section: SectionProperties, material: Pick<Material, "E" | "G">, theory: "euler-bernoulli" | "timoshenko"): DesignResult<SegmentStiffness> {
  if (theory === "euler-bernoulli") return ok({ E: material.E, I: section.I });
  if (material.G === undefined) return invalid("material.G", "Timoshenko theory needs the shear modulus G of the material");
  if (section.shearFactor === null) return invalid("section.shearArea", "Timoshenko theory needs the shear area of the section");
  return ok({ E: material.E, I: section.I, A: section.A, G: material.G, shearFactor: section.shearFactor });
}
