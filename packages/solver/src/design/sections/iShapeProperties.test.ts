import { describe, expect, it } from "vitest";
import { INCH } from "../usUnits.js";
import { iShapeLtbProperties } from "./iShapeProperties.js";

describe("I-shape torsion and lateral-torsional buckling properties", () => {
  // AISC Steel Construction Manual, 16th ed., Table 1-1, W18x50 (from memory):
  // Iy = 40.1 in⁴, ry = 1.65 in, ho = 17.4 in, J = 1.24 in⁴, Cw = 3040 in⁶, rts = 1.98 in.
  const p = iShapeLtbProperties({ kind: "i-shape", d: 18.0 * INCH, bf: 7.5 * INCH, tw: 0.355 * INCH, tf: 0.57 * INCH });

  it.each([
    ["Iy", p.Iy / INCH ** 4, 40.1, 0.01],
    ["ry", p.ry / INCH, 1.65, 0.02],
    ["ho", p.ho / INCH, 17.4, 0.01],
    ["Cw", p.Cw / INCH ** 6, 3040, 0.01],
    ["rts", p.rts / INCH, 1.98, 0.015],
  ])("W18x50 %s from plates is within tolerance of the table", (_name, computed, table, tol) => {
    expect(Math.abs(computed - table) / table).toBeLessThan(tol);
  });

  it("W18x50 J from plates is low by the fillet contribution (under 6 %)", () => {
    const j = p.J / INCH ** 4;
    expect(j).toBeLessThan(1.24);
    expect(j).toBeGreaterThan(1.24 * 0.94);
  });

  it("Cw = Iy·ho²/4 and rts² = √(Iy·Cw)/Sx hold exactly", () => {
    expect(p.Cw).toBeCloseTo((p.Iy * p.ho ** 2) / 4, 20);
    expect(p.rts ** 2).toBeCloseTo(Math.sqrt(p.Iy * p.Cw) / p.Sx, 12);
  });

  it("the recalled W18x50 values agree among themselves: ry = √(Iy/A), ho = d − tf, Cw = Iy·ho²/4, rts² = √(Iy·Cw)/Sx", () => {
    // Table 1-1 values (from memory): A = 14.7 in², Iy = 40.1 in⁴, Sx = 88.9 in³, d = 18.0 in, tf = 0.570 in,
    // ry = 1.65 in, ho = 17.4 in, Cw = 3040 in⁶, rts = 1.98 in. The identities hold for doubly symmetric
    // I-shapes (AISC 360-22 §F2, user note to eq. F2-7); agreement to the tables' three figures is what
    // a correct recollection must show.
    const [A, Iy, Sx, d, tf, ry, ho, Cw, rts] = [14.7, 40.1, 88.9, 18.0, 0.57, 1.65, 17.4, 3040, 1.98];
    const close = (a: number, b: number, tol: number) => expect(Math.abs(a - b) / b).toBeLessThan(tol);
    close(Math.sqrt(Iy / A), ry, 0.005);
    close(d - tf, ho, 0.005);
    close((Iy * ho ** 2) / 4, Cw, 0.005);
    close(Math.sqrt(Math.sqrt(Iy * Cw) / Sx), rts, 0.005);
  });
});
