import { describe, expect, it } from "vitest";
import { fromExchange, toExchange, type ExchangeModel } from "./exchange";
import { createTemplate, type TemplateId } from "./templates";
import { isCaseId, isLoadId, isNodeId, isSegmentId } from "./ids";

// The contract's own example model (shared/contract/exchange-format.md), with theory explicit.
const contractExample: ExchangeModel = {
  format: "spanwright.beam/1",
  title: "Level 2 grid C transfer beam",
  theory: "euler-bernoulli",
  nodes: [
    { x: 0, support: { type: "pinned" } },
    { x: 6.0, support: { type: "pinned" } },
    { x: 8.5, hinge: true },
    { x: 12.0, support: { type: "spring", ky: 5.0e7 } },
  ],
  segments: [
    { E: 2.0e11, I: 8.0e-5, A: 7.6e-3, G: 7.7e10, shearFactor: 0.45 },
    { E: 2.0e11, I: 8.0e-5 },
    { E: 2.0e11, I: 8.0e-5 },
  ],
  loadCases: [
    {
      id: "D",
      category: "dead",
      loads: [
        { type: "distributed", x1: 0, x2: 12.0, qy1: -3000, qy2: -3000 },
        { type: "point", x: 3.0, fy: -12000 },
      ],
    },
    { id: "L", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: 12.0, qy1: -5000, qy2: -5000 }] },
    { id: "S1", category: "settlement", loads: [{ type: "settlement", node: 1, uy: -0.005 }] },
  ],
  combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }],
  stations: [1.5, 4.0, 10.0],
};

describe("exchange conversion", () => {
  it("round-trips the contract example exactly", () => {
    const result = fromExchange(contractExample);
    expect(result.ok).toBe(true);
    if (result.ok) expect(toExchange(result.doc)).toEqual(contractExample);
  });

  it("gives every record a typed id and refers to nodes and cases by id", () => {
    const result = fromExchange(contractExample);
    if (!result.ok) throw new Error("expected ok");
    const { doc } = result;
    expect(doc.nodes.every((n) => isNodeId(n.id))).toBe(true);
    expect(doc.segments.every((s) => isSegmentId(s.id))).toBe(true);
    expect(doc.loadCases.every((c) => isCaseId(c.id) && c.loads.every((l) => isLoadId(l.id)))).toBe(true);
    const settlement = doc.loadCases[2]!.loads[0]!;
    expect(settlement.type === "settlement" && settlement.node).toBe(doc.nodes[1]!.id);
    expect(doc.combinations[0]!.factors.map((f) => f.caseId)).toEqual([doc.loadCases[0]!.id, doc.loadCases[1]!.id]);
  });

  it("round-trips a document through the exchange format keeping every value", () => {
    const doc = createTemplate("three-spans-overhang", "us");
    const again = fromExchange(toExchange(doc), "us");
    if (!again.ok) throw new Error("expected ok");
    expect(toExchange(again.doc)).toEqual(toExchange(doc));
  });

  it.each<[string, ExchangeModel, string]>([
    ["wrong format", { ...contractExample, format: "x" as "spanwright.beam/1" }, "format"],
    ["segment count", { ...contractExample, segments: contractExample.segments.slice(1) }, "segments"],
    [
      "missing settlement node",
      { ...contractExample, loadCases: [{ id: "S", category: "settlement", loads: [{ type: "settlement", node: 9, uy: -0.01 }] }], combinations: [] },
      "loadCases[0].loads[0].node",
    ],
    ["unknown factor name", { ...contractExample, combinations: [{ id: "C", factors: { Q: 1 } }] }, "combinations[0].factors.Q"],
  ])("rejects %s naming where", (_title, model, where) => {
    const result = fromExchange(model);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.where).toBe(where);
  });

  it.each<TemplateId>(["simple-span", "two-equal-spans", "three-spans-overhang", "cantilever"])(
    "template %s is a structurally complete model",
    (template) => {
      const model = toExchange(createTemplate(template, "si"));
      expect(model.segments).toHaveLength(model.nodes.length - 1);
      expect(model.nodes.some((n) => n.support)).toBe(true);
    },
  );
});
