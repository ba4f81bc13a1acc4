import type { BeamModel } from "./beamModelSchema.js";
import { addToBanded, createBandedMatrix, type BandedSymmetricMatrix } from "./bandedMatrix.js";
import { elementStiffness } from "./elementStiffness.js";
import { elementDofs, type DofMap } from "./numberDofs.js";
import type { SegmentSection } from "./segmentField.js";

/** The assembled global system: band matrix over the free DOFs plus the element matrices (row-major 4×4). */
export interface AssembledSystem {
  stiffness: BandedSymmetricMatrix;
  elements: Float64Array;
}

/** EI and 1/(κGA) per segment for the chosen theory. */
export function segmentSections(model: BeamModel): SegmentSection[] {
  return model.segments.map((s) => ({
    EI: s.E * s.I,
    shearFlexibility: model.theory === "timoshenko" ? 1 / (s.shearFactor! * s.G! * s.A!) : 0,
  }));
}

/**
 * Assembles the element matrices into banded storage over the free DOFs (restrained DOFs are
 * left out; prescribed settlements enter the right-hand sides) and adds spring supports
 * (ky to uy, kr to rz) on the diagonal.
 */
export function assembleStiffness(model: BeamModel, dofs: DofMap, sections: readonly SegmentSection[]): AssembledSystem {
  const stiffness = createBandedMatrix(dofs.count, dofs.halfBandwidth);
  const elements = new Float64Array(16 * sections.length);
  // A run of equal segments (the usual case) shares one element matrix.
  let k: number[][] = [];
  let previous = { length: NaN, EI: NaN, shearFlexibility: NaN };
  for (let e = 0; e < sections.length; e++) {
    const section = sections[e]!;
    const length = model.nodes[e + 1]!.x - model.nodes[e]!.x;
    if (length !== previous.length || section.EI !== previous.EI || section.shearFlexibility !== previous.shearFlexibility) {
      const shearStiffness = section.shearFlexibility > 0 ? 1 / section.shearFlexibility : undefined;
      k = elementStiffness(shearStiffness === undefined ? { length, EI: section.EI } : { length, EI: section.EI, shearStiffness }).to2DArray();
      previous = { length, EI: section.EI, shearFlexibility: section.shearFlexibility };
    }
    const map = elementDofs(dofs, e);
    for (let a = 0; a < 4; a++) {
      for (let b = 0; b < 4; b++) {
        const v = k[a]![b]!;
        elements[16 * e + 4 * a + b] = v;
        if (b <= a && map[a]! >= 0 && map[b]! >= 0) addToBanded(stiffness, map[a]!, map[b]!, a === b || map[a] !== map[b] ? v : 2 * v);
      }
    }
  }
  model.nodes.forEach((node, i) => {
    if (node.support?.type !== "spring") return;
    if ((node.support.ky ?? 0) > 0) addToBanded(stiffness, dofs.uy[i]!, dofs.uy[i]!, node.support.ky!);
    if ((node.support.kr ?? 0) > 0) addToBanded(stiffness, dofs.rzLeft[i]!, dofs.rzLeft[i]!, node.support.kr!);
  });
  return { stiffness, elements };
}
