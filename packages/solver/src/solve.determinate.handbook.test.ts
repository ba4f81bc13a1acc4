/**
 * Statically determinate handbook beams checked through the public exchange format.
 * Sources: AWC "Beam Design Formulas with Shear and Moment Diagrams" (Design Aid 6, 2005 ed.;
 * figure numbers from its list of figures, formulas from memory), AISC Steel Construction Manual
 * Table 3-23 (case numbers and formulas from memory), Roark's Formulas for Stress and Strain
 * Table 8.1 (from memory). Signs are the contract's: y up, gravity negative, M sagging positive,
 * rz counterclockwise positive.
 */
import { describe, it } from "vitest";
import { solve } from "./index";
import { beam, caseResult, expectClose, nodeAt, reactionAt, stationAt, type CaseResult, type SolveOutput } from "./testing/exchange";

const E = 2.0e11; // Pa
const I = 1.0e-4; // m^4
const EI = E * I; // N·m²
const L = 6; // m
const w = 10_000; // N/m, magnitude of the gravity load
const P = 20_000; // N, magnitude of the gravity load

function run(model: unknown): CaseResult {
  return caseResult(solve(model) as SolveOutput, "A");
}

const pin = { type: "pinned" } as const;
const fix = { type: "fixed" } as const;

describe("simply supported beam", () => {
  it("under uniform load matches AWC Fig. 1 / AISC Table 3-23 case 1", () => {
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }], [{ type: "distributed", x1: 0, x2: L, qy1: -w, qy2: -w }], { stations: [0, L / 4, L] }));
    // Contract: at a support the station reports the value just right, at the right end just left.
    expectClose(stationAt(r, 0).V, (w * L) / 2);
    expectClose(stationAt(r, L).V, (-w * L) / 2);
    expectClose(stationAt(r, L).M, 0, w * L * L);
    expectClose(reactionAt(r, 0).fy, (w * L) / 2); // R = wL/2
    expectClose(reactionAt(r, 1).fy, (w * L) / 2);
    expectClose(r.extremes.Mmax.value, (w * L * L) / 8); // Mmax = wL²/8 at centre
    expectClose(r.extremes.Mmax.x, L / 2, L);
    expectClose(r.extremes.uyMin.value, (-5 * w * L ** 4) / (384 * EI)); // Δmax = 5wL⁴/384EI at centre
    expectClose(r.extremes.uyMin.x, L / 2, L);
    expectClose(r.extremes.Vmax.value, (w * L) / 2);
    expectClose(r.extremes.Vmax.x, 0, L);
    expectClose(r.extremes.Vmin.value, (-w * L) / 2);
    expectClose(r.extremes.Vmin.x, L, L);
    // End slopes wL³/24EI (Roark Table 8.1 case 2e, from memory): clockwise at the left end.
    expectClose(nodeAt(r, 0).rz, (-w * L ** 3) / (24 * EI));
    expectClose(nodeAt(r, 1).rz, (w * L ** 3) / (24 * EI));
    // AWC Fig. 1: Vx = w(L/2 − x), Mx = wx(L − x)/2, Δx = wx(L³ − 2Lx² + x³)/24EI.
    const x = L / 4;
    const s = stationAt(r, x);
    expectClose(s.V, w * (L / 2 - x), w * L);
    expectClose(s.M, (w * x * (L - x)) / 2);
    expectClose(s.uy, (-w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / (24 * EI));
  });

  it("under a central point load between nodes matches AWC Fig. 7 / AISC case 7", () => {
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }], [{ type: "point", x: L / 2, fy: -P }], { stations: [L / 2, L / 4] }));
    expectClose(reactionAt(r, 0).fy, P / 2);
    expectClose(reactionAt(r, 1).fy, P / 2);
    expectClose(r.extremes.Mmax.value, (P * L) / 4); // PL/4 at the load
    expectClose(r.extremes.Mmax.x, L / 2, L);
    expectClose(r.extremes.uyMin.value, (-P * L ** 3) / (48 * EI)); // PL³/48EI at the load
    expectClose(r.extremes.uyMin.x, L / 2, L);
    expectClose(r.extremes.Vmax.value, P / 2);
    expectClose(r.extremes.Vmin.value, -P / 2);
    expectClose(nodeAt(r, 0).rz, (-P * L * L) / (16 * EI)); // end slope PL²/16EI (Roark 8.1 case 1e)
    // At the load the station reports the value just right of x: V = −P/2.
    expectClose(stationAt(r, L / 2).V, -P / 2);
    expectClose(stationAt(r, L / 4).M, (P * L) / 8);
  });

  it("under an off-centre point load matches AWC Fig. 8 / AISC case 8 (a > b)", () => {
    const a = 4;
    const b = L - a;
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }], [{ type: "point", x: a, fy: -P }], { stations: [a] }));
    expectClose(reactionAt(r, 0).fy, (P * b) / L); // R1 = Pb/L
    expectClose(reactionAt(r, 1).fy, (P * a) / L); // R2 = Pa/L
    expectClose(r.extremes.Mmax.value, (P * a * b) / L); // Mmax = Pab/L at the load
    expectClose(r.extremes.Mmax.x, a, L);
    // Δmax = Pab(a + 2b)√(3a(a + 2b)) / 27EIL at x = √(a(a + 2b)/3) from the left (AWC Fig. 8).
    expectClose(r.extremes.uyMin.value, (-P * a * b * (a + 2 * b) * Math.sqrt(3 * a * (a + 2 * b))) / (27 * EI * L));
    expectClose(r.extremes.uyMin.x, Math.sqrt((a * (a + 2 * b)) / 3), L);
    expectClose(stationAt(r, a).uy, (-P * a * a * b * b) / (3 * EI * L)); // Δ at load = Pa²b²/3EIL
    // End slopes (Roark 8.1 case 1e, from memory): θA = Pb(L² − b²)/6EIL, θB = Pa(L² − a²)/6EIL.
    expectClose(nodeAt(r, 0).rz, (-P * b * (L * L - b * b)) / (6 * EI * L));
    expectClose(nodeAt(r, 1).rz, (P * a * (L * L - a * a)) / (6 * EI * L));
  });

  it("under load increasing uniformly to one end matches AWC Fig. 5 / AISC case 2", () => {
    const W = (w * L) / 2; // total load
    const xs = [L / 3];
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }], [{ type: "distributed", x1: 0, x2: L, qy1: 0, qy2: -w }], { stations: xs }));
    expectClose(reactionAt(r, 0).fy, W / 3); // R1 = W/3
    expectClose(reactionAt(r, 1).fy, (2 * W) / 3); // R2 = 2W/3
    expectClose(r.extremes.Mmax.value, (2 * W * L) / (9 * Math.sqrt(3))); // 2WL/9√3 at x = L/√3
    expectClose(r.extremes.Mmax.x, L / Math.sqrt(3), L);
    // Δx = Wx(3x⁴ − 10L²x² + 7L⁴)/180EIL²; Δmax at x = L√(1 − √(8/15)).
    const deflection = (x: number) => (W * x * (3 * x ** 4 - 10 * L * L * x * x + 7 * L ** 4)) / (180 * EI * L * L);
    const xMax = L * Math.sqrt(1 - Math.sqrt(8 / 15));
    expectClose(r.extremes.uyMin.value, -deflection(xMax));
    expectClose(r.extremes.uyMin.x, xMax, L);
    expectClose(stationAt(r, L / 3).uy, -deflection(L / 3));
    // Mx = Wx(L² − x²)/3L² (AWC Fig. 5).
    expectClose(stationAt(r, L / 3).M, (W * (L / 3) * (L * L - (L / 3) ** 2)) / (3 * L * L));
    expectClose(r.extremes.Vmax.value, W / 3);
    expectClose(r.extremes.Vmin.value, (-2 * W) / 3);
    // End slopes 7wL³/360EI and 8wL³/360EI (Roark 8.1 case 2e with wa = 0, from memory).
    expectClose(nodeAt(r, 0).rz, (-7 * w * L ** 3) / (360 * EI));
    expectClose(nodeAt(r, 1).rz, (8 * w * L ** 3) / (360 * EI));
  });

  it("under an applied counterclockwise moment matches statics and Roark Table 8.1 case 3e", () => {
    const M0 = 30_000; // N·m, counterclockwise
    const a = 2;
    const b = L - a;
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }], [{ type: "moment", x: a, mz: M0 }], { stations: [a, 1, 5] }));
    // Σ M about x = 0: M0 + R2·L = 0 ⇒ R2 = −M0/L, R1 = +M0/L (statics).
    expectClose(reactionAt(r, 0).fy, M0 / L);
    expectClose(reactionAt(r, 1).fy, -M0 / L);
    // M jumps by −M0 at a counterclockwise applied moment: M(a−) = M0·a/L, M(a+) = −M0·b/L.
    expectClose(r.extremes.Mmax.value, (M0 * a) / L);
    expectClose(r.extremes.Mmax.x, a, L);
    expectClose(r.extremes.Mmin.value, (-M0 * b) / L);
    expectClose(r.extremes.Mmin.x, a, L);
    expectClose(stationAt(r, a).M, (-M0 * b) / L); // station at a reports the value just right
    expectClose(stationAt(r, 1).V, M0 / L);
    expectClose(stationAt(r, 5).M, (-M0 * (L - 5)) / L);
    // θA = −(1/EIL)∫M(x)(L − x)dx = −M0(L² − 3b²)/6EIL (Roark 8.1 case 3e, re-derived here).
    expectClose(nodeAt(r, 0).rz, (-M0 * (L * L - 3 * b * b)) / (6 * EI * L));
  });
});

describe("beam overhanging one support", () => {
  it("under a point load at the end of the overhang matches AWC (overhang, concentrated load at end; from memory)", () => {
    const a = 2; // overhang
    const r = run(beam([{ x: 0, support: pin }, { x: L, support: pin }, { x: L + a }], [{ type: "point", x: L + a, fy: -P }]));
    expectClose(reactionAt(r, 0).fy, (-P * a) / L); // R1 = Pa/L, holding down
    expectClose(reactionAt(r, 1).fy, (P * (L + a)) / L); // R2 = P(L + a)/L
    expectClose(r.extremes.Mmin.value, -P * a); // at R2
    expectClose(r.extremes.Mmin.x, L, L);
    expectClose(nodeAt(r, 2).uy, (-P * a * a * (L + a)) / (3 * EI)); // Δ tip = Pa²(L + a)/3EI
    expectClose(r.extremes.uyMin.value, (-P * a * a * (L + a)) / (3 * EI));
    // Upward Δmax between supports = PaL²/(9√3·EI) = 0.06415·PaL²/EI at x = L/√3.
    expectClose(r.extremes.uyMax.value, (P * a * L * L) / (9 * Math.sqrt(3) * EI));
    expectClose(r.extremes.uyMax.x, L / Math.sqrt(3), L);
    expectClose(nodeAt(r, 0).rz, (P * a * L) / (6 * EI)); // θ = −(1/EIL)∫M(L − x)dx with M = −Pax/L
  });
});

describe("cantilever fixed at x = 0", () => {
  const nodes = [{ x: 0, support: fix }, { x: L }];

  it("under uniform load matches AWC Fig. 12 / AISC case 19", () => {
    const r = run(beam(nodes, [{ type: "distributed", x1: 0, x2: L, qy1: -w, qy2: -w }], { stations: [L / 2] }));
    expectClose(reactionAt(r, 0).fy, w * L);
    expectClose(reactionAt(r, 0).mz, (w * L * L) / 2); // support moment counterclockwise
    expectClose(r.extremes.Mmin.value, (-w * L * L) / 2); // hogging wL²/2 at the support
    expectClose(r.extremes.Mmin.x, 0, L);
    expectClose(r.extremes.Vmax.value, w * L);
    expectClose(r.extremes.Vmax.x, 0, L);
    expectClose(r.extremes.uyMin.value, (-w * L ** 4) / (8 * EI)); // wL⁴/8EI at the free end
    expectClose(r.extremes.uyMin.x, L, L);
    expectClose(nodeAt(r, 1).rz, (-w * L ** 3) / (6 * EI)); // wL³/6EI (Roark 8.1 case 2a)
    expectClose(stationAt(r, L / 2).M, (-w * (L / 2) ** 2) / 2);
    // AWC Fig. 12: Δx = w(x'⁴ − 4L³x' + 3L⁴)/24EI with x' from the free end.
    const xf = L / 2;
    expectClose(stationAt(r, L / 2).uy, (-w * (xf ** 4 - 4 * L ** 3 * xf + 3 * L ** 4)) / (24 * EI));
  });

  it("under a point load at the free end matches AWC Fig. 13 / AISC case 22", () => {
    const r = run(beam(nodes, [{ type: "point", x: L, fy: -P }]));
    expectClose(reactionAt(r, 0).fy, P);
    expectClose(reactionAt(r, 0).mz, P * L);
    expectClose(r.extremes.Mmin.value, -P * L);
    expectClose(r.extremes.uyMin.value, (-P * L ** 3) / (3 * EI)); // PL³/3EI
    expectClose(nodeAt(r, 1).uy, (-P * L ** 3) / (3 * EI));
    expectClose(nodeAt(r, 1).rz, (-P * L * L) / (2 * EI)); // PL²/2EI (Roark 8.1 case 1a)
    expectClose(nodeAt(r, 0).rz, 0, (P * L * L) / EI);
  });

  it.each([
    { name: "at mid-length", b: L / 2 },
    { name: "off centre", b: 2 },
  ])("under a point load $name matches AWC Fig. 14 / AISC case 21", ({ b }) => {
    // b: distance of the load from the fixed end.
    const r = run(beam(nodes, [{ type: "point", x: b, fy: -P }], { stations: [b] }));
    expectClose(reactionAt(r, 0).fy, P);
    expectClose(reactionAt(r, 0).mz, P * b);
    expectClose(r.extremes.Mmin.value, -P * b);
    expectClose(nodeAt(r, 1).uy, (-P * b * b * (3 * L - b)) / (6 * EI)); // Δ tip = Pb²(3L − b)/6EI
    expectClose(stationAt(r, b).uy, (-P * b ** 3) / (3 * EI)); // Δ at load = Pb³/3EI
    expectClose(nodeAt(r, 1).rz, (-P * b * b) / (2 * EI));
  });

  it("under load increasing to the fixed end matches AISC case 18 / Roark Table 8.1 case 2a", () => {
    const r = run(beam(nodes, [{ type: "distributed", x1: 0, x2: L, qy1: -w, qy2: 0 }]));
    const W = (w * L) / 2;
    expectClose(reactionAt(r, 0).fy, W);
    expectClose(reactionAt(r, 0).mz, (W * L) / 3); // resultant acts L/3 from the fixed end
    expectClose(r.extremes.Mmin.value, (-W * L) / 3);
    expectClose(nodeAt(r, 1).uy, (-W * L ** 3) / (15 * EI)); // WL³/15EI = wL⁴/30EI
    expectClose(r.extremes.uyMin.value, (-W * L ** 3) / (15 * EI));
    expectClose(nodeAt(r, 1).rz, (-W * L * L) / (12 * EI)); // WL²/12EI = wL³/24EI
  });
});
