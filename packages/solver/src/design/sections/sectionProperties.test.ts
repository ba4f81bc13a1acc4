import { describe, expect, it } from "vitest";
import { INCH } from "../usUnits.js";
import { cowperShearFactor, sectionProperties, type SectionProperties } from "./sectionProperties.js";

function props(input: unknown): SectionProperties {
  const r = sectionProperties(input);
  if (!r.ok) throw new Error(`${r.error.field}: ${r.error.message}`);
  return r.value;
}

const rel = (actual: number | null, expected: number) => Math.abs((actual ?? Number.NaN) - expected) / Math.abs(expected);

describe("closed forms (any strength-of-materials handbook, e.g. Roark Table A.1)", () => {
  it("solid rectangle: A = bh, I = bh³/12, S = bh²/6, Z = bh²/4, Q = bh²/8, As = 5/6 A", () => {
    const b = 0.2, h = 0.5;
    const p = props({ kind: "rectangle", b, h });
    expect(p.A).toBeCloseTo(b * h, 12);
    expect(rel(p.I, (b * h ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(p.Stop, (b * h ** 2) / 6)).toBeLessThan(1e-12);
    expect(rel(p.Sbot, (b * h ** 2) / 6)).toBeLessThan(1e-12);
    expect(rel(p.Z, (b * h ** 2) / 4)).toBeLessThan(1e-12);
    expect(rel(p.Q, (b * h ** 2) / 8)).toBeLessThan(1e-12);
    expect(p.bNA).toBeCloseTo(b, 12);
    expect(p.yTop).toBeCloseTo(h / 2, 12);
    expect(p.shearFactor).toBeCloseTo(5 / 6, 12);
  });

  it("solid circle: I = πd⁴/64, S = πd³/32, Z = d³/6, Q = d³/12, b = d, As = 6/7 A (Cowper, ν = 0)", () => {
    const d = 0.3;
    const p = props({ kind: "circle", d });
    expect(rel(p.A, (Math.PI * d * d) / 4)).toBeLessThan(1e-12);
    expect(rel(p.I, (Math.PI * d ** 4) / 64)).toBeLessThan(1e-12);
    expect(rel(p.Stop, (Math.PI * d ** 3) / 32)).toBeLessThan(1e-12);
    expect(rel(p.Z, d ** 3 / 6)).toBeLessThan(1e-12);
    expect(rel(p.Q, d ** 3 / 12)).toBeLessThan(1e-12);
    expect(rel(p.bNA, d)).toBeLessThan(1e-12);
    expect(p.shearFactor).toBeCloseTo(6 / 7, 12);
  });

  it("hollow circle: I = π(D⁴ − Di⁴)/64, Z = (D³ − Di³)/6, Q = (D³ − Di³)/12, b = D − Di, As = A/2", () => {
    const D = 0.2, t = 0.01, Di = D - 2 * t;
    const p = props({ kind: "hollow-circle", d: D, t });
    expect(rel(p.I, (Math.PI * (D ** 4 - Di ** 4)) / 64)).toBeLessThan(1e-12);
    expect(rel(p.Z, (D ** 3 - Di ** 3) / 6)).toBeLessThan(1e-12);
    expect(rel(p.Q, (D ** 3 - Di ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(p.bNA, D - Di)).toBeLessThan(1e-12);
    expect(p.shearFactor).toBe(0.5);
  });

  it("box: I = (bh³ − bi·hi³)/12 and Z = (bh² − bi·hi²)/4 with bi = b − 2tw, hi = h − 2tf", () => {
    const b = 0.2, h = 0.3, tf = 0.01, tw = 0.008, bi = b - 2 * tw, hi = h - 2 * tf;
    const p = props({ kind: "box", b, h, tf, tw });
    expect(rel(p.A, b * h - bi * hi)).toBeLessThan(1e-12);
    expect(rel(p.I, (b * h ** 3 - bi * hi ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(p.Z, (b * h ** 2 - bi * hi ** 2) / 4)).toBeLessThan(1e-12);
    expect(rel(p.bNA, 2 * tw)).toBeLessThan(1e-12);
    expect(rel(p.shearArea, 2 * tw * h)).toBeLessThan(1e-12);
  });

  it.each(["i-shape", "channel"] as const)("%s: I = [bf·d³ − (bf − tw)(d − 2tf)³]/12, Z = bf·tf(d − tf) + tw(d − 2tf)²/4, As = d·tw", (kind) => {
    const d = 0.4, bf = 0.18, tf = 0.014, tw = 0.009, hw = d - 2 * tf;
    const p = props({ kind, d, bf, tf, tw });
    expect(rel(p.I, (bf * d ** 3 - (bf - tw) * hw ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(p.Z, bf * tf * (d - tf) + (tw * hw ** 2) / 4)).toBeLessThan(1e-12);
    expect(rel(p.Q, bf * tf * (d - tf) / 2 + (tw * hw ** 2) / 8)).toBeLessThan(1e-12);
    expect(p.Stop).toBeCloseTo(p.Sbot, 12);
    expect(rel(p.shearArea, d * tw)).toBeLessThan(1e-12);
  });
});

describe("tee, unsymmetric about the bending axis (hand calculation)", () => {
  // bf = 100, tf = 20, d = 120, tw = 10 (mm). Flange 2000 mm² at 10 mm, stem 1000 mm² at 70 mm:
  // yc = 90000/3000 = 30 mm; I = 100·20³/12 + 2000·20² + 10·100³/12 + 1000·40² = 3.3e6 mm⁴;
  // PNA where area above = 1500 mm² → 15 mm, inside the flange;
  // Z = 100·15·7.5 + 100·5·2.5 + 1000·(70 − 15) = 67 500 mm³;
  // Q at NA = 2000·(30 − 10) + 10·10·5 = 40 500 mm³, width there = tw = 10 mm.
  const mm = 1e-3;
  const shape = { kind: "tee", d: 120 * mm, bf: 100 * mm, tf: 20 * mm, tw: 10 * mm };

  it("matches the hand calculation with the flange on top", () => {
    const p = props(shape);
    expect(rel(p.A, 3000 * mm ** 2)).toBeLessThan(1e-12);
    expect(rel(p.yTop, 30 * mm)).toBeLessThan(1e-12);
    expect(rel(p.I, 3.3e6 * mm ** 4)).toBeLessThan(1e-12);
    expect(rel(p.Stop, 110_000 * mm ** 3)).toBeLessThan(1e-12);
    expect(rel(p.Sbot, (3.3e6 / 90) * mm ** 3)).toBeLessThan(1e-12);
    expect(rel(p.yPlastic, 15 * mm)).toBeLessThan(1e-12);
    expect(rel(p.Z, 67_500 * mm ** 3)).toBeLessThan(1e-12);
    expect(rel(p.Q, 40_500 * mm ** 3)).toBeLessThan(1e-12);
    expect(rel(p.bNA, 10 * mm)).toBeLessThan(1e-12);
  });

  it("inverting the tee swaps Stop and Sbot and keeps I and Z", () => {
    const up = props(shape);
    const down = props({ ...shape, orientation: "flange-bottom" });
    expect(rel(down.I, up.I)).toBeLessThan(1e-12);
    expect(rel(down.Z, up.Z ?? 0)).toBeLessThan(1e-12);
    expect(rel(down.Stop, up.Sbot)).toBeLessThan(1e-12);
    expect(rel(down.yTop, 90 * mm)).toBeLessThan(1e-12);
  });
});

describe("rolled W-shapes against AISC Steel Construction Manual, 16th ed., Table 1-1 (values from memory)", () => {
  // Plates only: the k-region root fillets are ignored, so A, I, S and Z come out low by up to ~4 %.
  const w = (d: number, bf: number, tw: number, tf: number) =>
    props({ kind: "i-shape", d: d * INCH, bf: bf * INCH, tw: tw * INCH, tf: tf * INCH });

  it.each([
    // name, d, bf, tw, tf, A in², Ix in⁴, Sx in³, Zx in³
    ["W14x22", 13.7, 5.0, 0.23, 0.335, 6.49, 199, 29.0, 33.2],
    ["W18x50", 18.0, 7.5, 0.355, 0.57, 14.7, 800, 88.9, 101],
  ] as const)("%s: A, Ix, Sx, Zx within 4 % below the tabulated values", (_n, d, bf, tw, tf, A, Ix, Sx, Zx) => {
    const p = w(d, bf, tw, tf);
    for (const [computed, table] of [
      [p.A / INCH ** 2, A],
      [p.I / INCH ** 4, Ix],
      [p.Stop / INCH ** 3, Sx],
      [p.Z! / INCH ** 3, Zx],
    ] as const) {
      expect(computed).toBeLessThanOrEqual(table * 1.005);
      expect(computed).toBeGreaterThan(table * 0.96);
    }
  });
});

describe("the recalled W-shape table values agree with closed forms from their own dimensions", () => {
  // Table 1-1 values as above (from memory), with k_des (from memory): W14x22 0.735 in, W18x50 0.972 in.
  // Plates: A = 2·bf·tf + (d − 2tf)·tw, Ix = bf·d³/12 − (bf − tw)(d − 2tf)³/12 (closed form, fillets
  // ignored). The four web-to-flange fillets of radius r = k_des − tf add (1 − π/4)·r² each to A, at
  // d/2 − tf − 0.2234r from the axis (a spandrel's centroid lies (10 − 3π)r/(12 − 3π) from its straight
  // edges, closed form; the fillet's own I is neglected), which closes the gap.
  it.each([
    // name, d, bf, tw, tf, k_des, A in², Ix in⁴, Sx in³
    ["W14x22", 13.7, 5.0, 0.23, 0.335, 0.735, 6.49, 199, 29.0],
    ["W18x50", 18.0, 7.5, 0.355, 0.57, 0.972, 14.7, 800, 88.9],
  ] as const)("%s: plates plus fillets give the tabulated A and Ix within 1 %, and Sx = Ix/(d/2)", (_n, d, bf, tw, tf, kdes, A, Ix, Sx) => {
    const r = kdes - tf;
    const fillets = 4 * (1 - Math.PI / 4) * r * r;
    const arm = d / 2 - tf - 0.2234 * r;
    const plateA = 2 * bf * tf + (d - 2 * tf) * tw;
    const plateIx = (bf * d ** 3) / 12 - ((bf - tw) * (d - 2 * tf) ** 3) / 12;
    // the engine's plate values are these closed forms
    const p = props({ kind: "i-shape", d: d * INCH, bf: bf * INCH, tw: tw * INCH, tf: tf * INCH });
    expect(rel(p.A / INCH ** 2, plateA)).toBeLessThan(1e-12);
    expect(rel(p.I / INCH ** 4, plateIx)).toBeLessThan(1e-12);
    expect(rel(plateA + fillets, A)).toBeLessThan(0.01);
    expect(rel(plateIx + fillets * arm * arm, Ix)).toBeLessThan(0.01);
    // the recalled Sx and Ix agree with each other to the table's rounding
    expect(rel(Ix / (d / 2), Sx)).toBeLessThan(0.005);
  });
});

describe("custom sections", () => {
  it("derive Stop and Sbot from the typed centroid and leave unknowns null", () => {
    const p = props({ kind: "custom", A: 0.01, I: 2e-4, depth: 0.5, yTop: 0.2 });
    expect(p.Stop).toBeCloseTo(2e-4 / 0.2, 15);
    expect(p.Sbot).toBeCloseTo(2e-4 / 0.3, 15);
    expect(p.Z).toBeNull();
    expect(p.shearArea).toBeNull();
  });

  it("default the centroid to mid-depth", () => {
    expect(props({ kind: "custom", A: 0.01, I: 2e-4, depth: 0.5 }).yTop).toBe(0.25);
  });
});

describe("validation returns errors naming the field", () => {
  it.each([
    [{ kind: "rectangle", b: 0.2, h: -1 }, "h"],
    [{ kind: "rectangle", b: "wide", h: 1 }, "b"],
    [{ kind: "hollow-circle", d: 0.1, t: 0.06 }, "t"],
    [{ kind: "i-shape", d: 0.2, bf: 0.1, tf: 0.1, tw: 0.01 }, "tf"],
    [{ kind: "i-shape", d: 0.2, bf: 0.1, tf: 0.01, tw: 0.2 }, "tw"],
    [{ kind: "box", b: 0.1, h: 0.2, tf: 0.01, tw: 0.05 }, "tw"],
    [{ kind: "custom", A: 0.01, I: 1e-4, depth: 0.3, yTop: 0.4 }, "yTop"],
    [{ kind: "triangle", b: 1 }, "kind"],
  ])("%j → field %s", (input, field) => {
    const r = sectionProperties(input);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe("invalid-input");
      expect(r.error.field).toBe(field);
    }
  });
});

describe("Cowper (1966) shear coefficients", () => {
  it("reduce to 5/6 and 6/7 at ν = 0 and give 0.850 and 0.886 at ν = 0.3", () => {
    expect(cowperShearFactor("rectangle", 0)).toBeCloseTo(5 / 6, 12);
    expect(cowperShearFactor("circle", 0)).toBeCloseTo(6 / 7, 12);
    expect(cowperShearFactor("rectangle", 0.3)).toBeCloseTo(0.850, 3);
    expect(cowperShearFactor("circle", 0.3)).toBeCloseTo(0.886, 3);
  });
});
