/**
 * Single-span statically indeterminate handbook beams (propped cantilever, fixed-fixed) checked
 * through the public exchange format. Sources: AWC "Beam Design Formulas with Shear and Moment
 * Diagrams" (Design Aid 6, 2005 ed.; figure numbers from its list of figures, formulas from
 * memory), AISC Steel Construction Manual Table 3-23 (case numbers from memory), Roark's Formulas
 * for Stress and Strain Table 8.1 (from memory). The handbooks put the simple end of a propped
 * cantilever on the left; here the fixed end is at x = 0, so x' = L − x is the handbook's x.
 */
import { describe, it } from "vitest";
import { solve } from "./index";
import { beam, caseResult, expectClose, nodeAt, reactionAt, stationAt, type CaseResult, type SolveOutput } from "./testing/exchange";

const EI = 2.0e11 * 1.0e-4; // N·m², the default section of beam()
const L = 6; // m
const w = 10_000; // N/m
const P = 20_000; // N

function run(model: unknown): CaseResult {
  return caseResult(solve(model) as SolveOutput, "A");
}

const propped = [{ x: 0, support: { type: "fixed" } }, { x: L, support: { type: "pinned" } }] as const;
const fixedFixed = [{ x: 0, support: { type: "fixed" } }, { x: L, support: { type: "fixed" } }] as const;

describe("propped cantilever (fixed at x = 0, pinned at x = L)", () => {
  it("under uniform load matches AWC Fig. 15 / AISC case 12", () => {
    const r = run(beam([...propped], [{ type: "distributed", x1: 0, x2: L, qy1: -w, qy2: -w }], { stations: [L / 2] }));
    expectClose(reactionAt(r, 1).fy, (3 * w * L) / 8); // R1 = 3wL/8 at the simple end
    expectClose(reactionAt(r, 0).fy, (5 * w * L) / 8); // R2 = 5wL/8 at the fixed end
    expectClose(reactionAt(r, 0).mz, (w * L * L) / 8); // M1 = wL²/8, hogging
    expectClose(r.extremes.Mmin.value, (-w * L * L) / 8);
    expectClose(r.extremes.Mmin.x, 0, L);
    expectClose(r.extremes.Mmax.value, (9 * w * L * L) / 128); // 9wL²/128 at x' = 3L/8
    expectClose(r.extremes.Mmax.x, L - (3 * L) / 8, L);
    // Δx' = wx'(L³ − 3Lx'² + 2x'³)/48EI; Δmax at x' = L(1 + √33)/16 (≈ wL⁴/185EI).
    const defl = (xp: number) => (w * xp * (L ** 3 - 3 * L * xp * xp + 2 * xp ** 3)) / (48 * EI);
    const xpMax = (L * (1 + Math.sqrt(33))) / 16;
    expectClose(r.extremes.uyMin.value, -defl(xpMax));
    expectClose(r.extremes.uyMin.x, L - xpMax, L);
    expectClose(stationAt(r, L / 2).uy, -defl(L / 2));
    expectClose(nodeAt(r, 1).rz, (w * L ** 3) / (48 * EI)); // slope at the simple end wL³/48EI
    expectClose(r.extremes.Vmax.value, (5 * w * L) / 8);
    expectClose(r.extremes.Vmin.value, (-3 * w * L) / 8);
  });

  it("under a central point load matches AWC Fig. 16 / AISC case 13", () => {
    const r = run(beam([...propped], [{ type: "point", x: L / 2, fy: -P }], { stations: [L / 2] }));
    expectClose(reactionAt(r, 1).fy, (5 * P) / 16);
    expectClose(reactionAt(r, 0).fy, (11 * P) / 16);
    expectClose(reactionAt(r, 0).mz, (3 * P * L) / 16);
    expectClose(r.extremes.Mmin.value, (-3 * P * L) / 16);
    expectClose(r.extremes.Mmax.value, (5 * P * L) / 32); // at the load
    expectClose(r.extremes.Mmax.x, L / 2, L);
    expectClose(stationAt(r, L / 2).uy, (-7 * P * L ** 3) / (768 * EI)); // Δ at load = 7PL³/768EI
    // Δmax = PL³/(48√5·EI) at x' = L/√5 from the simple end.
    expectClose(r.extremes.uyMin.value, (-P * L ** 3) / (48 * Math.sqrt(5) * EI));
    expectClose(r.extremes.uyMin.x, L - L / Math.sqrt(5), L);
  });

  it("under an off-centre point load matches AWC Fig. 17 / AISC case 14", () => {
    const a = 2; // from the simple end
    const b = L - a;
    const r = run(beam([...propped], [{ type: "point", x: L - a, fy: -P }]));
    const R1 = (P * b * b * (a + 2 * L)) / (2 * L ** 3); // simple end
    expectClose(reactionAt(r, 1).fy, R1);
    expectClose(reactionAt(r, 0).fy, (P * a * (3 * L * L - a * a)) / (2 * L ** 3));
    expectClose(reactionAt(r, 0).mz, (P * a * b * (a + L)) / (2 * L * L));
    expectClose(r.extremes.Mmax.value, R1 * a); // M at the load = R1·a
    expectClose(r.extremes.Mmax.x, L - a, L);
    expectClose(r.extremes.Mmin.value, (-P * a * b * (a + L)) / (2 * L * L));
  });

  it("under load increasing to the fixed end matches Roark Table 8.1 case 2c", () => {
    // Force method: redundant R at the simple end cancels the cantilever tip deflection wL⁴/30EI
    // ⇒ R·L³/3EI = wL⁴/30EI ⇒ R = wL/10; M(x') = Rx' − wx'³/6L peaks at x' = L/√5.
    const r = run(beam([...propped], [{ type: "distributed", x1: 0, x2: L, qy1: -w, qy2: 0 }]));
    expectClose(reactionAt(r, 1).fy, (w * L) / 10);
    expectClose(reactionAt(r, 0).fy, (2 * w * L) / 5);
    expectClose(reactionAt(r, 0).mz, (w * L * L) / 15);
    expectClose(r.extremes.Mmin.value, (-w * L * L) / 15);
    expectClose(r.extremes.Mmax.value, (w * L * L) / (15 * Math.sqrt(5)));
    expectClose(r.extremes.Mmax.x, L - L / Math.sqrt(5), L);
  });
});

describe("beam fixed at both ends", () => {
  it("under uniform load matches AWC Fig. 23 / AISC case 15", () => {
    const r = run(beam([...fixedFixed], [{ type: "distributed", x1: 0, x2: L, qy1: -w, qy2: -w }], { stations: [L / 2] }));
    expectClose(reactionAt(r, 0).fy, (w * L) / 2);
    expectClose(reactionAt(r, 1).fy, (w * L) / 2);
    expectClose(reactionAt(r, 0).mz, (w * L * L) / 12); // end moments wL²/12
    expectClose(reactionAt(r, 1).mz, (-w * L * L) / 12);
    expectClose(r.extremes.Mmin.value, (-w * L * L) / 12);
    expectClose(r.extremes.Mmax.value, (w * L * L) / 24); // wL²/24 at centre
    expectClose(r.extremes.Mmax.x, L / 2, L);
    expectClose(stationAt(r, L / 2).M, (w * L * L) / 24);
    expectClose(r.extremes.uyMin.value, (-w * L ** 4) / (384 * EI)); // wL⁴/384EI
    expectClose(r.extremes.uyMin.x, L / 2, L);
  });

  it("under a central point load matches AWC Fig. 24 / AISC case 16", () => {
    const r = run(beam([...fixedFixed], [{ type: "point", x: L / 2, fy: -P }]));
    expectClose(reactionAt(r, 0).mz, (P * L) / 8);
    expectClose(reactionAt(r, 1).mz, (-P * L) / 8);
    expectClose(r.extremes.Mmax.value, (P * L) / 8);
    expectClose(r.extremes.Mmin.value, (-P * L) / 8);
    expectClose(r.extremes.uyMin.value, (-P * L ** 3) / (192 * EI)); // PL³/192EI
    expectClose(r.extremes.uyMin.x, L / 2, L);
  });

  it("under an off-centre point load matches AWC Fig. 25 / AISC case 17 (a > b)", () => {
    const a = 4;
    const b = L - a;
    const r = run(beam([...fixedFixed], [{ type: "point", x: a, fy: -P }], { stations: [a] }));
    expectClose(reactionAt(r, 0).fy, (P * b * b * (3 * a + b)) / L ** 3);
    expectClose(reactionAt(r, 1).fy, (P * a * a * (a + 3 * b)) / L ** 3);
    expectClose(reactionAt(r, 0).mz, (P * a * b * b) / (L * L)); // M1 = Pab²/L²
    expectClose(reactionAt(r, 1).mz, (-P * a * a * b) / (L * L)); // M2 = Pa²b/L²
    expectClose(r.extremes.Mmin.value, (-P * a * a * b) / (L * L));
    expectClose(r.extremes.Mmax.value, (2 * P * a * a * b * b) / L ** 3); // at the load
    expectClose(r.extremes.Mmax.x, a, L);
    expectClose(stationAt(r, a).uy, (-P * a ** 3 * b ** 3) / (3 * EI * L ** 3));
    // Δmax = 2Pa³b²/(3EI(3a + b)²) at x = 2aL/(3a + b) when a > b.
    expectClose(r.extremes.uyMin.value, (-2 * P * a ** 3 * b * b) / (3 * EI * (3 * a + b) ** 2));
    expectClose(r.extremes.uyMin.x, (2 * a * L) / (3 * a + b), L);
  });

  it("under load increasing uniformly to one end matches Roark Table 8.1 case 2d", () => {
    const r = run(beam([...fixedFixed], [{ type: "distributed", x1: 0, x2: L, qy1: 0, qy2: -w }]));
    expectClose(reactionAt(r, 0).fy, (3 * w * L) / 20);
    expectClose(reactionAt(r, 1).fy, (7 * w * L) / 20);
    expectClose(reactionAt(r, 0).mz, (w * L * L) / 30); // wL²/30 at the light end
    expectClose(reactionAt(r, 1).mz, (-w * L * L) / 20); // wL²/20 at the heavy end
    expectClose(r.extremes.Mmin.value, (-w * L * L) / 20);
    expectClose(r.extremes.Mmin.x, L, L);
    // M(x) = −wL²/30 + 3wLx/20 − wx³/6L peaks where V = 3wL/20 − wx²/2L = 0, x = L√0.3 (derived).
    const xm = L * Math.sqrt(0.3);
    expectClose(r.extremes.Mmax.value, (-w * L * L) / 30 + (3 * w * L * xm) / 20 - (w * xm ** 3) / (6 * L));
    expectClose(r.extremes.Mmax.x, xm, L);
  });
});

describe("beam fixed at x = 0 and guided at x = L", () => {
  it("under an end load deflects PL³/12EI with end moments PL/2 (Roark Table 8.1 case 1b, from memory)", () => {
    const r = run(beam([{ x: 0, support: { type: "fixed" } }, { x: L, support: { type: "guided" } }], [{ type: "point", x: L, fy: -P }], { stations: [L / 2] }));
    expectClose(reactionAt(r, 0).fy, P);
    expectClose(reactionAt(r, 1).fy, 0, P);
    expectClose(reactionAt(r, 0).mz, (P * L) / 2);
    expectClose(reactionAt(r, 1).mz, (P * L) / 2);
    expectClose(nodeAt(r, 1).uy, (-P * L ** 3) / (12 * EI));
    expectClose(nodeAt(r, 1).rz, 0, (P * L * L) / EI);
    expectClose(r.extremes.Mmin.value, (-P * L) / 2);
    expectClose(r.extremes.Mmax.value, (P * L) / 2);
    expectClose(stationAt(r, L / 2).M, 0, P * L); // antisymmetric moment, zero at mid-length
  });
});
