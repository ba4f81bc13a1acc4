import { moveNode } from "../../commands/nodeCommands";
import type { NodeId } from "../../model/ids";
import type { ToolState } from "../Tool";

export const draggingNode: ToolState = {
  id: "draggingNode",
  onPointer(input, ctx, data) {
    const id = data.id as NodeId;
    switch (input.type) {
      case "move": {
        const x = ctx.snap(input.x);
        // Refusals mid-drag (passing a neighbour) just leave the node where it last was.
        const result = moveNode(ctx.store.doc, { nodeId: id, x });
        if (result.ok) ctx.store.run(() => result);
        return;
      }
      case "up":
        ctx.store.commitInteraction();
        return { to: "idle" };
      case "cancel":
        ctx.store.cancelInteraction();
        return { to: "idle" };
      case "down":
        return;
    }
  },
};
