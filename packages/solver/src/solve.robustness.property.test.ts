/**
 * `solve(model: unknown)` is the boundary where untrusted JSON (files, HTTP bodies) enters the
 * engine: whatever it is given, it either returns a result or throws a `SolverError` with one of
 * the contract's codes, never a TypeError or RangeError from deeper in.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SolverError, solve } from "./index";
import { beamShapeArb, loadsArb, toModel } from "./testing/arbitraries";
import { beam, type BeamModel, type LoadSpec, type NodeSpec } from "./testing/exchange";
import { isStable } from "./testing/stability";

/** Library calls have no size limit, so only these two codes may appear (exchange format). */
const LIBRARY_CODES = ["invalid-model", "mechanism"];

function expectResultOrSolverError(input: unknown): void {
  let out: unknown;
  try {
    out = solve(input);
  } catch (e) {
    if (!(e instanceof SolverError)) expect.fail(`threw ${String(e)} for ${describeInput(input)}`);
    expect(LIBRARY_CODES).toContain(e.code);
    expect(typeof e.message).toBe("string");
    expect(e.message.length).toBeGreaterThan(0);
    return;
  }
  expect((out as { format?: unknown }).format).toBe("spanwright.result/1");
}

function describeInput(input: unknown): string {
  try {
    return String(JSON.stringify(input)).slice(0, 300);
  } catch {
    return String(input);
  }
}

/** Property runs are CPU-bound; the machine is shared, so allow well beyond the usual time. */
const TIMEOUT = 60_000;

describe("solve on arbitrary input", () => {
  it("throws only SolverError for any JavaScript value", () => {
    fc.assert(fc.property(fc.anything({ withNullPrototype: true, withBigInt: true, withDate: true, withMap: true, withSet: true }), expectResultOrSolverError), { numRuns: 2000 });
  }, TIMEOUT);

  it("throws only SolverError for any JSON value", () => {
    fc.assert(fc.property(fc.jsonValue(), expectResultOrSolverError), { numRuns: 2000 });
  }, TIMEOUT);

  it("throws only SolverError for a valid model with one value replaced or removed", () => {
    const validModel = beamShapeArb().chain((shape) =>
      loadsArb(shape.nodes, { allowSettlement: true }).map((loads) =>
        toModel(shape, [{ id: "D", category: "dead", loads }, { id: "L", category: "live", pattern: true, loads: loads.filter((l) => l.type !== "settlement") }], {
          combinations: [{ id: "C", factors: { D: 1.2, L: 1.6 } }],
          stations: [shape.nodes[0]!.x],
        }),
      ),
    );
    const arb = fc.record({ model: validModel, pick: fc.nat(), replacement: fc.option(fc.jsonValue(), { nil: undefined }) });
    fc.assert(
      fc.property(arb, ({ model, pick, replacement }) => {
        const copy = JSON.parse(JSON.stringify(model)) as unknown;
        const paths = pathsOf(copy);
        const path = paths[pick % paths.length]!;
        setAt(copy, path, replacement);
        expectResultOrSolverError(copy);
      }),
      { numRuns: 1000 },
    );
  }, TIMEOUT);
});

type Key = string | number;

function pathsOf(value: unknown, prefix: Key[] = []): Key[][] {
  if (value === null || typeof value !== "object") return [prefix];
  const entries: [Key, unknown][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value);
  return [prefix, ...entries.flatMap(([k, v]) => pathsOf(v, [...prefix, k]))].filter((p) => p.length > 0);
}

function setAt(root: unknown, path: Key[], replacement: unknown): void {
  let target = root as Record<Key, unknown>;
  for (const key of path.slice(0, -1)) target = target[key] as Record<Key, unknown>;
  const last = path[path.length - 1]!;
  if (replacement === undefined && !Array.isArray(target)) delete target[last];
  else target[last] = replacement ?? null;
}

describe("mechanism detection", () => {
  it("reports mechanism exactly when an independent rigid-body check finds the beam unstable", () => {
    // Random hinges (where the contract allows them) and removed supports, with no stability filter.
    const arb = fc.record({
      shape: beamShapeArb(),
      hinges: fc.array(fc.boolean(), { minLength: 20, maxLength: 20 }),
      drops: fc.array(fc.integer({ min: 0, max: 5 }), { minLength: 20, maxLength: 20 }),
    });
    fc.assert(
      fc.property(arb, ({ shape, hinges, drops }) => {
        const nodes: NodeSpec[] = shape.nodes.map((n, i) => {
          const support = drops[i] === 0 ? undefined : n.support;
          const s = support;
          const hingeAllowed = i > 0 && i < shape.nodes.length - 1 && (!s || s.type === "pinned" || (s.type === "spring" && !s.kr));
          return { x: n.x, ...(support ? { support } : {}), ...(hingeAllowed && hinges[i] ? { hinge: true } : {}) };
        });
        const model = toModel({ ...shape, nodes }, [{ id: "A", category: "dead", loads: [{ type: "point", x: nodes[1]!.x, fy: -1000 }] }]);
        const stable = isStable(nodes);
        let code: string | null = null;
        try {
          solve(model);
        } catch (e) {
          if (!(e instanceof SolverError)) throw e;
          code = e.code;
        }
        expect(code, JSON.stringify(nodes)).toBe(stable ? null : "mechanism");
      }),
      { numRuns: 400 },
    );
  }, TIMEOUT);
});

describe("mechanism fixtures found by the property above", () => {
  // Both are mechanisms by inspection (counted in the comments); a solve that returns instead
  // gives displacements of ~1e8 m and reactions that do not balance the load.
  it("a Timoshenko beam pinned at 0 and 2.5 m with a hinge at 0.125 m (three collinear hinges: 0, 0.125, 2.5)", () => {
    const seg = (I: number) => ({ E: 2.0e11, I, A: 0.0192, G: 7.7e10, shearFactor: 5 / 6 });
    const model = {
      format: "spanwright.beam/1",
      theory: "timoshenko",
      nodes: [{ x: 0, support: { type: "pinned" } }, { x: 0.125, hinge: true }, { x: 2.5, support: { type: "pinned" } }, { x: 8 }],
      segments: [seg(0.00014199999999999998), seg(0.000042), seg(0.000009999999999999999)],
      loadCases: [{ id: "A", category: "dead", loads: [{ type: "point", x: 1, fy: -1000 }] }],
    };
    expect(() => solve(model)).toThrow(expect.objectContaining({ code: "mechanism" }));
  });

  it("a vertical spring, hinge, guided support, hinge, pin: the first two parts swing together", () => {
    // Parts [0, 0.3375] on the spring (uy only), [0.3375, 3.075] on the guide (rz only),
    // [3.075, 14.5] on the pin: 5 restraints for 6 rigid-body freedoms.
    const EI = [[2e11, 0.000011], [1.2e10, 0.001722], [1.2e10, 0.000397], [1.2e10, 0.000936], [2e11, 0.000025], [1.2e10, 0.001725], [2e11, 0.00014], [2e11, 0.000095]];
    const model = {
      format: "spanwright.beam/1",
      nodes: [
        { x: 0, support: { type: "spring", ky: 1.0e7 } },
        { x: 0.3375, hinge: true },
        { x: 0.5625 },
        { x: 2.25, support: { type: "guided" } },
        { x: 3.075, hinge: true },
        { x: 7.75, support: { type: "pinned" } },
        { x: 8.0875 },
        { x: 9.4375 },
        { x: 14.5 },
      ],
      segments: EI.map(([E, I]) => ({ E, I })),
      loadCases: [{ id: "A", category: "dead", loads: [{ type: "point", x: 0.3375, fy: -1000 }] }],
    };
    expect(() => solve(model)).toThrow(expect.objectContaining({ code: "mechanism" }));
  });
});

describe("error codes of the exchange format", () => {
  it("invalid-model names the offending path", () => {
    const model = beam([{ x: 0, support: { type: "pinned" } }, { x: 3 }, { x: 6 }, { x: 9, support: { type: "pinned" } }], [{ type: "point", x: 4, fy: -1000 }]);
    model.segments[2] = { E: 2.0e11, I: -1.0e-4 };
    expect(() => solve(model)).toThrow(SolverError);
    try {
      solve(model);
    } catch (e) {
      expect((e as SolverError).code).toBe("invalid-model");
      expect((e as SolverError).where).toBe("segments[2].I");
    }
  });

  type Edit = (m: BeamModel) => void;
  const point = (x: number): LoadSpec => ({ type: "point", x, fy: -1000 });
  // Each row breaks one rule of the exchange format; `where` must lead to the offending path.
  it.each<[string, Edit, string]>([
    ["a load outside the beam", (m) => void (m.loadCases[0]!.loads[0] = point(100)), "loadCases[0].loads[0]"],
    ["a distributed load starting before the beam", (m) => void m.loadCases[0]!.loads.push({ type: "distributed", x1: -1, x2: 2, qy1: -1, qy2: -1 }), "loadCases[0].loads[1]"],
    ["a distributed load with x1 = x2", (m) => void m.loadCases[0]!.loads.push({ type: "distributed", x1: 2, x2: 2, qy1: -1, qy2: -1 }), "loadCases[0].loads[1]"],
    ["a settlement of an unsupported node", (m) => void m.loadCases[0]!.loads.push({ type: "settlement", node: 1, uy: -0.01 }), "loadCases[0].loads[1]"],
    ["a settlement of a node that does not exist", (m) => void m.loadCases[0]!.loads.push({ type: "settlement", node: 9, uy: -0.01 }), "loadCases[0].loads[1]"],
    ["a hinge on a fixed support", (m) => void (m.nodes[1] = { x: 3, support: { type: "fixed" }, hinge: true }), "nodes[1]"],
    ["a hinge at an end node", (m) => void (m.nodes[2]!.hinge = true), "nodes[2]"],
    ["a combination id already used by a case", (m) => void (m.combinations = [{ id: "D", factors: { D: 1 } }]), "combinations[0]"],
    ["a combination of an unknown case", (m) => void (m.combinations = [{ id: "C", factors: { X: 1 } }]), "combinations[0]"],
    ["one segment too few", (m) => void m.segments.pop(), "segments"],
    ["node x not increasing", (m) => void (m.nodes[1]!.x = 7), "nodes["],
    ["Timoshenko theory without A, G, shearFactor", (m) => void (m.theory = "timoshenko"), "segments[0]"],
    ["a spring with no stiffness", (m) => void (m.nodes[1]!.support = { type: "spring", ky: 0, kr: 0 }), "nodes[1]"],
    ["a zero modulus", (m) => void (m.segments[0]!.E = 0), "segments[0].E"],
    ["another format version", (m) => void ((m as { format: string }).format = "spanwright.beam/2"), "format"],
    ["an unknown load category", (m) => void (m.loadCases[0]!.category = "snowish"), "loadCases[0].category"],
    ["a station outside the beam", (m) => void (m.stations = [7]), "stations[0]"],
  ])("invalid-model for %s", (_name, edit, wherePrefix) => {
    const model = beam([{ x: 0, support: { type: "pinned" } }, { x: 3 }, { x: 6, support: { type: "pinned" } }], [point(2)]);
    model.loadCases[0]!.id = "D";
    edit(model);
    expect(() => solve(model)).toThrow(SolverError);
    try {
      solve(model);
    } catch (e) {
      expect((e as SolverError).code).toBe("invalid-model");
      expect((e as SolverError).where.startsWith(wherePrefix), `where = ${(e as SolverError).where}`).toBe(true);
      expect((e as SolverError).message.length).toBeGreaterThan(0);
    }
  });

  it("mechanism names the free part of a beam that can swing about a hinge", () => {
    // Two pins and a hinge between them: the two halves fold about the hinge at x = 4 m.
    const model = beam([{ x: 0, support: { type: "pinned" } }, { x: 4, hinge: true }, { x: 10, support: { type: "pinned" } }], [{ type: "point", x: 2, fy: -1000 }]);
    try {
      solve(model);
      expect.fail("a mechanism was solved");
    } catch (e) {
      expect(e).toBeInstanceOf(SolverError);
      expect((e as SolverError).code).toBe("mechanism");
      expect((e as SolverError).message).toMatch(/4/);
      expect((e as SolverError).where.length).toBeGreaterThan(0);
    }
  });

  it("mechanism is reported for a beam with a single pinned support", () => {
    const model = beam([{ x: 0, support: { type: "pinned" } }, { x: 5 }], [{ type: "point", x: 5, fy: -1000 }]);
    expect(() => solve(model)).toThrow(expect.objectContaining({ code: "mechanism" }));
  });
});
