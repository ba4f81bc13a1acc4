import { describe, expect, it } from "vitest";
import { bracePointsEvery } from "@spanwright/solver/design";
import { designSpans, resultCovers, type DesignModel } from "./designModel";

const pinned = { type: "pinned" };
const model = (nodes: DesignModel["nodes"]): DesignModel => ({ nodes, segments: [], loadCases: [] });

describe("designSpans", () => {
  it.each([
    {
      title: "two spans between three supports",
      nodes: [{ x: 0, support: pinned }, { x: 4, support: pinned }, { x: 10, support: pinned }],
      spans: [{ x1: 0, x2: 4, kind: "span" }, { x1: 4, x2: 10, kind: "span" }],
    },
    {
      title: "overhangs at both ends are cantilevers supported at their inner end",
      nodes: [{ x: 0 }, { x: 1, support: pinned }, { x: 6, support: pinned }, { x: 8 }],
      spans: [
        { x1: 0, x2: 1, kind: "cantilever", supportAt: "right" },
        { x1: 1, x2: 6, kind: "span" },
        { x1: 6, x2: 8, kind: "cantilever", supportAt: "left" },
      ],
    },
    {
      title: "an intermediate unsupported node does not split a span",
      nodes: [{ x: 0, support: { type: "fixed" } }, { x: 2 }, { x: 3 }],
      spans: [{ x1: 0, x2: 3, kind: "cantilever", supportAt: "left" }],
    },
  ])("$title", ({ nodes, spans }) => {
    expect(designSpans(model(nodes))).toMatchObject(spans);
  });
});

describe("bracePointsEvery", () => {
  it("places braces every Lb from each span start, never on the span end", () => {
    expect(bracePointsEvery([{ label: "1", x1: 0, x2: 6, kind: "span" }, { label: "2", x1: 6, x2: 10, kind: "span" }], 2)).toEqual([2, 4, 8]);
    expect(bracePointsEvery([{ label: "1", x1: 0, x2: 6, kind: "span" }], null)).toEqual([]);
  });
});

describe("resultCovers", () => {
  const result = { results: { D: { stations: [{ x: 0, V: 0, M: 0, uy: 0 }, { x: 3, V: 0, M: 0, uy: 0 }] } } };
  it("is true only when every id reports every required x", () => {
    expect(resultCovers(result, ["D"], [0, 3])).toBe(true);
    expect(resultCovers(result, ["D"], [0, 1.5, 3])).toBe(false);
    expect(resultCovers(result, ["D", "L"], [0])).toBe(false);
    expect(resultCovers(null, ["D"], [0])).toBe(false);
  });
});
