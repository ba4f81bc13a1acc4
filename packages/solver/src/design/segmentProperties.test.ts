import { describe, expect, it } from "vitest";
import { findMaterialPreset } from "./materials/materialPresets.js";
import { segmentStiffness } from "./segmentProperties.js";
import { propertiesOfValidShape } from "./sections/sectionProperties.js";

describe("segment stiffness for the engine", () => {
  const steel = findMaterialPreset("steel-a992")!;
  const rect = propertiesOfValidShape({ kind: "rectangle", b: 0.2, h: 0.4 });

  it("Euler-Bernoulli takes E and I only", () => {
    expect(segmentStiffness(rect, steel, "euler-bernoulli")).toEqual({ ok: true, value: { E: 200e9, I: rect.I } });
  });

  it("Timoshenko adds A, G and the shear factor (5/6 for a rectangle)", () => {
    const r = segmentStiffness(rect, steel, "timoshenko");
    expect(r.ok && r.value).toMatchObject({ A: rect.A, G: 77e9, shearFactor: 5 / 6 });
  });

  it("Timoshenko without G or shear area is an error naming the missing field", () => {
    const noG = segmentStiffness(rect, { E: 10e9 }, "timoshenko");
    expect(!noG.ok && noG.error.field).toBe("material.G");
    const custom = propertiesOfValidShape({ kind: "custom", A: 0.01, I: 1e-4, depth: 0.3 });
    const noAs = segmentStiffness(custom, steel, "timoshenko");
    expect(!noAs.ok && noAs.error.field).toBe("section.shearArea");
  });
});
