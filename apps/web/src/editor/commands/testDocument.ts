import type { BeamDocument } from "../model/BeamDocument";
import { createCaseId, createCombinationId, createLoadId, createNodeId, createSegmentId } from "../model/ids";

/** A small fixed document for command tests: two 6 m spans, a dead and a live case. */
export const ids = {
  n0: createNodeId("a"),
  n1: createNodeId("b"),
  n2: createNodeId("c"),
  s0: createSegmentId("a"),
  s1: createSegmentId("b"),
  dead: createCaseId("dead"),
  live: createCaseId("live"),
  udl: createLoadId("udl"),
  point: createLoadId("point"),
  settle: createLoadId("settle"),
  combo: createCombinationId("c1"),
};

export function twoSpanDocument(): BeamDocument {
  return {
    title: "Test beam",
    theory: "euler-bernoulli",
    units: "si",
    stations: null,
    nodes: [
      { id: ids.n0, x: 0, support: { type: "pinned" }, hinge: false },
      { id: ids.n1, x: 6, support: { type: "pinned" }, hinge: false },
      { id: ids.n2, x: 12, support: { type: "pinned" }, hinge: false },
    ],
    segments: [
      { id: ids.s0, E: 2e11, I: 8e-5 },
      { id: ids.s1, E: 2e11, I: 8e-5 },
    ],
    loadCases: [
      {
        id: ids.dead,
        name: "D",
        category: "dead",
        pattern: false,
        loads: [
          { id: ids.udl, type: "distributed", x1: 0, x2: 12, qy1: -3000, qy2: -3000 },
          { id: ids.point, type: "point", x: 9, fy: -10000 },
          { id: ids.settle, type: "settlement", node: ids.n1, uy: -0.005 },
        ],
      },
      { id: ids.live, name: "L", category: "live", pattern: true, loads: [] },
    ],
    combinations: [{ id: ids.combo, name: "C1", factors: [{ caseId: ids.dead, factor: 1.2 }, { caseId: ids.live, factor: 1.6 }] }],
  };
}
