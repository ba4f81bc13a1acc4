import { moveLoad } from "../../commands/loadCommands";
import type { LoadId } from "../../model/ids";
import type { ToolState } from "../Tool";

export const draggingLoad: ToolState = {
  id: "draggingLoad",
  onPointer(input, ctx, data) {
    const id = data.id as LoadId;
    switch (input.type) {
      case "move":
        ctx.store.run((doc) => moveLoad(doc, { loadId: id, x: ctx.snap(input.x + (data.offset as number)) }));
        return;
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
