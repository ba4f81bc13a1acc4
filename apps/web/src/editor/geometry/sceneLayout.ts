import type { BeamDocument, Load } from "../model/BeamDocument";
import type { CaseId, LoadId, NodeId, SegmentId } from "../model/ids";
import { worldToScreenX, type Camera } from "./camera";

// Where everything sits on the model canvas, in screen pixels, computed from the document and the
// camera alone. The view draws these shapes and the tools hit-test them, so both agree exactly.

export const BEAM_Y = 170; // px from the top of the model canvas
export const BEAM_THICKNESS = 6;
export const MODEL_HEIGHT = 260;
const LANE_HEIGHT = 34; // px per stacked distributed-load lane
const LANE_GAP = 16; // room for the label of the block below
const MAX_ARROW = 70;
const MIN_ARROW = 24;

export interface NodeShape {
  readonly id: NodeId;
  readonly px: number;
}

export interface SegmentShape {
  readonly id: SegmentId;
  readonly px1: number;
  readonly px2: number;
}

export type LoadShape =
  | { readonly kind: "point"; readonly id: LoadId; readonly caseId: CaseId; readonly px: number; readonly top: number; readonly bottom: number; readonly up: boolean; readonly load: Load }
  | { readonly kind: "moment"; readonly id: LoadId; readonly caseId: CaseId; readonly px: number; readonly cy: number; readonly radius: number; readonly ccw: boolean; readonly load: Load }
  | {
      readonly kind: "distributed";
      readonly id: LoadId;
      readonly caseId: CaseId;
      readonly px1: number;
      readonly px2: number;
      /** Baseline of the block (px) and the heights of its two ends (px), proportional to |q|. */
      readonly base: number;
      readonly h1: number;
      readonly h2: number;
      readonly load: Load;
    }
  | { readonly kind: "settlement"; readonly id: LoadId; readonly caseId: CaseId; readonly px: number; readonly load: Load };

export interface SceneLayout {
  readonly nodes: readonly NodeShape[];
  readonly segments: readonly SegmentShape[];
  readonly loads: readonly LoadShape[];
}

/** Assigns each distributed load the lowest lane where it overlaps nothing already placed. */
function assignLanes(spans: readonly { x1: number; x2: number }[]): number[] {
  const lanes: { x1: number; x2: number }[][] = [];
  return spans.map((s) => {
    let lane = lanes.findIndex((placed) => placed.every((p) => s.x2 <= p.x1 || s.x1 >= p.x2));
    if (lane < 0) {
      lane = lanes.length;
      lanes.push([]);
    }
    lanes[lane]!.push(s);
    return lane;
  });
}

export function layoutScene(doc: BeamDocument, camera: Camera, visibleCases: ReadonlySet<CaseId> | null): SceneLayout {
  const sx = (x: number) => worldToScreenX(camera, x);
  const nodes = doc.nodes.map((n) => ({ id: n.id, px: sx(n.x) }));
  const segments = doc.segments.map((s, i) => ({ id: s.id, px1: nodes[i]?.px ?? 0, px2: nodes[i + 1]?.px ?? 0 }));
  const cases = doc.loadCases.filter((c) => !visibleCases || visibleCases.has(c.id));
  const all = cases.flatMap((c) => c.loads.map((load) => ({ load, caseId: c.id })));

  // Arrow lengths and block heights scale with magnitude within each kind (forces and line loads
  // have different units, so each is scaled to its own largest value).
  const maxF = Math.max(1e-9, ...all.map(({ load: l }) => (l.type === "point" ? Math.abs(l.fy) : 0)));
  const maxQ = Math.max(1e-9, ...all.map(({ load: l }) => (l.type === "distributed" ? Math.max(Math.abs(l.qy1), Math.abs(l.qy2)) : 0)));
  const distributed = all.filter(({ load }) => load.type === "distributed");
  const lanes = assignLanes(distributed.map(({ load }) => (load.type === "distributed" ? load : { x1: 0, x2: 0 })));
  const top = BEAM_Y - BEAM_THICKNESS / 2 - 2;

  const loads: LoadShape[] = [];
  distributed.forEach(({ load, caseId }, i) => {
    if (load.type !== "distributed") return;
    const base = top - lanes[i]! * (LANE_HEIGHT + LANE_GAP);
    const h = (q: number) => 4 + ((LANE_HEIGHT - 4) * Math.abs(q)) / maxQ;
    loads.push({ kind: "distributed", id: load.id, caseId, px1: sx(load.x1), px2: sx(load.x2), base, h1: h(load.qy1), h2: h(load.qy2), load });
  });
  for (const { load, caseId } of all) {
    if (load.type === "point") {
      const length = MIN_ARROW + ((MAX_ARROW - MIN_ARROW) * Math.abs(load.fy)) / maxF;
      loads.push({ kind: "point", id: load.id, caseId, px: sx(load.x), top: top - length, bottom: top, up: load.fy > 0, load });
    } else if (load.type === "moment") {
      loads.push({ kind: "moment", id: load.id, caseId, px: sx(load.x), cy: BEAM_Y, radius: 18, ccw: load.mz > 0, load });
    } else if (load.type === "settlement") {
      const node = doc.nodes.findIndex((n) => n.id === load.node);
      loads.push({ kind: "settlement", id: load.id, caseId, px: nodes[node]?.px ?? 0, load });
    }
  }
  return { nodes, segments, loads };
}
