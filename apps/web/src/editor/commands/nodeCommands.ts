import type { BeamDocument, BeamNode, Load, LoadCase, Segment, Support } from "../model/BeamDocument";
import { createNodeId, createSegmentId, type NodeId, type SegmentId } from "../model/ids";
import { changed, isFiniteNumber, MIN_NODE_GAP, refused, type CommandResult } from "./DocChange";
import { clipLoadsToRange, shiftLoads } from "./loadGeometry";

/** Adds a span of `length` m at the right end (or the left end, shifting the beam right so it keeps
 * starting at the same x). The new end node is pinned; the new segment copies its neighbour's section. */
export function addSpan(
  doc: BeamDocument,
  args: { length: number; side?: "start" | "end"; nodeId?: NodeId; segmentId?: SegmentId },
): CommandResult {
  if (!isFiniteNumber(args.length) || args.length < MIN_NODE_GAP) return refused("invalid-value", "A span must be longer than 1 mm.");
  const first = doc.nodes[0];
  const last = doc.nodes[doc.nodes.length - 1];
  if (!first || !last) return refused("not-found", "The beam has no nodes.");
  const nodeId = args.nodeId ?? createNodeId();
  const segmentId = args.segmentId ?? createSegmentId();
  if (args.side === "start") {
    const section = doc.segments[0];
    const shifted = shiftDocument(doc, args.length);
    const node: BeamNode = { id: nodeId, x: first.x, support: { type: "pinned" }, hinge: false };
    const segment: Segment = { ...(section ?? defaultSection), id: segmentId };
    return changed(doc, "Add span", {
      nodes: [node, ...shifted.nodes],
      segments: [segment, ...doc.segments],
      loadCases: shifted.loadCases,
      stations: shifted.stations,
    });
  }
  const section = doc.segments[doc.segments.length - 1];
  const node: BeamNode = { id: nodeId, x: last.x + args.length, support: { type: "pinned" }, hinge: false };
  return changed(doc, "Add span", {
    nodes: [...doc.nodes, node],
    segments: [...doc.segments, { ...(section ?? defaultSection), id: segmentId }],
  });
}

/** Steel-like default section used only when a beam has no segment to copy (E in Pa, I in m⁴). */
export const defaultSection: Omit<Segment, "id"> = { E: 2.0e11, I: 8.0e-5 };

function shiftDocument(doc: BeamDocument, dx: number): Pick<BeamDocument, "nodes" | "loadCases" | "stations"> {
  return {
    nodes: doc.nodes.map((n) => ({ ...n, x: n.x + dx })),
    loadCases: doc.loadCases.map((c) => ({ ...c, loads: shiftLoads(c.loads, dx, -Infinity) })),
    stations: doc.stations ? doc.stations.map((s) => s + dx) : null,
  };
}

/** Inserts a node inside a segment; both halves keep the segment's section, the left half its id. */
export function splitSpan(
  doc: BeamDocument,
  args: { segmentId: SegmentId; x: number; nodeId?: NodeId; newSegmentId?: SegmentId },
): CommandResult {
  const index = doc.segments.findIndex((s) => s.id === args.segmentId);
  const segment = doc.segments[index];
  const left = doc.nodes[index];
  const right = doc.nodes[index + 1];
  if (!segment || !left || !right) return refused("not-found", "That segment no longer exists.");
  if (!isFiniteNumber(args.x) || args.x < left.x + MIN_NODE_GAP || args.x > right.x - MIN_NODE_GAP) {
    return refused("invalid-position", "The new node must lie inside the segment.");
  }
  const node: BeamNode = { id: args.nodeId ?? createNodeId(), x: args.x, support: null, hinge: false };
  const copy: Segment = { ...segment, id: args.newSegmentId ?? createSegmentId() };
  return changed(doc, "Split span", {
    nodes: [...doc.nodes.slice(0, index + 1), node, ...doc.nodes.slice(index + 1)],
    segments: [...doc.segments.slice(0, index + 1), copy, ...doc.segments.slice(index + 1)],
  });
}

/** Moves a node between its neighbours. Moving an end node changes the beam's length; loads that
 * would fall outside the beam are clipped (distributed) or refused (point loads, moments). */
export function moveNode(doc: BeamDocument, args: { nodeId: NodeId; x: number }): CommandResult {
  const index = doc.nodes.findIndex((n) => n.id === args.nodeId);
  const node = doc.nodes[index];
  if (!node) return refused("not-found", "That node no longer exists.");
  if (!isFiniteNumber(args.x)) return refused("invalid-value", "Enter a position.");
  const prev = doc.nodes[index - 1];
  const next = doc.nodes[index + 1];
  if ((prev && args.x < prev.x + MIN_NODE_GAP) || (next && args.x > next.x - MIN_NODE_GAP)) {
    return refused("invalid-position", "A node cannot pass its neighbours.");
  }
  if (args.x === node.x) return changed(doc, "Move node", {});
  const nodes = doc.nodes.map((n) => (n.id === node.id ? { ...n, x: args.x } : n));
  const isEnd = index === 0 || index === doc.nodes.length - 1;
  if (!isEnd) return changed(doc, "Move node", { nodes });
  const x0 = nodes[0]!.x;
  const x1 = nodes[nodes.length - 1]!.x;
  const clipped = clipCases(doc.loadCases, x0, x1);
  if (!clipped) return refused("invalid-position", "A point load or moment would fall off the beam.");
  return changed(doc, "Move node", { nodes, loadCases: clipped });
}

function clipCases(cases: readonly LoadCase[], x0: number, x1: number): readonly LoadCase[] | null {
  const result: LoadCase[] = [];
  for (const c of cases) {
    const loads = clipLoadsToRange(c.loads, x0, x1);
    if (!loads) return null;
    result.push(loads === c.loads ? c : { ...c, loads });
  }
  return result.every((c, i) => c === cases[i]) ? cases : result;
}

export function setSupport(doc: BeamDocument, args: { nodeId: NodeId; support: Support | null }): CommandResult {
  if (!doc.nodes.some((n) => n.id === args.nodeId)) return refused("not-found", "That node no longer exists.");
  const s = args.support;
  if (s?.type === "spring") {
    const ky = s.ky ?? 0;
    const kr = s.kr ?? 0;
    if (!(ky >= 0 && kr >= 0 && ky + kr > 0)) return refused("invalid-value", "A spring needs a stiffness above zero.");
  }
  return changed(doc, s ? "Set support" : "Remove support", {
    nodes: doc.nodes.map((n) => (n.id === args.nodeId ? { ...n, support: s } : n)),
  });
}

/** Sets or clears (null) a spring's stiffnesses, ky in N/m and kr in N·m/rad, making the node's
 * support a spring if it was not one. At least one stiffness must stay above zero. */
export function setSpringStiffness(doc: BeamDocument, args: { nodeId: NodeId; ky?: number | null; kr?: number | null }): CommandResult {
  const node = doc.nodes.find((n) => n.id === args.nodeId);
  if (!node) return refused("not-found", "That node no longer exists.");
  const current = node.support?.type === "spring" ? node.support : { type: "spring" as const };
  const pick = (next: number | null | undefined, old: number | undefined) => (next === undefined ? old : next === null ? undefined : next);
  const ky = pick(args.ky, current.ky);
  const kr = pick(args.kr, current.kr);
  const support: Support = { type: "spring", ...(ky !== undefined ? { ky } : {}), ...(kr !== undefined ? { kr } : {}) };
  return setSupport(doc, { nodeId: node.id, support });
}

export function toggleHinge(doc: BeamDocument, args: { nodeId: NodeId }): CommandResult {
  if (!doc.nodes.some((n) => n.id === args.nodeId)) return refused("not-found", "That node no longer exists.");
  return changed(doc, "Toggle hinge", {
    nodes: doc.nodes.map((n) => (n.id === args.nodeId ? { ...n, hinge: !n.hinge } : n)),
  });
}

/** Removes a node. An interior node merges its two segments (the left one's section stays); an end
 * node takes its segment with it and shortens the beam. Settlements at the node go too. */
export function deleteNode(doc: BeamDocument, args: { nodeId: NodeId }): CommandResult {
  const index = doc.nodes.findIndex((n) => n.id === args.nodeId);
  if (index < 0) return refused("not-found", "That node no longer exists.");
  if (doc.nodes.length <= 2) return refused("last-span", "A beam needs at least one span.");
  const nodes = doc.nodes.filter((n) => n.id !== args.nodeId);
  const segmentIndex = index === doc.nodes.length - 1 ? index - 1 : index;
  const segments = doc.segments.filter((_, i) => i !== segmentIndex);
  const dropSettlement = (l: Load) => !(l.type === "settlement" && l.node === args.nodeId);
  let loadCases = doc.loadCases.map((c) => (c.loads.some((l) => !dropSettlement(l)) ? { ...c, loads: c.loads.filter(dropSettlement) } : c));
  const isEnd = index === 0 || index === doc.nodes.length - 1;
  if (isEnd) {
    const clipped = clipCases(loadCases, nodes[0]!.x, nodes[nodes.length - 1]!.x);
    if (!clipped) return refused("invalid-position", "Move or delete the point loads on that span first.");
    loadCases = [...clipped];
  }
  return changed(doc, "Delete node", { nodes, segments, loadCases });
}
