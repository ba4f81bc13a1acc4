import { findLoad, findNode } from "../../model/BeamDocument";
import type { HitTarget } from "../../geometry/hitTest";
import { DRAG_THRESHOLD, type ToolState } from "../Tool";

const END_GRIP_PX = 6;

function endUnderPointer(load: { x1: number; x2: number }, x: number, scale: number): "x1" | "x2" | null {
  const grip = END_GRIP_PX / scale;
  if (Math.abs(x - load.x1) <= grip) return "x1";
  if (Math.abs(x - load.x2) <= grip) return "x2";
  return null;
}

/** Pressed on a node or load; becomes a drag once the pointer travels past the threshold. */
export const pointing: ToolState = {
  id: "pointing",
  onPointer(input, ctx, data) {
    if (input.type === "up" || input.type === "cancel") return { to: "idle" };
    if (input.type !== "move" || Math.abs(input.px - (data.startPx as number)) < DRAG_THRESHOLD) return;
    const target = data.target as HitTarget;
    const doc = ctx.store.doc;
    if (target.kind === "node" && findNode(doc, target.id)) {
      ctx.store.beginInteraction("Move node");
      return { to: "draggingNode", data: { id: target.id } };
    }
    if (target.kind === "load") {
      const found = findLoad(doc, target.id);
      if (!found || found.load.type === "settlement") return { to: "idle" };
      if (found.load.type === "distributed") {
        // Pressed on an end of the block: stretch that end instead of moving the whole load.
        const end = endUnderPointer(found.load, data.startX as number, ctx.store.getState().ui.camera.scale);
        if (end) {
          ctx.store.beginInteraction("Resize load");
          return { to: "draggingLoadEnd", data: { id: target.id, end } };
        }
      }
      const start = found.load.type === "distributed" ? found.load.x1 : found.load.x;
      ctx.store.beginInteraction("Move load");
      // Keep the grip: a block dragged by its middle keeps its middle under the pointer.
      return { to: "draggingLoad", data: { id: target.id, offset: start - (data.startX as number) } };
    }
    return { to: "idle" };
  },
};
