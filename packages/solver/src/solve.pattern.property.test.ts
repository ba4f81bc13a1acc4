/**
 * Pattern-loading envelopes against brute force: every one of the 2ⁿ arrangements of span pieces
 * (n ≤ 6) is solved as its own non-patterned model, and the envelope must equal, quantity by
 * quantity and point by point, the worst of those results (definition in the exchange format).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solve } from "./index";
import { beamShapeArb, loadsArb, stationsArb, toModel, type BeamShape } from "./testing/arbitraries";
import { caseResult, envelope, expectClose, type BeamModel, type CaseResult, type ExtremeKey, type LoadSpec, type SolveOutput } from "./testing/exchange";
import { loadsOfArrangement, spansOf, splitIntoSpans } from "./testing/patternPieces";
import { combinedScale, quantityScale } from "./testing/scales";

const RUNS = 40;

interface Scenario {
  shape: BeamShape;
  dead: LoadSpec[];
  live: LoadSpec[];
  stations: number[];
  factors: { D: number; L: number };
}

function fullLengthLoad(shape: BeamShape): LoadSpec {
  return { type: "distributed", x1: shape.nodes[0]!.x, x2: shape.nodes[shape.nodes.length - 1]!.x, qy1: -5000, qy2: -8000 };
}

const scenarioArb: fc.Arbitrary<Scenario> = beamShapeArb().chain((shape) =>
  fc.record({
    shape: fc.constant(shape),
    dead: loadsArb(shape.nodes, { allowSettlement: true }, 3),
    // Half the time a full-length load as well, so most spans carry a piece and patterns matter.
    live: fc
      .tuple(loadsArb(shape.nodes, { momentsOffNodes: true }, 5), fc.boolean())
      .map(([loads, full]) => (full ? [...loads, fullLengthLoad(shape)] : loads)),
    stations: stationsArb(shape.nodes, 12),
    factors: fc.constantFrom({ D: 1.2, L: 1.6 }, { D: 1.0, L: 1.0 }, { D: 0.9, L: 1.5 }, { D: 1.35, L: -0.5 }),
  }),
);

function modelOf(s: Scenario, live: LoadSpec[] | null, pattern: boolean): BeamModel {
  const cases: BeamModel["loadCases"] = [{ id: "D", category: "dead", loads: s.dead }];
  const c1: Record<string, number> = { D: s.factors.D };
  if (live) {
    cases.push({ id: "L", category: "live", pattern, loads: live });
    c1.L = s.factors.L;
  }
  return toModel(s.shape, cases, { combinations: [{ id: "C1", factors: c1 }, { id: "C2", factors: { D: 0.9 } }], stations: s.stations });
}

/** Results of combination C1 for every arrangement of the live case's span pieces. */
function bruteForce(s: Scenario): CaseResult[] {
  const pieces = splitIntoSpans(spansOf(s.shape.nodes), s.live);
  const results: CaseResult[] = [];
  for (let mask = 0; mask < 1 << pieces.length; mask++) {
    const loads = loadsOfArrangement(pieces, mask);
    results.push(caseResult(solve(modelOf(s, loads.length > 0 ? loads : null, false)) as SolveOutput, "C1"));
  }
  return results;
}

const stationQuantities = [
  ["Mmax", "Mmin", "M"],
  ["Vmax", "Vmin", "V"],
  ["uyMax", "uyMin", "uy"],
] as const;

/** Property runs are CPU-bound; the machine is shared, so allow well beyond the usual time. */
const TIMEOUT = 60_000;

describe("pattern envelope", () => {
  it("equals the worst of all 2ⁿ span arrangements at every station, reaction and extreme", () => {
    fc.assert(
      fc.property(scenarioArb, (s) => {
        expect(spansOf(s.shape.nodes).length).toBeLessThanOrEqual(6);
        const model = modelOf(s, s.live, true);
        const out = solve(model) as SolveOutput;
        const env = envelope(out, "C1");
        const all = bruteForce(s);
        const ps = combinedScale(model, [[s.dead, s.factors.D], [s.live, s.factors.L], [s.dead, 0.9]]);
        const allStations = all.flatMap((r) => r.stations);
        const scaleOf = (key: "M" | "V" | "uy") => quantityScale(key, allStations, ps);
        // With every piece loaded the combination result is the plain, non-patterned result.
        const full = all[all.length - 1]!;
        const got = caseResult(out, "C1");
        const mScale = scaleOf("M");
        got.stations.forEach((q, i) => expectClose(q.M, full.stations[i]!.M, mScale));

        expect(env.stations.length).toBe(s.stations.length);
        for (const [hi, lo, key] of stationQuantities) {
          const scale = scaleOf(key);
          env.stations.forEach((e, i) => {
            const values = all.map((r) => r.stations[i]![key]);
            expectClose(e[hi], Math.max(...values), scale);
            expectClose(e[lo], Math.min(...values), scale);
          });
        }
        const fScale = Math.max(ps.force, ...all.flatMap((r) => r.reactions.map((q) => Math.abs(q.fy))));
        const rScale = Math.max(ps.moment, ...all.flatMap((r) => r.reactions.map((q) => Math.abs(q.mz)))) + fScale;
        for (const row of env.reactions) {
          const fy = all.map((r) => r.reactions.find((q) => q.node === row.node)!.fy);
          const mz = all.map((r) => r.reactions.find((q) => q.node === row.node)!.mz);
          expectClose(row.fyMax, Math.max(...fy), fScale);
          expectClose(row.fyMin, Math.min(...fy), fScale);
          expectClose(row.mzMax, Math.max(...mz), rScale);
          expectClose(row.mzMin, Math.min(...mz), rScale);
        }
        // max over x of max over arrangements = max over arrangements of each exact extreme.
        for (const [k, pick, key] of [["Mmax", Math.max, "M"], ["Mmin", Math.min, "M"], ["Vmax", Math.max, "V"], ["Vmin", Math.min, "V"], ["uyMax", Math.max, "uy"], ["uyMin", Math.min, "uy"]] as [ExtremeKey, (...v: number[]) => number, "M" | "V" | "uy"][]) {
          const e = env.extremes[k];
          if (!e) continue;
          const values = all.map((r) => r.extremes[k].value);
          expectClose(e.value, pick(...values), Math.max(scaleOf(key), ...values.map(Math.abs)));
        }
        expect(env.extremes.Mmax, "envelope Mmax extreme").toBeDefined();
        expect(env.extremes.Mmin, "envelope Mmin extreme").toBeDefined();
        // The exact envelope extremes bound every sampled envelope value.
        for (const [hi, lo, key] of stationQuantities) {
          const eh = env.extremes[hi];
          const el = env.extremes[lo];
          const tol = 1e-9 * Math.max(scaleOf(key), Math.abs(eh?.value ?? 0), Math.abs(el?.value ?? 0));
          for (const st of env.stations) {
            if (eh) expect(st[hi]).toBeLessThanOrEqual(eh.value + tol);
            if (el) expect(st[lo]).toBeGreaterThanOrEqual(el.value - tol);
          }
        }
        // "*" is the envelope over all combinations; C2 has no patterned case.
        const star = envelope(out, "*");
        const c2 = caseResult(out, "C2");
        const sScale = Math.max(mScale, ...c2.stations.map((q) => Math.abs(q.M)));
        star.stations.forEach((e, i) => {
          expectClose(e.Mmax, Math.max(env.stations[i]!.Mmax, c2.stations[i]!.M), sScale);
          expectClose(e.Mmin, Math.min(env.stations[i]!.Mmin, c2.stations[i]!.M), sScale);
        });
        for (const row of star.reactions) {
          const c1Row = env.reactions.find((q) => q.node === row.node)!;
          const c2Row = c2.reactions.find((q) => q.node === row.node)!;
          expectClose(row.fyMax, Math.max(c1Row.fyMax, c2Row.fy), fScale);
          expectClose(row.fyMin, Math.min(c1Row.fyMin, c2Row.fy), fScale);
        }
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);
});

describe("pattern envelope with two patterned cases", () => {
  it("takes each case's span pieces independently: equals brute force over all 2²ⁿ arrangements (n ≤ 3)", () => {
    const arb = beamShapeArb()
      .filter((shape) => spansOf(shape.nodes).length <= 3)
      .chain((shape) =>
        fc.record({
          shape: fc.constant(shape),
          dead: loadsArb(shape.nodes, {}, 2),
          live: loadsArb(shape.nodes, { momentsOffNodes: true }, 4).map((l) => [...l, fullLengthLoad(shape)]),
          snow: loadsArb(shape.nodes, { momentsOffNodes: true }, 3),
          stations: stationsArb(shape.nodes, 10),
        }),
      );
    const factors = { D: 1.2, L: 1.6, S: 0.5 };
    const build = (s: { shape: BeamShape; dead: LoadSpec[]; stations: number[] }, parts: [string, LoadSpec[], boolean][]): BeamModel => {
      const used = parts.filter(([, loads]) => loads.length > 0);
      const cases: BeamModel["loadCases"] = [{ id: "D", category: "dead", loads: s.dead }, ...used.map(([id, loads, pattern]) => ({ id, category: id === "L" ? "live" : "snow", pattern, loads }))];
      const f: Record<string, number> = { D: factors.D };
      for (const [id] of used) f[id] = factors[id as "L" | "S"];
      return toModel(s.shape, cases, { combinations: [{ id: "C", factors: f }], stations: s.stations });
    };
    fc.assert(
      fc.property(arb, (s) => {
        const model = build(s, [["L", s.live, true], ["S", s.snow, true]]);
        const env = envelope(solve(model) as SolveOutput, "C");
        const spans = spansOf(s.shape.nodes);
        const pl = splitIntoSpans(spans, s.live);
        const ps = splitIntoSpans(spans, s.snow);
        const all: CaseResult[] = [];
        for (let a = 0; a < 1 << pl.length; a++) {
          for (let b = 0; b < 1 << ps.length; b++) {
            const m = build(s, [["L", loadsOfArrangement(pl, a), false], ["S", loadsOfArrangement(ps, b), false]]);
            all.push(caseResult(solve(m) as SolveOutput, "C"));
          }
        }
        const scale = combinedScale(model, [[s.dead, factors.D], [s.live, factors.L], [s.snow, factors.S]]);
        const allStations = all.flatMap((r) => r.stations);
        for (const [hi, lo, key] of stationQuantities) {
          const q = quantityScale(key, allStations, scale);
          env.stations.forEach((e, i) => {
            const values = all.map((r) => r.stations[i]![key]);
            expectClose(e[hi], Math.max(...values), q);
            expectClose(e[lo], Math.min(...values), q);
          });
        }
        const fScale = Math.max(scale.force, ...all.flatMap((r) => r.reactions.map((q) => Math.abs(q.fy))));
        for (const row of env.reactions) {
          const fy = all.map((r) => r.reactions.find((q) => q.node === row.node)!.fy);
          expectClose(row.fyMax, Math.max(...fy), fScale);
          expectClose(row.fyMin, Math.min(...fy), fScale);
        }
      }),
      { numRuns: 25 },
    );
  }, TIMEOUT);
});
