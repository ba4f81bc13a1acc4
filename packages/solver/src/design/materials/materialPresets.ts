import { concreteModulusNormalWeight } from "./concreteModulus.js";
import { TYPICAL_NOTE, type Material } from "./material.js";

const MPA = 1e6;
const GPA = 1e9;
const PSI = 6894.757293168361; // Pa

const steelUs = "AISC 360-22 Symbols: E = 29 000 ksi (200 000 MPa), G = 11 200 ksi (77 200 MPa)";

function steel(id: string, name: string, Fy: number, Fu: number, grade: string): Material {
  return {
    id, name, kind: "steel", E: 200 * GPA, G: 77 * GPA, nu: 0.3, Fy: Fy * MPA, Fu: Fu * MPA, density: 7850,
    typical: true, note: TYPICAL_NOTE, source: `${steelUs}; ${grade}`,
  };
}

function concrete(fcMpa: number): Material {
  const E = concreteModulusNormalWeight(fcMpa * MPA);
  return {
    id: `concrete-${fcMpa}`, name: `Normal-weight concrete f'c = ${fcMpa} MPa`, kind: "concrete",
    E, nu: 0.2, G: E / (2 * 1.2), fc: fcMpa * MPA, density: 2400, typical: true, note: TYPICAL_NOTE,
    source: "ACI 318-19 §19.2.2.1(b) Ec = 4700√f'c (MPa); ν = 0.2 (§19.2.3 permits 0.2) and G = E/(2(1+ν))",
  };
}

function timber(id: string, name: string, E: number, G: number, density: number, source: string): Material {
  return { id, name, kind: "timber", E, G, density, typical: true, note: `${TYPICAL_NOTE}; timber E depends on grade, species, moisture and load duration`, source };
}

/**
 * Editable templates. Values recalled from the cited documents ("from memory" where noted in
 * `source`); every preset carries `typical: true` and the note "typical values, confirm for your project".
 */
export const MATERIAL_PRESETS: readonly Material[] = [
  steel("steel-a992", "Structural steel ASTM A992", 345, 450, "ASTM A992: Fy = 345 MPa (50 ksi), Fu = 450 MPa (65 ksi)"),
  steel("steel-a36", "Structural steel ASTM A36", 250, 400, "ASTM A36: Fy = 250 MPa (36 ksi), Fu = 400 MPa (58 ksi)"),
  {
    ...steel("steel-s355", "Structural steel S355", 355, 510, "EN 1993-1-1 Table 3.1, t ≤ 40 mm: fy = 355 MPa, fu = 510 MPa"),
    E: 210 * GPA, G: 81 * GPA,
    source: "EN 1993-1-1 §3.2.6: E = 210 GPa, G ≈ 81 GPa; Table 3.1, t ≤ 40 mm: fy = 355 MPa, fu = 510 MPa (from memory)",
  },
  concrete(25),
  concrete(30),
  concrete(35),
  concrete(40),
  timber("glulam-gl24h", "Glulam GL24h", 11_500 * MPA, 650 * MPA, 420,
    "EN 14080:2013 Table 5, GL24h: E0,mean = 11 500 MPa, Gmean = 650 MPa (from memory)"),
  timber("glulam-24f-1.8e", "Glulam 24F-1.8E", 1.8e6 * PSI, (1.8e6 / 16) * PSI, 500,
    "NDS 2018 Supplement Table 5A, 24F-1.8E: E = 1.8×10⁶ psi (from memory); G ≈ E/16 (NDS commentary rule of thumb)"),
  timber("sawn-c24", "Sawn softwood C24", 11_000 * MPA, 690 * MPA, 420,
    "EN 338:2016 Table 1, C24: E0,mean = 11 000 MPa, Gmean = 690 MPa (from memory)"),
  timber("sawn-df-l-no2", "Sawn Douglas Fir-Larch No. 2", 1.6e6 * PSI, (1.6e6 / 16) * PSI, 530,
    "NDS 2018 Supplement Table 4A, Douglas Fir-Larch No. 2: E = 1.6×10⁶ psi (from memory); G ≈ E/16"),
];

export function findMaterialPreset(id: string): Material | undefined {
  return MATERIAL_PRESETS.find((m) => m.id === id);
}
