import type { LoadId, NodeId, SegmentId } from "../model/ids";
import { BEAM_Y, type LoadShape, type SceneLayout } from "./sceneLayout";

export type HitTarget =
  | { readonly kind: "node"; readonly id: NodeId }
  | { readonly kind: "load"; readonly id: LoadId }
  | { readonly kind: "segment"; readonly id: SegmentId };

const NODE_RADIUS = 12; // px: generous, nodes are small and exactness comes from the inspector
const SEGMENT_BAND = 10;
const ARROW_BAND = 7;

function hitsLoad(shape: LoadShape, px: number, py: number): boolean {
  switch (shape.kind) {
    case "point":
      return Math.abs(px - shape.px) <= ARROW_BAND && py >= shape.top - 4 && py <= shape.bottom + 2;
    case "moment":
      return Math.hypot(px - shape.px, py - shape.cy) <= shape.radius + 4 && Math.hypot(px - shape.px, py - shape.cy) >= shape.radius - 8;
    case "distributed": {
      if (px < Math.min(shape.px1, shape.px2) || px > Math.max(shape.px1, shape.px2)) return false;
      const t = shape.px2 === shape.px1 ? 0 : (px - shape.px1) / (shape.px2 - shape.px1);
      const h = shape.h1 + (shape.h2 - shape.h1) * t;
      return py <= shape.base + 1 && py >= shape.base - h - 3;
    }
    case "settlement":
      return Math.abs(px - shape.px) <= 10 && py >= BEAM_Y + 40 && py <= BEAM_Y + 70;
  }
}

/**
 * What is under the pointer, topmost first: point loads and moments (small, drawn last), then
 * nodes, then distributed loads, then the beam itself. Returns null over empty canvas.
 */
export function hitTest(layout: SceneLayout, px: number, py: number): HitTarget | null {
  const small = layout.loads.filter((l) => l.kind !== "distributed");
  for (let i = small.length - 1; i >= 0; i--) {
    const shape = small[i]!;
    if (hitsLoad(shape, px, py)) return { kind: "load", id: shape.id };
  }
  let nearest: { id: NodeId; d: number } | null = null;
  for (const n of layout.nodes) {
    const d = Math.hypot(px - n.px, py - BEAM_Y);
    if (d <= NODE_RADIUS && (!nearest || d < nearest.d)) nearest = { id: n.id, d };
  }
  if (nearest) return { kind: "node", id: nearest.id };
  const blocks = layout.loads.filter((l) => l.kind === "distributed");
  for (let i = blocks.length - 1; i >= 0; i--) {
    const shape = blocks[i]!;
    if (hitsLoad(shape, px, py)) return { kind: "load", id: shape.id };
  }
  if (Math.abs(py - BEAM_Y) <= SEGMENT_BAND) {
    const segment = layout.segments.find((s) => px >= s.px1 && px <= s.px2);
    if (segment) return { kind: "segment", id: segment.id };
  }
  return null;
}
