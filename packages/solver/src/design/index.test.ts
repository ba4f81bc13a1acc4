import { describe, expect, it } from "vitest";
import * as design from "./index.js";

describe("@spanwright/solver/design public surface", () => {
  it("lists the code editions the checks cite", () => {
    expect(design.CODE_EDITIONS.map((e) => e.id)).toEqual(["ASCE/SEI 7-22", "AISC 360-22", "EN 1990:2002+A1", "IBC 2021", "ACI 318-19"]);
  });

  it("carries the caution that checks support, and do not replace, a licensed engineer and the local code", () => {
    expect(design.DESIGN_CAUTION).toMatch(/do not replace/);
    expect(design.DESIGN_CAUTION).toMatch(/licensed engineer/);
    expect(design.DESIGN_CAUTION).toMatch(/building code/);
  });

  it("exports the main entry points", () => {
    for (const name of [
      "sectionProperties", "sectionShapeSchema", "iShapeLtbProperties", "MATERIAL_PRESETS", "createCustomMaterial",
      "concreteModulusNormalWeight", "generateCombinations", "checkDeflection", "checkBendingStress", "checkShearStress",
      "checkAiscF2Flexure", "checkAiscG2Shear", "cbFromFunction", "cbFromSamples", "sectionProfile", "shearShare",
    ]) {
      expect(typeof (design as Record<string, unknown>)[name], name).not.toBe("undefined");
    }
  });
});
