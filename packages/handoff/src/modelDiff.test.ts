import { describe, expect, it } from "vitest";
import type { BeamModel } from "./exchange.js";
import { diffModels } from "./modelDiff.js";
import { summariseModelDiff } from "./modelDiffSummary.js";
import { listSpans } from "./spans.js";
import { twoSpanModel } from "./testing/twoSpanBeam.js";

const base = twoSpanModel();

function edit(change: (m: BeamModel) => void): BeamModel {
  const copy = structuredClone(base);
  change(copy);
  return copy;
}

describe("listSpans", () => {
  it("counts overhangs as spans, as pattern loading does", () => {
    const m = edit((m) => {
      m.nodes = [{ x: 0 }, { x: 1.5, support: { type: "pinned" } }, { x: 7.5, support: { type: "pinned" } }, { x: 9 }];
    });
    expect(listSpans(m).map((s) => [s.number, s.x1, s.x2, s.overhang])).toEqual([
      [1, 0, 1.5, true],
      [2, 1.5, 7.5, false],
      [3, 7.5, 9, true],
    ]);
  });
});

describe("summariseModelDiff", () => {
  it.each<[string, (m: BeamModel) => void, string[]]>([
    ["no change", () => undefined, []],
    [
      "a distributed load added on span 2",
      (m) => m.loadCases[1]!.loads.push({ type: "distributed", x1: 6, x2: 12, qy1: -2000, qy2: -2000 }),
      ["L: added -2 kN/m on span 2 (x = 6..12 m)"],
    ],
    [
      "a load value changed",
      (m) => {
        m.loadCases[0]!.loads[0] = { type: "distributed", x1: 0, x2: 12, qy1: -3500, qy2: -3500 };
      },
      ["D: -3 kN/m -> -3.5 kN/m on spans 1-2 (x = 0..12 m)"],
    ],
    [
      "a point load removed",
      (m) => {
        m.loadCases[2]!.loads = [];
      },
      ["W: removed 4 kN/m on spans 1-2 (x = 0..12 m)"],
    ],
    [
      "a support became a spring",
      (m) => {
        m.nodes[2]!.support = { type: "spring", ky: 5e7 };
      },
      ["support at x = 12 m became a spring"],
    ],
    [
      "a span lengthened",
      (m) => {
        m.nodes[2]!.x = 12.5;
      },
      ["span 2 length 6 m -> 6.5 m"],
    ],
    [
      "a load case added",
      (m) => m.loadCases.push({ id: "S", category: "snow", loads: [{ type: "point", x: 3, fy: -12000 }] }),
      ["load case S added (snow)", "S: added -12 kN at x = 3 m (span 1)"],
    ],
    [
      "combination factors changed",
      (m) => {
        m.combinations[1]!.factors = { D: 0.9, W: 1.6 };
      },
      ["combination C2 factors changed (W 1 -> 1.6)"],
    ],
    [
      "a hinge node added",
      (m) => {
        m.nodes.splice(2, 0, { x: 8.5, hinge: true });
        m.segments.push({ E: 2.0e11, I: 8.0e-5 });
      },
      ["node added at x = 8.5 m with a hinge"],
    ],
    [
      "a heavier section on span 2",
      (m) => {
        m.segments[1] = { E: 2.0e11, I: 1.0e-4 };
      },
      ["section x = 6..12 m: I 80 10⁶ mm⁴ -> 100 10⁶ mm⁴"],
    ],
  ])("describes %s", (_name, change, lines) => {
    expect(summariseModelDiff(diffModels(base, edit(change)), "si")).toEqual(lines);
  });

  it("writes US customary units when the project uses them", () => {
    const after = edit((m) => m.loadCases[1]!.loads.push({ type: "point", x: 0.3048 * 10, fy: -4448.2216152605 * 3 }));
    expect(summariseModelDiff(diffModels(base, after), "us")).toEqual(["L: added -3 kip at x = 10 ft (span 1)"]);
  });
});

describe("diffModels", () => {
  it("returns structured changes for the compare view", () => {
    const after = edit((m) => {
      m.loadCases = m.loadCases.filter((c) => c.id !== "W");
      m.combinations = [m.combinations[0]!];
    });
    expect(diffModels(base, after).changes.map((c) => c.kind)).toEqual(["case-removed", "combination-removed"]);
  });

  it("finds no change in a model whose keys come back reordered (as from PostgreSQL jsonb)", () => {
    const reorder = (value: unknown): unknown =>
      Array.isArray(value)
        ? value.map(reorder)
        : value && typeof value === "object"
          ? Object.fromEntries(Object.entries(value).reverse().map(([k, v]) => [k, reorder(v)]))
          : value;
    expect(diffModels(base, reorder(base) as BeamModel).changes).toEqual([]);
  });

  it("does not mutate its inputs", () => {
    const before = structuredClone(base);
    const after = edit((m) => m.loadCases[0]!.loads.push({ type: "moment", x: 1, mz: 5 }));
    diffModels(before, after);
    expect(before).toEqual(base);
  });
});
