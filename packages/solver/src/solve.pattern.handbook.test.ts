/**
 * Pattern (skip) loading envelopes of equal-span continuous beams checked against published
 * values: AWC "Beam Design Formulas with Shear and Moment Diagrams" Fig. 26 (two equal spans,
 * uniform load on one span; formulas from memory) and the AISC Manual's continuous-beam moment and
 * shear coefficients for three equal spans (Table 3-22a, values from memory, each re-derived below
 * with the three-moment equation so the test does not rest on memory alone).
 */
import { describe, it } from "vitest";
import { solve } from "./index";
import { envelope, expectClose, type BeamModel, type EnvelopeResult, type SolveOutput } from "./testing/exchange";

const L = 6; // m
const w = 10_000; // N/m

function continuousLive(spans: number, stations: number[]): BeamModel {
  return {
    format: "spanwright.beam/1",
    nodes: Array.from({ length: spans + 1 }, (_, i) => ({ x: i * L, support: { type: "pinned" as const } })),
    segments: Array.from({ length: spans }, () => ({ E: 2.0e11, I: 1.0e-4 })),
    loadCases: [{ id: "L", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: spans * L, qy1: -w, qy2: -w }] }],
    combinations: [{ id: "C", factors: { L: 1.0 } }],
    stations,
  };
}

function envelopeRow(env: EnvelopeResult, x: number) {
  const row = env.stations.find((s) => Math.abs(s.x - x) <= 1e-12 * L);
  if (!row) throw new Error(`no envelope station at x = ${x}`);
  return row;
}

function expectAtOneOf(x: number | undefined, candidates: number[]): void {
  const hit = candidates.some((c) => x !== undefined && Math.abs(x - c) <= 1e-9 * L);
  if (!hit) throw new Error(`extreme at x = ${x}, expected one of ${candidates.join(", ")}`);
}

describe("two equal spans, patterned uniform live load", () => {
  it("envelope matches AWC Fig. 26 (one span loaded) and Fig. 29 (both loaded)", () => {
    const xm = (7 * L) / 16; // AWC Fig. 26: Mmax = 49wL²/512 at 7L/16 from the end of the loaded span
    const out = solve(continuousLive(2, [xm, L])) as SolveOutput;
    const env = envelope(out, "C");
    expectClose(env.extremes.Mmax?.value, (49 * w * L * L) / 512);
    expectAtOneOf(env.extremes.Mmax?.x, [xm, 2 * L - xm]);
    expectClose(env.extremes.Mmin?.value, (-w * L * L) / 8); // both spans loaded (Fig. 29)
    expectAtOneOf(env.extremes.Mmin?.x, [L]);
    // At 7L/16: worst hogging when only the far span is loaded, M = R1·x with R1 = −wL/16.
    const s = envelopeRow(env, xm);
    expectClose(s.Mmax, (49 * w * L * L) / 512);
    expectClose(s.Mmin, (-w / 16) * L * xm, w * L * L);
    // Reactions (Fig. 26: R1 = 7wL/16, R3 = −wL/16 uplift; Fig. 29: R2 = 10wL/8; none loaded: 0).
    const end = env.reactions.find((r) => r.node === 0)!;
    expectClose(end.fyMax, (7 * w * L) / 16);
    expectClose(end.fyMin, (-w * L) / 16);
    const mid = env.reactions.find((r) => r.node === 1)!;
    expectClose(mid.fyMax, (10 * w * L) / 8);
    expectClose(mid.fyMin, 0, w * L);
  });
});

describe("three equal spans, patterned uniform live load", () => {
  // Three-moment equation, MA = MD = 0, loaded spans contribute −wL³/4 to their supports' equations:
  //  spans 1 and 3 loaded: MB = MC = −wL²/20 ⇒ RA = 0.45wL, end-span M = RA²/2w = 0.10125wL² at 0.45L;
  //  span 2 alone: MB = MC = −wL²/20 ⇒ mid-span M = wL²/8 − wL²/20 = 0.075wL², RA = −0.05wL (uplift);
  //  spans 1 and 2: 4MB + MC = −wL²/2, MB + 4MC = −wL²/4 ⇒ MB = −7wL²/60, MC = −wL²/30, RB = 1.2wL.
  it("envelope matches the AISC coefficients 0.101 / 0.075 / −0.117 wL² and 0.45 / −0.05 / 1.2 wL", () => {
    const out = solve(continuousLive(3, [0.45 * L, 1.5 * L, L])) as SolveOutput;
    const env = envelope(out, "C");
    expectClose(env.extremes.Mmax?.value, 0.10125 * w * L * L);
    expectAtOneOf(env.extremes.Mmax?.x, [0.45 * L, 3 * L - 0.45 * L]);
    expectClose(env.extremes.Mmin?.value, (-7 * w * L * L) / 60);
    expectAtOneOf(env.extremes.Mmin?.x, [L, 2 * L]);
    const row = (x: number) => envelopeRow(env, x);
    expectClose(row(1.5 * L).Mmax, 0.075 * w * L * L);
    expectClose(row(0.45 * L).Mmax, 0.10125 * w * L * L);
    expectClose(row(L).Mmin, (-7 * w * L * L) / 60);
    const end = env.reactions.find((r) => r.node === 0)!;
    expectClose(end.fyMax, 0.45 * w * L);
    expectClose(end.fyMin, -0.05 * w * L);
    const inner = env.reactions.find((r) => r.node === 1)!;
    expectClose(inner.fyMax, 1.2 * w * L);
  });
});
