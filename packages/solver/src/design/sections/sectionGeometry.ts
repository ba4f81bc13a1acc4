import { exhaustive } from "../result.js";
import type { Band } from "./layeredSection.js";
import type { RoundGeometry } from "./roundSections.js";
import type { SectionShape } from "./sectionShape.js";

/** How a validated shape is integrated: as bands of rectangles, as a (hollow) circle, or not at all (custom). */
export type SectionGeometry =
  | { readonly kind: "bands"; readonly bands: readonly Band[] }
  | { readonly kind: "round"; readonly round: RoundGeometry }
  | { readonly kind: "custom" };

function flanged(d: number, bf: number, tf: number, tw: number): Band[] {
  return [
    { top: 0, bottom: tf, width: bf },
    { top: tf, bottom: d - tf, width: tw },
    { top: d - tf, bottom: d, width: bf },
  ];
}

/** Shape must already be validated (see `validateSectionShape`). */
export function sectionGeometry(shape: SectionShape): SectionGeometry {
  switch (shape.kind) {
    case "rectangle":
      return { kind: "bands", bands: [{ top: 0, bottom: shape.h, width: shape.b }] };
    case "box":
      return { kind: "bands", bands: flanged(shape.h, shape.b, shape.tf, 2 * shape.tw) };
    case "i-shape":
    case "channel":
      return { kind: "bands", bands: flanged(shape.d, shape.bf, shape.tf, shape.tw) };
    case "tee": {
      const { d, bf, tf, tw } = shape;
      const bands: Band[] =
        shape.orientation === "flange-top"
          ? [{ top: 0, bottom: tf, width: bf }, { top: tf, bottom: d, width: tw }]
          : [{ top: 0, bottom: d - tf, width: tw }, { top: d - tf, bottom: d, width: bf }];
      return { kind: "bands", bands };
    }
    case "circle":
      return { kind: "round", round: { ro: shape.d / 2, ri: 0 } };
    case "hollow-circle":
      return { kind: "round", round: { ro: shape.d / 2, ri: shape.d / 2 - shape.t } };
    case "custom":
      return { kind: "custom" };
    default:
      return exhaustive(shape);
  }
}

/** Overall depth of the shape, m. */
export function shapeDepth(shape: SectionShape): number {
  switch (shape.kind) {
    case "rectangle":
    case "box":
      return shape.h;
    case "circle":
    case "hollow-circle":
      return shape.d;
    case "i-shape":
    case "channel":
    case "tee":
      return shape.d;
    case "custom":
      return shape.depth;
    default:
      return exhaustive(shape);
  }
}
