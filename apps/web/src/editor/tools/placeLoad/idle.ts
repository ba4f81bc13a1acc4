import { addLoad } from "../../commands/loadCommands";
import type { ToolState } from "../Tool";
import { newLoad } from "./newLoad";

export const idle: ToolState = {
  id: "idle",
  onPointer(input, ctx) {
    if (input.type !== "down") return;
    const { store } = ctx;
    const { activeCaseId, toolOptions } = store.getState().ui;
    if (!activeCaseId) {
      store.setUi({ notice: { tone: "error", text: "Add a load case first." } });
      return;
    }
    const doc = store.doc;
    const x0 = doc.nodes[0]?.x ?? 0;
    const x1 = doc.nodes[doc.nodes.length - 1]?.x ?? 0;
    const x = Math.min(Math.max(ctx.snap(input.x), x0), x1);
    if (toolOptions.loadType === "distributed") {
      store.setUi({ preview: { x1: x, x2: x } });
      return { to: "drawing", data: { startX: x } };
    }
    const load = newLoad(toolOptions.loadType, x, x);
    if (store.run((d) => addLoad(d, { caseId: activeCaseId, load }))) store.setUi({ selection: { kind: "load", id: load.id } });
  },
};
