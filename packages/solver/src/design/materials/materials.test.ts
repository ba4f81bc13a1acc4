import { describe, expect, it } from "vitest";
import { concreteModulusFromDensity, concreteModulusNormalWeight } from "./concreteModulus.js";
import { createCustomMaterial, materialFromPreset, TYPICAL_NOTE, validateMaterial } from "./material.js";
import { findMaterialPreset, MATERIAL_PRESETS } from "./materialPresets.js";

const MPA = 1e6;

describe("concrete modulus, ACI 318-19 §19.2.2.1", () => {
  it("(b) Ec = 4700√f'c: f'c = 28 MPa gives 24 870 MPa", () => {
    // 4700 × √28 = 4700 × 5.2915 = 24 870 MPa (hand calculation).
    expect(concreteModulusNormalWeight(28 * MPA) / MPA).toBeCloseTo(24_870, 0);
  });

  it("(a) Ec = wc^1.5·0.043·√f'c: wc = 2320 kg/m³, f'c = 28 MPa gives ≈ 25 420 MPa", () => {
    // 2320^1.5 = 111 746; × 0.043 = 4805.1; × √28 = 25 426 MPa (hand calculation).
    expect(concreteModulusFromDensity(28 * MPA, 2320) / MPA).toBeCloseTo(25_426, -1);
  });
});

describe("material presets", () => {
  it("are all flagged typical with the confirm note and a source", () => {
    for (const m of MATERIAL_PRESETS) {
      expect(m.typical).toBe(true);
      expect(m.note).toContain(TYPICAL_NOTE);
      expect(m.source.length).toBeGreaterThan(10);
      expect(validateMaterial(m).ok).toBe(true);
    }
  });

  it("A992 steel: E = 200 GPa, G = 77 GPa, Fy = 345 MPa, Fu = 450 MPa (ASTM A992, 50/65 ksi)", () => {
    const m = findMaterialPreset("steel-a992");
    expect(m).toMatchObject({ E: 200e9, G: 77e9, Fy: 345e6, Fu: 450e6 });
  });

  it("A36 Fy = 250 MPa and S355 fy = 355 MPa", () => {
    expect(findMaterialPreset("steel-a36")?.Fy).toBe(250e6);
    expect(findMaterialPreset("steel-s355")?.Fy).toBe(355e6);
  });

  it("concrete presets take E from f'c by ACI 318-19 eq. (b)", () => {
    const c = findMaterialPreset("concrete-30");
    expect(c?.E).toBeCloseTo(4700 * Math.sqrt(30) * MPA, 0);
  });

  it("copying a preset keeps values and the typical flag but takes the new id", () => {
    const base = findMaterialPreset("glulam-gl24h")!;
    const copy = materialFromPreset(base, "p-1", "Roof glulam");
    expect(copy).toMatchObject({ id: "p-1", name: "Roof glulam", E: base.E, typical: true });
  });
});

describe("custom materials", () => {
  it("derive G from ν when G is not given: G = E/(2(1 + ν))", () => {
    const r = createCustomMaterial({ id: "alu", name: "Aluminium 6061-T6", E: 69e9, nu: 0.33 });
    expect(r.ok && r.value.G).toBeCloseTo(69e9 / 2.66, 0);
    expect(r.ok && r.value.typical).toBe(false);
  });

  it("reject a non-positive E naming the field", () => {
    const r = createCustomMaterial({ id: "x", name: "x", E: 0 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.field).toBe("E");
  });
});
