/**
 * Properties every linear-elastic beam solution must have, on random valid beams (2–6 spans,
 * mixed supports incl. springs, stable hinges, loads crossing nodes, settlements): reactions
 * balance the loads, and results superpose linearly through combinations (common practice:
 * statics and the superposition principle of linear elasticity).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solve } from "./index";
import { beamShapeArb, loadsArb, stationsArb, toModel } from "./testing/arbitraries";
import { caseResult, envelope, expectClose, type CaseResult, type SolveOutput, type StationRow } from "./testing/exchange";
import { combinedScale, quantityScale } from "./testing/scales";
import { loadResultant, reactionResultant } from "./testing/statics";

const RUNS = 100;

const twoCaseModel = beamShapeArb().chain((shape) =>
  fc.record({
    shape: fc.constant(shape),
    loadsA: loadsArb(shape.nodes, { allowSettlement: true }),
    loadsB: loadsArb(shape.nodes, { allowSettlement: true }),
    stations: stationsArb(shape.nodes),
    alpha: fc.constantFrom(1.0, 1.2, 1.35, 0.9, -0.5),
    beta: fc.constantFrom(1.0, 1.6, 1.5, 0.5, 0),
  }),
);

/** Property runs are CPU-bound; the machine is shared, so allow well beyond the usual time. */
const TIMEOUT = 60_000;

describe("equilibrium", () => {
  it("reactions balance the applied loads in force and in moment about x = 0, for cases and combinations", () => {
    fc.assert(
      fc.property(twoCaseModel, ({ shape, loadsA, loadsB, stations, alpha, beta }) => {
        const model = toModel(shape, [
          { id: "A", category: "dead", loads: loadsA },
          { id: "B", category: "live", loads: loadsB },
        ], { combinations: [{ id: "C", factors: { A: alpha, B: beta } }], stations });
        const out = solve(model) as SolveOutput;
        const checks: [string, ReturnType<typeof loadResultant>][] = [
          ["A", loadResultant(loadsA)],
          ["B", loadResultant(loadsB)],
          ["C", loadResultant(loadsB, beta, loadResultant(loadsA, alpha))],
        ];
        const scales = {
          A: combinedScale(model, [[loadsA, 1]]),
          B: combinedScale(model, [[loadsB, 1]]),
          C: combinedScale(model, [[loadsA, alpha], [loadsB, beta]]),
        };
        for (const [id, applied] of checks) {
          const r = caseResult(out, id);
          const total = reactionResultant(shape.nodes, r.reactions, { ...applied });
          const ps = scales[id as keyof typeof scales];
          expectClose(total.fy, 0, Math.max(total.fyScale, ps.force));
          expectClose(total.mz, 0, Math.max(total.mzScale, ps.moment));
        }
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);

  it("reports one reaction row for every supported node and a node row for every node", () => {
    fc.assert(
      fc.property(twoCaseModel, ({ shape, loadsA }) => {
        const r = caseResult(solve(toModel(shape, [{ id: "A", category: "dead", loads: loadsA }])) as SolveOutput, "A");
        const supported = shape.nodes.flatMap((n, i) => (n.support ? [i] : []));
        expect(r.reactions.map((q) => q.node).sort((a, b) => a - b)).toEqual(supported);
        expect(r.nodes.map((q) => q.node).sort((a, b) => a - b)).toEqual(shape.nodes.map((_, i) => i));
        r.nodes.forEach((row) => {
          if (shape.nodes[row.node]!.hinge) expect([typeof row.rzLeft, typeof row.rzRight]).toEqual(["number", "number"]);
          else expect(typeof row.rz).toBe("number");
        });
      }),
      { numRuns: 40 },
    );
  }, TIMEOUT);
});

function maxAbs(values: number[]): number {
  return values.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
}

const stationKeys = ["V", "M", "uy", "rz"] as const satisfies readonly (keyof StationRow)[];

describe("superposition", () => {
  it("a combination equals the factored sum of its cases at every station and reaction", () => {
    fc.assert(
      fc.property(twoCaseModel, ({ shape, loadsA, loadsB, stations, alpha, beta }) => {
        const model = toModel(shape, [
          { id: "A", category: "dead", loads: loadsA },
          { id: "B", category: "live", loads: loadsB },
        ], { combinations: [{ id: "C", factors: { A: alpha, B: beta } }], stations });
        const out = solve(model) as SolveOutput;
        const [a, b, c] = (["A", "B", "C"] as const).map((id) => caseResult(out, id)) as [CaseResult, CaseResult, CaseResult];
        expect(c.stations.length).toBe(stations.length);
        const ps = combinedScale(model, [[loadsA, alpha], [loadsB, beta]]);
        for (const key of stationKeys) {
          const scale = quantityScale(key, [...a.stations, ...b.stations], ps) * Math.max(Math.abs(alpha), Math.abs(beta), 1);
          c.stations.forEach((s, i) => expectClose(s[key], alpha * a.stations[i]![key] + beta * b.stations[i]![key], scale));
        }
        const scale = Math.max(ps.force, maxAbs([...a.reactions, ...b.reactions].flatMap((q) => [q.fy])));
        const mScale = Math.max(ps.moment, maxAbs([...a.reactions, ...b.reactions].flatMap((q) => [q.mz])) + scale);
        c.reactions.forEach((q) => {
          const qa = a.reactions.find((r) => r.node === q.node)!;
          const qb = b.reactions.find((r) => r.node === q.node)!;
          expectClose(q.fy, alpha * qa.fy + beta * qb.fy, scale);
          expectClose(q.mz, alpha * qa.mz + beta * qb.mz, mScale);
        });
        // Without patterned cases a combination's envelope equals its result (contract).
        const env = envelope(out, "C");
        env.stations.forEach((s, i) => {
          const r = c.stations[i]!;
          const mScaleSt = quantityScale("M", c.stations, ps);
          expectClose(s.Mmax, r.M, mScaleSt);
          expectClose(s.Mmin, r.M, mScaleSt);
        });
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);
});

describe("exact extremes", () => {
  it("report where they occur: the deflection (continuous) and, away from moment jumps, the moment there equal the extreme", () => {
    fc.assert(
      fc.property(twoCaseModel, ({ shape, loadsA }) => {
        const model = toModel(shape, [{ id: "A", category: "dead", loads: loadsA }]);
        const r = caseResult(solve(model) as SolveOutput, "A");
        const keys = ["uyMax", "uyMin", ...(loadsA.some((l) => l.type === "moment") ? [] : (["Mmax", "Mmin"] as const))] as const;
        const at = keys.map((k) => r.extremes[k].x);
        const again = caseResult(solve({ ...model, stations: at }) as SolveOutput, "A");
        const ps = combinedScale(model, [[loadsA, 1]]);
        // A support moment (fixed, guided, rotational spring) is a jump in M like an applied moment.
        const jumpsInM = new Set(shape.nodes.filter((n) => n.support && n.support.type !== "pinned" && (n.support.type !== "spring" || n.support.kr)).map((n) => n.x));
        keys.forEach((k, i) => {
          const key = k.startsWith("uy") ? "uy" : "M";
          if (key === "M" && jumpsInM.has(at[i]!)) return;
          const scale = Math.max(quantityScale(key, again.stations, ps), Math.abs(r.extremes[k].value));
          expectClose(again.stations.find((st) => st.x === at[i])![key], r.extremes[k].value, scale);
        });
      }),
      { numRuns: 80 },
    );
  }, TIMEOUT);

  it("are at least as large as every sampled station value", () => {
    fc.assert(
      fc.property(twoCaseModel, ({ shape, loadsA, stations }) => {
        const model = toModel(shape, [{ id: "A", category: "dead", loads: loadsA }], { stations });
        const r = caseResult(solve(model) as SolveOutput, "A");
        const ps = combinedScale(model, [[loadsA, 1]]);
        const pairs = [["Mmax", "Mmin", "M"], ["Vmax", "Vmin", "V"], ["uyMax", "uyMin", "uy"]] as const;
        for (const [hi, lo, key] of pairs) {
          const tol = 1e-9 * Math.max(quantityScale(key, r.stations, ps), Math.abs(r.extremes[hi].value), Math.abs(r.extremes[lo].value));
          for (const s of r.stations) {
            expect(s[key]).toBeLessThanOrEqual(r.extremes[hi].value + tol);
            expect(s[key]).toBeGreaterThanOrEqual(r.extremes[lo].value - tol);
          }
        }
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);
});
