import { splitSpan } from "../commands/nodeCommands";
import type { HitTarget } from "../geometry/hitTest";
import type { NodeId } from "../model/ids";
import { createNodeId } from "../model/ids";
import type { ToolContext } from "./Tool";

/**
 * The node to put a support or hinge on: the node clicked, or a new node made by splitting the
 * clicked segment at the snapped x (snapping onto an existing node reuses that node).
 */
export function nodeForPlacement(ctx: ToolContext, target: HitTarget | null, x: number): NodeId | null {
  if (!target) return null;
  if (target.kind === "node") return target.id;
  if (target.kind !== "segment") return null;
  const snapped = ctx.snap(x);
  const existing = ctx.store.doc.nodes.find((n) => Math.abs(n.x - snapped) < 1e-9);
  if (existing) return existing.id;
  const nodeId = createNodeId();
  return ctx.store.run((doc) => splitSpan(doc, { segmentId: target.id, x: snapped, nodeId })) ? nodeId : null;
}
