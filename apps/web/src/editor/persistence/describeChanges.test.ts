import { describe, expect, it } from "vitest";
import { toExchange } from "../model/exchange";
import { createTemplate } from "../model/templates";
import { describeChanges } from "./describeChanges";

describe("describeChanges", () => {
  const base = toExchange(createTemplate("two-equal-spans", "si"));

  it("finds nothing between equal models", () => {
    expect(describeChanges(base, structuredClone(base), "si")).toEqual([]);
  });

  it("ignores the order of object keys, which the server may change", () => {
    const reordered = JSON.parse(JSON.stringify(base, (_k, v: unknown) => (v && typeof v === "object" && !Array.isArray(v) ? Object.fromEntries(Object.entries(v).reverse()) : v)));
    expect(describeChanges(base, reordered, "si")).toEqual([]);
  });

  it.each<[string, (m: typeof base) => void, string]>([
    ["a moved node", (m) => void (m.nodes[1]!.x = 6.5), "Node 2 moved 6 m → 6.5 m"],
    ["a new hinge", (m) => void (m.nodes[1]!.hinge = true), "Node 2 hinge added"],
    ["a support change", (m) => void (m.nodes[2]!.support = { type: "fixed" }), "Node 3 support pinned → fixed"],
    ["a new case", (m) => void m.loadCases.push({ id: "S", category: "snow", loads: [] }), "Load case S added"],
    ["changed loads", (m) => void m.loadCases[0]!.loads.push({ type: "point", x: 3, fy: -1000 }), "Load case D: loads changed (1 → 2)"],
    ["changed factors", (m) => void (m.combinations![0]!.factors.D = 1.4), "Combination 1.2D+1.6L: factors changed"],
  ])("names %s", (_t, change, sentence) => {
    const other = structuredClone(base);
    change(other);
    expect(describeChanges(base, other, "si")).toContain(sentence);
  });
});
