import { editLoad } from "../../commands/loadCommands";
import { findLoad } from "../../model/BeamDocument";
import type { LoadId } from "../../model/ids";
import type { ToolState } from "../Tool";

/** Stretching one end of a distributed load; its intensities stay as they were at each end. */
export const draggingLoadEnd: ToolState = {
  id: "draggingLoadEnd",
  onPointer(input, ctx, data) {
    const id = data.id as LoadId;
    const end = data.end as "x1" | "x2";
    switch (input.type) {
      case "move": {
        const found = findLoad(ctx.store.doc, id);
        if (found?.load.type !== "distributed") return;
        const next = { ...found.load, [end]: ctx.snap(input.x) };
        if (next.x1 >= next.x2) return; // an end cannot pass the other
        const result = editLoad(ctx.store.doc, { loadId: id, load: next });
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
