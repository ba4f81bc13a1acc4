import { describe, expect, it } from "vitest";
import type { BeamDocument } from "../model/BeamDocument";
import { applyPatch } from "../model/patch";
import { createLoadId, createNodeId, createSegmentId } from "../model/ids";
import { toExchange } from "../model/exchange";
import type { CommandResult } from "./DocChange";
import { addSpan, deleteNode, moveNode, setSpringStiffness, setSupport, splitSpan, toggleHinge } from "./nodeCommands";
import { editSegment, setSegmentLength } from "./segmentCommands";
import { addLoad, deleteLoad, editLoad, moveLoad } from "./loadCommands";
import { addCombination, addLoadCase, deleteLoadCase, editLoadCase, setCombinationFactor } from "./caseCommands";
import { setUnits } from "./documentCommands";
import { ids, twoSpanDocument } from "./testDocument";

function run(result: CommandResult, doc: BeamDocument): BeamDocument {
  if (!result.ok) throw new Error(`refused: ${result.error.message}`);
  return applyPatch(doc, result.change.patch);
}

const xs = (doc: BeamDocument) => doc.nodes.map((n) => n.x);
const loadsOf = (doc: BeamDocument, i: number) => doc.loadCases[i]!.loads;
const newNode = createNodeId("new");
const newSegment = createSegmentId("new");

describe("commands change the document as named", () => {
  it.each<[string, (d: BeamDocument) => CommandResult, (d: BeamDocument) => void]>([
    ["addSpan appends a pinned span copying the last section", (d) => addSpan(d, { length: 4, nodeId: newNode, segmentId: newSegment }), (d) => {
      expect(xs(d)).toEqual([0, 6, 12, 16]);
      expect(d.nodes[3]).toMatchObject({ id: newNode, support: { type: "pinned" } });
      expect(d.segments[2]).toEqual({ id: newSegment, E: 2e11, I: 8e-5 });
    }],
    ["addSpan at the start shifts nodes and loads right", (d) => addSpan(d, { length: 2, side: "start" }), (d) => {
      expect(xs(d)).toEqual([0, 2, 8, 14]);
      expect(loadsOf(d, 0)[1]).toMatchObject({ x: 11 });
      expect(loadsOf(d, 0)[0]).toMatchObject({ x1: 2, x2: 14 });
    }],
    ["splitSpan inserts an unsupported node and a copy of the segment", (d) => splitSpan(d, { segmentId: ids.s1, x: 8, nodeId: newNode }), (d) => {
      expect(xs(d)).toEqual([0, 6, 8, 12]);
      expect(d.nodes[2]).toMatchObject({ id: newNode, support: null, hinge: false });
      expect(d.segments.map((s) => s.id)[1]).toBe(ids.s1);
      expect(d.segments).toHaveLength(3);
    }],
    ["moveNode moves an interior node", (d) => moveNode(d, { nodeId: ids.n1, x: 5 }), (d) => expect(xs(d)).toEqual([0, 5, 12])],
    ["moveNode of the end node clips distributed loads", (d) => moveNode(d, { nodeId: ids.n2, x: 10 }), (d) => {
      expect(xs(d)).toEqual([0, 6, 10]);
      expect(loadsOf(d, 0)[0]).toMatchObject({ x1: 0, x2: 10, qy1: -3000, qy2: -3000 });
    }],
    ["setSupport sets a spring", (d) => setSupport(d, { nodeId: ids.n1, support: { type: "spring", ky: 5e7 } }), (d) =>
      expect(d.nodes[1]!.support).toEqual({ type: "spring", ky: 5e7 })],
    ["setSpringStiffness adds kr and keeps ky", (d) => setSpringStiffness(run(setSupport(d, { nodeId: ids.n1, support: { type: "spring", ky: 5e7 } }), d), { nodeId: ids.n1, kr: 1e6 }), (d) =>
      expect(d.nodes[1]!.support).toEqual({ type: "spring", ky: 5e7, kr: 1e6 })],
    ["setSpringStiffness null clears one stiffness", (d) => setSpringStiffness(run(setSupport(d, { nodeId: ids.n1, support: { type: "spring", ky: 5e7, kr: 1e6 } }), d), { nodeId: ids.n1, ky: null }), (d) =>
      expect(d.nodes[1]!.support).toEqual({ type: "spring", kr: 1e6 })],
    ["setSupport null removes the support", (d) => setSupport(d, { nodeId: ids.n2, support: null }), (d) => expect(d.nodes[2]!.support).toBeNull()],
    ["toggleHinge adds a hinge", (d) => toggleHinge(d, { nodeId: ids.n1 }), (d) => expect(d.nodes[1]!.hinge).toBe(true)],
    ["deleteNode merges the two segments and drops its settlements", (d) => deleteNode(d, { nodeId: ids.n1 }), (d) => {
      expect(xs(d)).toEqual([0, 12]);
      expect(d.segments.map((s) => s.id)).toEqual([ids.s0]);
      expect(loadsOf(d, 0).some((l) => l.type === "settlement")).toBe(false);
    }],
    ["editSegment changes I and adds shear properties", (d) => editSegment(d, { segmentId: ids.s0, props: { I: 1e-4, A: 0.01, G: 8e10, shearFactor: 5 / 6 } }), (d) =>
      expect(d.segments[0]).toEqual({ id: ids.s0, E: 2e11, I: 1e-4, A: 0.01, G: 8e10, shearFactor: 5 / 6 })],
    ["setSegmentLength moves nodes and loads to the right", (d) => setSegmentLength(d, { segmentId: ids.s0, length: 7 }), (d) => {
      expect(xs(d)).toEqual([0, 7, 13]);
      expect(loadsOf(d, 0)[1]).toMatchObject({ x: 10 });
      expect(loadsOf(d, 0)[0]).toMatchObject({ x1: 0, x2: 13 });
    }],
    ["addLoad adds to the case", (d) => addLoad(d, { caseId: ids.live, load: { id: createLoadId("p"), type: "moment", x: 3, mz: 5000 } }), (d) =>
      expect(loadsOf(d, 1)).toEqual([{ id: createLoadId("p"), type: "moment", x: 3, mz: 5000 }])],
    ["editLoad changes values keeping the id", (d) => editLoad(d, { loadId: ids.point, load: { id: ids.point, type: "point", x: 4, fy: -2000 } }), (d) =>
      expect(loadsOf(d, 0)[1]).toEqual({ id: ids.point, type: "point", x: 4, fy: -2000 })],
    ["editLoad with caseId moves the load to another case", (d) => editLoad(d, { loadId: ids.point, caseId: ids.live, load: { id: ids.point, type: "point", x: 9, fy: -1 } }), (d) => {
      expect(loadsOf(d, 0).map((l) => l.id)).not.toContain(ids.point);
      expect(loadsOf(d, 1).map((l) => l.id)).toEqual([ids.point]);
    }],
    ["moveLoad keeps a distributed load's length on the beam", (d) => moveLoad(d, { loadId: ids.udl, x: 3 }), (d) =>
      expect(loadsOf(d, 0)[0]).toMatchObject({ x1: 0, x2: 12 })],
    ["moveLoad clamps a point load to the beam", (d) => moveLoad(d, { loadId: ids.point, x: 20 }), (d) => expect(loadsOf(d, 0)[1]).toMatchObject({ x: 12 })],
    ["deleteLoad removes the load", (d) => deleteLoad(d, { loadId: ids.point }), (d) => expect(loadsOf(d, 0)).toHaveLength(2)],
    ["addLoadCase appends an empty case", (d) => addLoadCase(d, { name: "S", category: "snow" }), (d) =>
      expect(d.loadCases[2]).toMatchObject({ name: "S", category: "snow", pattern: false, loads: [] })],
    ["editLoadCase turns pattern loading off", (d) => editLoadCase(d, { caseId: ids.live, pattern: false }), (d) => expect(d.loadCases[1]!.pattern).toBe(false)],
    ["deleteLoadCase removes it from combinations", (d) => deleteLoadCase(d, { caseId: ids.live }), (d) => {
      expect(d.loadCases).toHaveLength(1);
      expect(d.combinations[0]!.factors).toEqual([{ caseId: ids.dead, factor: 1.2 }]);
    }],
    ["addCombination appends", (d) => addCombination(d, { name: "C2", factors: [{ caseId: ids.dead, factor: 1.4 }] }), (d) =>
      expect(toExchange(d).combinations?.[1]).toEqual({ id: "C2", factors: { D: 1.4 } })],
    ["setCombinationFactor changes one factor", (d) => setCombinationFactor(d, { combinationId: ids.combo, caseId: ids.live, factor: 1.0 }), (d) =>
      expect(toExchange(d).combinations?.[0]).toEqual({ id: "C1", factors: { D: 1.2, L: 1.0 } })],
    ["setCombinationFactor null drops the case", (d) => setCombinationFactor(d, { combinationId: ids.combo, caseId: ids.dead, factor: null }), (d) =>
      expect(toExchange(d).combinations?.[0]).toEqual({ id: "C1", factors: { L: 1.6 } })],
  ])("%s", (_title, command, check) => {
    const doc = twoSpanDocument();
    const before = structuredClone(doc);
    check(run(command(doc), doc));
    expect(doc).toEqual(before); // commands never mutate their input
  });

  it.each<[string, (d: BeamDocument) => CommandResult, string]>([
    ["moving a node past its neighbour", (d) => moveNode(d, { nodeId: ids.n1, x: 13 }), "invalid-position"],
    ["shortening the beam under a point load", (d) => moveNode(d, { nodeId: ids.n2, x: 8 }), "invalid-position"],
    ["splitting outside the segment", (d) => splitSpan(d, { segmentId: ids.s0, x: 7 }), "invalid-position"],
    ["a zero-length span", (d) => addSpan(d, { length: 0 }), "invalid-value"],
    ["a spring with no stiffness", (d) => setSupport(d, { nodeId: ids.n0, support: { type: "spring", ky: 0 } }), "invalid-value"],
    ["clearing the only spring stiffness", (d) => setSpringStiffness(run(setSupport(d, { nodeId: ids.n1, support: { type: "spring", ky: 5e7 } }), d), { nodeId: ids.n1, ky: null }), "invalid-value"],
    ["a negative second moment of area", (d) => editSegment(d, { segmentId: ids.s0, props: { I: -1 } }), "invalid-value"],
    ["a load off the beam", (d) => addLoad(d, { caseId: ids.dead, load: { id: createLoadId(), type: "point", x: 13, fy: -1 } }), "invalid-value"],
    ["a distributed load ending before it starts", (d) => addLoad(d, { caseId: ids.dead, load: { id: createLoadId(), type: "distributed", x1: 5, x2: 4, qy1: -1, qy2: -1 } }), "invalid-value"],
    ["a case named like a combination", (d) => addLoadCase(d, { name: "C1", category: "dead" }), "duplicate-name"],
    ["deleting the last span", (d) => deleteNode(run(deleteNode(d, { nodeId: ids.n1 }), d), { nodeId: ids.n0 }), "last-span"],
    ["editing a deleted load", (d) => deleteLoad(d, { loadId: createLoadId("gone") }), "not-found"],
  ])("refuses %s", (_title, command, code) => {
    const result = command(twoSpanDocument());
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.code).toBe(code);
  });

  it("declares the unit switch untracked and edits undoable", () => {
    const doc = twoSpanDocument();
    const units = setUnits(doc, { units: "us" });
    const hinge = toggleHinge(doc, { nodeId: ids.n1 });
    expect(units.ok && units.change.capture).toBe("untracked");
    expect(hinge.ok && hinge.change.capture).toBe("undoable");
  });

  it("keeps ids of untouched records across an insert, so selections survive", () => {
    const doc = twoSpanDocument();
    const after = run(splitSpan(doc, { segmentId: ids.s0, x: 3 }), doc);
    expect(after.nodes.map((n) => n.id)).toEqual([ids.n0, expect.any(String), ids.n1, ids.n2]);
    const settlement = after.loadCases[0]!.loads[2]!;
    expect(settlement.type === "settlement" && settlement.node).toBe(ids.n1);
    expect(toExchange(after).loadCases[0]!.loads[2]).toEqual({ type: "settlement", node: 2, uy: -0.005 });
  });
});
