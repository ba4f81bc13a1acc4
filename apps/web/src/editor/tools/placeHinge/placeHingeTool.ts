import { toggleHinge } from "../../commands/nodeCommands";
import { nodeForPlacement } from "../placeOnBeam";
import type { Tool, ToolState } from "../Tool";

const idle: ToolState = {
  id: "idle",
  onPointer(input, ctx) {
    if (input.type !== "down") return;
    const { store } = ctx;
    store.beginInteraction("Place hinge");
    const nodeId = nodeForPlacement(ctx, input.target, input.x);
    if (nodeId && store.run((doc) => toggleHinge(doc, { nodeId }))) {
      store.commitInteraction();
      store.setUi({ selection: { kind: "node", id: nodeId } });
    } else store.cancelInteraction();
  },
};

export const placeHingeTool: Tool = { id: "place-hinge", initial: "idle", states: [idle] };
