/**
 * Continuous beams, settlements, springs, hinges and Timoshenko beams checked through the public
 * exchange format. Sources beside each check: AWC "Beam Design Formulas with Shear and Moment
 * Diagrams" (Design Aid 6, 2005 ed.; figure numbers from its list of figures, formulas from
 * memory), AISC Steel Construction Manual (from memory), the three-moment equation (Clapeyron) and
 * closed forms derived in the comments.
 */
import { describe, expect, it } from "vitest";
import { solve } from "./index";
import { beam, caseResult, expectClose, nodeAt, reactionAt, stationAt, type CaseResult, type SolveOutput } from "./testing/exchange";

const E = 2.0e11;
const I = 1.0e-4;
const EI = E * I; // N·m²
const L = 6; // m
const w = 10_000; // N/m
const P = 20_000; // N

function run(model: unknown): CaseResult {
  return caseResult(solve(model) as SolveOutput, "A");
}

const pin = { type: "pinned" } as const;
const fix = { type: "fixed" } as const;
const udl = (x1: number, x2: number) => ({ type: "distributed" as const, x1, x2, qy1: -w, qy2: -w });

/** Asserts an extreme sits at one of several equally valid places (symmetric beams). */
function expectAtOneOf(x: number, candidates: number[]): void {
  const hit = candidates.some((c) => Math.abs(x - c) <= 1e-9 * L);
  expect(hit, `x = ${x} not in ${candidates.join(", ")}`).toBe(true);
}

describe("equal-span continuous beams under uniform load", () => {
  it("two spans match AWC Fig. 29 (0.375 / 1.25 / 0.375 wL, −0.125 wL², 0.0703 wL²)", () => {
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }, { x: 2 * L, support: pin }], [udl(0, 2 * L)], { stations: [L] }));
    expectClose(reactionAt(r, 0).fy, 0.375 * w * L);
    expectClose(reactionAt(r, 1).fy, 1.25 * w * L);
    expectClose(reactionAt(r, 2).fy, 0.375 * w * L);
    expectClose(r.extremes.Mmin.value, -0.125 * w * L * L);
    expectClose(r.extremes.Mmin.x, L, L);
    expectClose(stationAt(r, L).M, -0.125 * w * L * L);
    expectClose(r.extremes.Mmax.value, (9 / 128) * w * L * L); // 0.0703 wL² at 3L/8 from an end
    expectAtOneOf(r.extremes.Mmax.x, [(3 * L) / 8, 2 * L - (3 * L) / 8]);
    // Each span acts as a propped cantilever: Δmax = wL⁴/185EI at 0.4215L (exact root (1 + √33)/16).
    const xp = (L * (1 + Math.sqrt(33))) / 16;
    expectClose(r.extremes.uyMin.value, (-w * xp * (L ** 3 - 3 * L * xp * xp + 2 * xp ** 3)) / (48 * EI));
    expectAtOneOf(r.extremes.uyMin.x, [xp, 2 * L - xp]);
    expectClose(r.extremes.Vmax.value, 0.625 * w * L); // just right of the middle support
    expectClose(r.extremes.Vmin.value, -0.625 * w * L);
  });

  it("three spans match AISC continuous-beam coefficients (0.4 / 1.1 / 1.1 / 0.4 wL, −0.1 wL², 0.08 and 0.025 wL²; from memory)", () => {
    const nodes = [0, 1, 2, 3].map((i) => ({ x: i * L, support: pin }));
    const r = run(beam(nodes, [udl(0, 3 * L)], { stations: [L, 1.5 * L, 2 * L, 0.4 * L] }));
    expectClose(reactionAt(r, 0).fy, 0.4 * w * L);
    expectClose(reactionAt(r, 1).fy, 1.1 * w * L);
    expectClose(reactionAt(r, 2).fy, 1.1 * w * L);
    expectClose(reactionAt(r, 3).fy, 0.4 * w * L);
    expectClose(stationAt(r, L).M, -0.1 * w * L * L);
    expectClose(stationAt(r, 2 * L).M, -0.1 * w * L * L);
    expectClose(r.extremes.Mmin.value, -0.1 * w * L * L);
    expectClose(stationAt(r, 1.5 * L).M, 0.025 * w * L * L); // centre of the middle span
    expectClose(stationAt(r, 0.4 * L).M, 0.08 * w * L * L); // end span, M = 0.4wLx − wx²/2 at 0.4L
    expectClose(r.extremes.Mmax.value, 0.08 * w * L * L);
    expectAtOneOf(r.extremes.Mmax.x, [0.4 * L, 3 * L - 0.4 * L]);
  });
});

it("an unequal two-span beam under uniform load obeys the three-moment equation (AWC Fig. 31)", () => {
  // Clapeyron with MA = MC = 0: 2MB(L1 + L2) = −w(L1³ + L2³)/4 ⇒ MB = −w(L1³ + L2³)/(8(L1 + L2)).
  // Reactions by statics per span: RA = wL1/2 + MB/L1, RC = wL2/2 + MB/L2, RB = w(L1 + L2) − RA − RC.
  const L1 = 4;
  const L2 = 6;
  const MB = (-w * (L1 ** 3 + L2 ** 3)) / (8 * (L1 + L2));
  const RA = (w * L1) / 2 + MB / L1;
  const RC = (w * L2) / 2 + MB / L2;
  const r = run(beam([{ x: 0, support: pin }, { x: L1, support: pin }, { x: L1 + L2, support: pin }], [udl(0, L1 + L2)], { stations: [L1] }));
  expectClose(stationAt(r, L1).M, MB);
  expectClose(r.extremes.Mmin.value, MB);
  expectClose(r.extremes.Mmin.x, L1, L);
  expectClose(reactionAt(r, 0).fy, RA);
  expectClose(reactionAt(r, 2).fy, RC);
  expectClose(reactionAt(r, 1).fy, w * (L1 + L2) - RA - RC);
  // Largest sagging moment is in the long span where V = 0: x = L2 − RC/w from B, M = RC²/2w.
  expectClose(r.extremes.Mmax.value, (RC * RC) / (2 * w));
  expectClose(r.extremes.Mmax.x, L1 + L2 - RC / w, L);
});

describe("imposed settlement", () => {
  const delta = 0.01; // m, downward

  it("of the prop of a propped cantilever gives R = 3EIδ/L³ (common practice)", () => {
    const model = beam([{ x: 0, support: fix }, { x: L, support: pin }], [{ type: "settlement", node: 1, uy: -delta }]);
    const r = run(model);
    const R = (3 * EI * delta) / L ** 3;
    expectClose(reactionAt(r, 1).fy, -R); // the support pulls the beam down
    expectClose(reactionAt(r, 0).fy, R);
    expectClose(reactionAt(r, 0).mz, R * L);
    expectClose(nodeAt(r, 1).uy, -delta);
    expectClose(nodeAt(r, 1).rz, (-3 * delta) / (2 * L)); // cantilever tip slope RL²/2EI
    expectClose(r.extremes.Mmin.value, -R * L);
  });

  it("of one end of a fixed-fixed beam gives R = 12EIδ/L³ and M = 6EIδ/L² (common practice)", () => {
    const r = run(beam([{ x: 0, support: fix }, { x: L, support: fix }], [{ type: "settlement", node: 1, uy: -delta }], { stations: [L / 2] }));
    const R = (12 * EI * delta) / L ** 3;
    const M = (6 * EI * delta) / (L * L);
    expectClose(reactionAt(r, 0).fy, R);
    expectClose(reactionAt(r, 1).fy, -R);
    expectClose(reactionAt(r, 0).mz, M);
    expectClose(reactionAt(r, 1).mz, M);
    expectClose(stationAt(r, L / 2).M, 0, M);
    expectClose(stationAt(r, L / 2).uy, -delta / 2);
  });
});

describe("spring supports", () => {
  it("a cantilever propped by a vertical spring shares the tip load by stiffness (derived)", () => {
    // Tip deflection δ = P/(k + 3EI/L³): the spring and the cantilever act in parallel.
    const k = 1.5e5; // N/m
    const r = run(beam([{ x: 0, support: fix }, { x: L, support: { type: "spring", ky: k } }], [{ type: "point", x: L, fy: -P }]));
    const d = P / (k + (3 * EI) / L ** 3);
    expectClose(nodeAt(r, 1).uy, -d);
    expectClose(reactionAt(r, 1).fy, k * d);
    expectClose(reactionAt(r, 0).fy, P - k * d);
    expectClose(reactionAt(r, 0).mz, (P - k * d) * L);
  });

  it("a simply supported beam on a mid-span spring under uniform load (derived)", () => {
    // Compatibility at mid-span: 5wL⁴/384EI − R·L³/48EI = R/k ⇒ R = (5wL⁴/384EI)/(1/k + L³/48EI).
    const k = 5.0e5;
    const r = run(beam([{ x: 0, support: pin }, { x: L / 2, support: { type: "spring", ky: k } }, { x: L, support: pin }], [udl(0, L)]));
    const R = ((5 * w * L ** 4) / (384 * EI)) / (1 / k + L ** 3 / (48 * EI));
    expectClose(reactionAt(r, 1).fy, R);
    expectClose(nodeAt(r, 1).uy, -R / k);
    expectClose(reactionAt(r, 0).fy, (w * L - R) / 2);
    expectClose(reactionAt(r, 2).fy, (w * L - R) / 2);
  });

  it("a cantilever on a vertical and rotational spring adds rigid-body tip movement (derived)", () => {
    // Root: uy = −P/ky, rz = −PL/kr; tip: uy = −P/ky − PL²/kr − PL³/3EI.
    const ky = 2.0e6;
    const kr = 4.0e6;
    const r = run(beam([{ x: 0, support: { type: "spring", ky, kr } }, { x: L }], [{ type: "point", x: L, fy: -P }]));
    expectClose(reactionAt(r, 0).fy, P);
    expectClose(reactionAt(r, 0).mz, P * L);
    expectClose(nodeAt(r, 0).uy, -P / ky);
    expectClose(nodeAt(r, 0).rz, (-P * L) / kr);
    expectClose(nodeAt(r, 1).uy, -P / ky - (P * L * L) / kr - (P * L ** 3) / (3 * EI));
  });
});

it("a Gerber beam (fixed end, internal hinge, far pin) gives reactions by statics", () => {
  // Suspended part a..a+b rests on the hinge and the pin: each carries wb/2. The cantilever 0..a
  // carries its own wa plus the hinge force wb/2.
  const a = 4;
  const b = 6;
  const r = run(beam([{ x: 0, support: fix }, { x: a, hinge: true }, { x: a + b, support: pin }], [udl(0, a + b)], { stations: [a, a + b / 2] }));
  const Vh = (w * b) / 2;
  expectClose(reactionAt(r, 2).fy, Vh);
  expectClose(reactionAt(r, 0).fy, w * a + Vh);
  expectClose(reactionAt(r, 0).mz, (w * a * a) / 2 + Vh * a);
  expectClose(stationAt(r, a).M, 0, w * a * a);
  expectClose(stationAt(r, a + b / 2).M, (w * b * b) / 8);
  expectClose(r.extremes.Mmin.value, -((w * a * a) / 2 + Vh * a));
  expectClose(r.extremes.Mmax.value, (w * b * b) / 8);
  // Hinge drop = cantilever under UDL plus tip load; the suspended part rotates rigidly by δh/b.
  const dh = (w * a ** 4) / (8 * EI) + (Vh * a ** 3) / (3 * EI);
  const hinge = nodeAt(r, 1);
  expectClose(hinge.uy, -dh);
  expectClose(hinge.rzLeft, -((w * a ** 3) / (6 * EI) + (Vh * a * a) / (2 * EI)));
  expectClose(hinge.rzRight, dh / b - (w * b ** 3) / (24 * EI));
  // A station at the hinge reports the value just right of it (exchange format).
  expectClose(stationAt(r, a).rz, dh / b - (w * b ** 3) / (24 * EI));
  expectClose(stationAt(r, a).uy, -dh);
});

it("a hinge over the middle support turns two spans into two simple beams (AWC Fig. 1 twice)", () => {
  const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin, hinge: true }, { x: 2 * L, support: pin }], [udl(0, 2 * L)]));
  expectClose(reactionAt(r, 0).fy, (w * L) / 2);
  expectClose(reactionAt(r, 1).fy, w * L);
  expectClose(reactionAt(r, 2).fy, (w * L) / 2);
  const mid = nodeAt(r, 1);
  expectClose(mid.uy, 0, (w * L ** 4) / EI);
  expectClose(mid.rzLeft, (w * L ** 3) / (24 * EI)); // right end of the left simple span
  expectClose(mid.rzRight, (-w * L ** 3) / (24 * EI));
  expectClose(r.extremes.Mmax.value, (w * L * L) / 8);
  expectClose(r.extremes.Mmin.value, 0, w * L * L);
  expectClose(r.extremes.uyMin.value, (-5 * w * L ** 4) / (384 * EI));
});

describe("Timoshenko beams (shear deflection, common practice)", () => {
  const section = { A: 0.01, G: 8.0e10, shearFactor: 5 / 6 };
  const kGA = section.shearFactor * section.G * section.A;

  it("cantilever tip deflection is PL³/3EI + PL/κGA; section rotation stays PL²/2EI", () => {
    const Lc = 2;
    const r = run(beam([{ x: 0, support: fix }, { x: Lc }], [{ type: "point", x: Lc, fy: -P }], { theory: "timoshenko", segment: section }));
    expectClose(nodeAt(r, 1).uy, -((P * Lc ** 3) / (3 * EI) + (P * Lc) / kGA));
    expectClose(nodeAt(r, 1).rz, (-P * Lc * Lc) / (2 * EI));
    expectClose(reactionAt(r, 0).mz, P * Lc);
  });

  it("simply supported beam under uniform load deflects 5wL⁴/384EI + wL²/8κGA at mid-span", () => {
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }], [udl(0, L)], { theory: "timoshenko", segment: section, stations: [L / 2] }));
    const mid = (5 * w * L ** 4) / (384 * EI) + (w * L * L) / (8 * kGA);
    expectClose(stationAt(r, L / 2).uy, -mid);
    expectClose(r.extremes.uyMin.value, -mid);
    expectClose(r.extremes.uyMin.x, L / 2, L);
    expectClose(nodeAt(r, 0).rz, (-w * L ** 3) / (24 * EI));
    expectClose(r.extremes.Mmax.value, (w * L * L) / 8);
  });

  it("cantilever under uniform load deflects wL⁴/8EI + wL²/2κGA at the tip (shear part = ∫V/κGA dx)", () => {
    const r = run(beam([{ x: 0, support: fix }, { x: L }], [udl(0, L)], { theory: "timoshenko", segment: section }));
    expectClose(nodeAt(r, 1).uy, -((w * L ** 4) / (8 * EI) + (w * L * L) / (2 * kGA)));
    expectClose(nodeAt(r, 1).rz, (-w * L ** 3) / (6 * EI));
  });

  it("fixed-fixed beam under uniform load keeps end moments wL²/12 and deflects wL⁴/384EI + wL²/8κGA", () => {
    // By symmetry the section rotation is zero at mid-span as well as at the ends, so the moment
    // distribution is the Euler-Bernoulli one; shear adds ∫V/κGA from an end to mid-span.
    const r = run(beam([{ x: 0, support: fix }, { x: L, support: fix }], [udl(0, L)], { theory: "timoshenko", segment: section, stations: [L / 2] }));
    expectClose(reactionAt(r, 0).mz, (w * L * L) / 12);
    expectClose(stationAt(r, L / 2).M, (w * L * L) / 24);
    expectClose(stationAt(r, L / 2).uy, -((w * L ** 4) / (384 * EI) + (w * L * L) / (8 * kGA)));
  });
});
