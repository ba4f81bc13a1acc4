import { panBy } from "../../geometry/camera";
import type { Tool, ToolState } from "../Tool";

const idle: ToolState = {
  id: "idle",
  onPointer(input) {
    if (input.type === "down") return { to: "panning", data: { lastPx: input.px } };
  },
};

const panning: ToolState = {
  id: "panning",
  onPointer(input, ctx, data) {
    if (input.type === "up" || input.type === "cancel") return { to: "idle" };
    if (input.type !== "move") return;
    ctx.store.updateUi((ui) => ({ camera: panBy(ui.camera, input.px - (data.lastPx as number)) }));
    return { to: "panning", data: { lastPx: input.px } };
  },
};

export const panTool: Tool = { id: "pan", initial: "idle", states: [idle, panning] };
