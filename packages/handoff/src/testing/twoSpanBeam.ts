import type {
  BeamModel,
  CaseResult,
  EnvelopeResult,
  Extreme,
  SolveResult,
  StationResult,
} from "../exchange.js";

/**
 * Test fixture: two equal spans L, pinned at A (x = 0), B (x = L), C (x = 2L), uniform loads.
 * Results come from closed forms, not from the solver, so these tests stand alone:
 * - one span loaded, w down: R_A = 7/16 wL, R_B = 5/8 wL, R_C = -1/16 wL
 *   (AISC Manual Table 3-23 case 30, from memory);
 * - both spans: R_A = R_C = 3/8 wL, R_B = 5/4 wL, M_B = -wL²/8 (case 29, from memory),
 *   which the tests check is what superposing the two one-span cases gives.
 * Deflection integrates EI·uy'' = M with uy = 0 at the supports.
 */

export const SPAN = 6;
export const EI = 2.0e11 * 8.0e-5;

interface Response {
  V: number;
  M: number;
  uy: number;
  rz: number;
}

/**
 * Span 1 alone under w = 1 N/m downward. At x = L the contract reports the value just right of
 * the support; `leftAtSupport` gives the value just left, which the mirror image needs.
 */
function spanOneUnit(x: number, leftAtSupport = false): Response {
  const L = SPAN;
  const A = (7 * L) / 16;
  const C = -L / 16;
  if (x < L || (leftAtSupport && x === L)) {
    return {
      V: A - x,
      M: A * x - (x * x) / 2,
      uy: ((A * x ** 3) / 6 - x ** 4 / 24 - (L ** 3 * x) / 32) / EI,
      rz: ((A * x * x) / 2 - x ** 3 / 6 - L ** 3 / 32) / EI,
    };
  }
  const s = 2 * L - x;
  const c2 = (-C * L * L) / 6;
  return { V: -C, M: C * s, uy: ((C * s ** 3) / 6 + c2 * s) / EI, rz: -((C * s * s) / 2 + c2) / EI };
}

/** Response to qy1 on span 1 and qy2 on span 2 (N/m, positive upward as in the contract). */
export function response(qy1: number, qy2: number, x: number): Response {
  const a = spanOneUnit(x);
  const b = spanOneUnit(2 * SPAN - x, true);
  const w1 = -qy1;
  const w2 = -qy2;
  // The mirror image of a span-2 load: V and rz change sign, M and uy do not.
  return {
    V: w1 * a.V - w2 * b.V,
    M: w1 * a.M + w2 * b.M,
    uy: w1 * a.uy + w2 * b.uy,
    rz: w1 * a.rz - w2 * b.rz,
  };
}

export function reactions(qy1: number, qy2: number): [number, number, number] {
  const L = SPAN;
  const w1 = -qy1;
  const w2 = -qy2;
  return [
    w1 * (7 / 16) * L + w2 * (-1 / 16) * L,
    w1 * (5 / 8) * L + w2 * (5 / 8) * L,
    w1 * (-1 / 16) * L + w2 * (7 / 16) * L,
  ];
}

export function twoSpanModel(): BeamModel {
  const L = SPAN;
  return {
    format: "spanwright.beam/1",
    title: "Two-span test beam",
    nodes: [
      { x: 0, support: { type: "pinned" } },
      { x: L, support: { type: "pinned" } },
      { x: 2 * L, support: { type: "pinned" } },
    ],
    segments: [
      { E: 2.0e11, I: 8.0e-5 },
      { E: 2.0e11, I: 8.0e-5 },
    ],
    loadCases: [
      { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 2 * L, qy1: -3000, qy2: -3000 }] },
      { id: "L", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: 2 * L, qy1: -5000, qy2: -5000 }] },
      { id: "W", category: "wind", loads: [{ type: "distributed", x1: 0, x2: 2 * L, qy1: 4000, qy2: 4000 }] },
    ],
    combinations: [
      { id: "C1", factors: { D: 1.2, L: 1.6 } },
      { id: "C2", factors: { D: 0.9, W: 1.0 } },
    ],
  };
}

/** Uniform qy per span of each case, read from the fixture model (each load covers 0..2L). */
function caseLoads(model: BeamModel, id: string): [number, number] {
  const lc = model.loadCases.find((c) => c.id === id);
  let q = 0;
  for (const load of lc?.loads ?? []) if (load.type === "distributed") q += load.qy1;
  return [q, q];
}

function sampleExtremes(q1: number, q2: number): CaseResult["extremes"] {
  const xs = Array.from({ length: 2401 }, (_, i) => (i / 2400) * 2 * SPAN);
  const pick = (key: keyof Response, better: (a: number, b: number) => boolean): Extreme =>
    xs.reduce<Extreme>(
      (best, x) => {
        const value = response(q1, q2, x)[key];
        return better(value, best.value) ? { value, x } : best;
      },
      { value: response(q1, q2, 0)[key], x: 0 },
    );
  const gt = (a: number, b: number) => a > b;
  const lt = (a: number, b: number) => a < b;
  return {
    Mmax: pick("M", gt), Mmin: pick("M", lt), Vmax: pick("V", gt),
    Vmin: pick("V", lt), uyMax: pick("uy", gt), uyMin: pick("uy", lt),
  };
}

function caseResult(q1: number, q2: number, stations: number[]): CaseResult {
  const r = reactions(q1, q2);
  return {
    reactions: r.map((fy, node) => ({ node, fy, mz: 0 })),
    nodes: [0, 1, 2].map((node) => ({ node, uy: 0, rz: response(q1, q2, node * SPAN).rz })),
    stations: stations.map((x): StationResult => ({ x, ...response(q1, q2, x) })),
    extremes: sampleExtremes(q1, q2),
  };
}

/** Closed-form result in the exchange format, with envelopes over the live-load patterns. */
export function twoSpanResult(model: BeamModel, stations: number[] = []): SolveResult {
  const results: SolveResult["results"] = {};
  for (const lc of model.loadCases) results[lc.id] = caseResult(...caseLoads(model, lc.id), stations);
  const envelopes: SolveResult["envelopes"] = {};
  const arrangements: Array<Array<[number, number]>> = [];
  for (const combo of model.combinations) {
    let fixed: [number, number] = [0, 0];
    let patterned: [number, number] = [0, 0];
    for (const [id, f] of Object.entries(combo.factors)) {
      const [a, b] = caseLoads(model, id);
      const isPattern = model.loadCases.find((c) => c.id === id)?.pattern === true;
      if (isPattern) patterned = [patterned[0] + f * a, patterned[1] + f * b];
      else fixed = [fixed[0] + f * a, fixed[1] + f * b];
    }
    results[combo.id] = caseResult(fixed[0] + patterned[0], fixed[1] + patterned[1], stations);
    const masks: Array<[number, number]> = [[0, 0], [1, 0], [0, 1], [1, 1]];
    const loads = masks.map(([m1, m2]): [number, number] => [fixed[0] + m1 * patterned[0], fixed[1] + m2 * patterned[1]]);
    arrangements.push(loads);
    envelopes[combo.id] = envelopeOf(loads, stations);
  }
  if (arrangements.length > 0) envelopes["*"] = envelopeOf(arrangements.flat(), stations);
  return { format: "spanwright.result/1", results, envelopes };
}

function envelopeOf(loads: Array<[number, number]>, stations: number[]): EnvelopeResult {
  const all = loads.map(([a, b]) => reactions(a, b));
  const extremes = loads.map(([a, b]) => sampleExtremes(a, b));
  const maxBy = (key: keyof CaseResult["extremes"], pickMax: boolean): Extreme =>
    extremes.map((e) => e[key]).reduce((best, e) => ((pickMax ? e.value > best.value : e.value < best.value) ? e : best));
  return {
    reactions: [0, 1, 2].map((node) => {
      const fys = all.map((r) => r[node] ?? 0);
      return { node, fyMax: Math.max(...fys), fyMin: Math.min(...fys), mzMax: 0, mzMin: 0 };
    }),
    stations: stations.map((x) => {
      const rs = loads.map(([a, b]) => response(a, b, x));
      return {
        x,
        Mmax: Math.max(...rs.map((r) => r.M)), Mmin: Math.min(...rs.map((r) => r.M)),
        Vmax: Math.max(...rs.map((r) => r.V)), Vmin: Math.min(...rs.map((r) => r.V)),
        uyMax: Math.max(...rs.map((r) => r.uy)), uyMin: Math.min(...rs.map((r) => r.uy)),
      };
    }),
    extremes: {
      Mmax: maxBy("Mmax", true), Mmin: maxBy("Mmin", false), Vmax: maxBy("Vmax", true),
      Vmin: maxBy("Vmin", false), uyMax: maxBy("uyMax", true), uyMin: maxBy("uyMin", false),
    },
  };
}
