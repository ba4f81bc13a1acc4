import { exhaustive, fromZodIssues, invalid, ok, type DesignResult } from "../result.js";
import { sectionShapeSchema, type SectionShape } from "./sectionShape.js";

/**
 * Parses unknown input into a shape and checks that the plates fit together. Errors name the
 * field to fix, e.g. `{ field: "tf", message: "two flanges (2·tf) must be thinner than the depth d" }`.
 */
export function validateSectionShape(input: unknown): DesignResult<SectionShape> {
  const parsed = sectionShapeSchema.safeParse(input);
  if (!parsed.success) return fromZodIssues(parsed.error.issues);
  const shape = parsed.data;
  switch (shape.kind) {
    case "hollow-circle":
      if (2 * shape.t >= shape.d) return invalid("t", "wall thickness t must be less than half the outside diameter d");
      break;
    case "box":
      if (2 * shape.tf >= shape.h) return invalid("tf", "two flanges (2·tf) must be thinner than the depth h");
      if (2 * shape.tw >= shape.b) return invalid("tw", "two webs (2·tw) must be thinner than the width b");
      break;
    case "i-shape":
    case "channel":
      if (2 * shape.tf >= shape.d) return invalid("tf", "two flanges (2·tf) must be thinner than the depth d");
      if (shape.tw > shape.bf) return invalid("tw", "web thickness tw must not exceed the flange width bf");
      break;
    case "tee":
      if (shape.tf >= shape.d) return invalid("tf", "flange thickness tf must be less than the depth d");
      if (shape.tw > shape.bf) return invalid("tw", "stem thickness tw must not exceed the flange width bf");
      break;
    case "custom":
      if (shape.yTop !== undefined && shape.yTop >= shape.depth)
        return invalid("yTop", "centroid from top must lie within the depth");
      if (shape.shearArea !== undefined && shape.shearArea > shape.A)
        return invalid("shearArea", "shear area must not exceed the area A");
      break;
    case "rectangle":
    case "circle":
      break;
    default:
      return exhaustive(shape);
  }
  return ok(shape);
}
