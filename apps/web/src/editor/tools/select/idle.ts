import { canEditBeam } from "../../actions/editorActions";
import type { ToolState } from "../Tool";

export const idle: ToolState = {
  id: "idle",
  onPointer(input, ctx) {
    if (input.type !== "down") return;
    const target = input.target;
    const { store } = ctx;
    if (!target) {
      store.setUi({ selection: null });
      return;
    }
    store.setUi({ selection: target });
    // Read-only users may select to inspect, but a press never becomes a drag.
    if (target.kind === "segment" || !canEditBeam(store.getState())) return;
    return { to: "pointing", data: { startPx: input.px, startX: input.x, target } };
  },
};
