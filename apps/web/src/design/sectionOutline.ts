import { exhaustive, shapeDepth, type SectionShape } from "@spanwright/solver/design";

/**
 * SVG paths (fill-rule evenodd) of a cross-section drawn to scale: `scale` px per metre, the top
 * fibre at y = 0 and the vertical axis of symmetry at x = 0 (a channel's web sits left of it).
 */
export function sectionOutlinePath(shape: SectionShape, scale: number): string {
  const rect = (x: number, y: number, w: number, h: number) =>
    `M${x * scale},${y * scale}h${w * scale}v${h * scale}h${-w * scale}Z`;
  // A circle of radius r centred at depth cy, as two half arcs.
  const circle = (r: number, cy: number) => {
    const R = r * scale;
    const C = cy * scale;
    return `M${-R},${C}a${R},${R} 0 1,0 ${2 * R},0a${R},${R} 0 1,0 ${-2 * R},0Z`;
  };
  switch (shape.kind) {
    case "rectangle":
      return rect(-shape.b / 2, 0, shape.b, shape.h);
    case "box":
      return rect(-shape.b / 2, 0, shape.b, shape.h) + rect(-shape.b / 2 + shape.tw, shape.tf, shape.b - 2 * shape.tw, shape.h - 2 * shape.tf);
    case "circle":
      return circle(shape.d / 2, shape.d / 2);
    case "hollow-circle":
      return circle(shape.d / 2, shape.d / 2) + circle(shape.d / 2 - shape.t, shape.d / 2);
    case "i-shape":
      return (
        rect(-shape.bf / 2, 0, shape.bf, shape.tf) +
        rect(-shape.tw / 2, shape.tf, shape.tw, shape.d - 2 * shape.tf) +
        rect(-shape.bf / 2, shape.d - shape.tf, shape.bf, shape.tf)
      );
    case "channel":
      return (
        rect(-shape.bf / 2, 0, shape.bf, shape.tf) +
        rect(-shape.bf / 2, shape.tf, shape.tw, shape.d - 2 * shape.tf) +
        rect(-shape.bf / 2, shape.d - shape.tf, shape.bf, shape.tf)
      );
    case "tee":
      return shape.orientation === "flange-top"
        ? rect(-shape.bf / 2, 0, shape.bf, shape.tf) + rect(-shape.tw / 2, shape.tf, shape.tw, shape.d - shape.tf)
        : rect(-shape.tw / 2, 0, shape.tw, shape.d - shape.tf) + rect(-shape.bf / 2, shape.d - shape.tf, shape.bf, shape.tf);
    case "custom":
      return "";
    default:
      return exhaustive(shape);
  }
}

/** Overall width of the drawn shape, m; a custom section is drawn as a box of depth/2 width. */
export function shapeWidth(shape: SectionShape): number {
  switch (shape.kind) {
    case "rectangle":
    case "box":
      return shape.b;
    case "circle":
    case "hollow-circle":
      return shape.d;
    case "i-shape":
    case "channel":
    case "tee":
      return shape.bf;
    case "custom":
      return shapeDepth(shape) / 2;
    default:
      return exhaustive(shape);
  }
}
