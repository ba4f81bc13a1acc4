import { setSupport } from "../../commands/nodeCommands";
import type { Support, SupportType } from "../../model/BeamDocument";
import { nodeForPlacement } from "../placeOnBeam";
import type { Tool, ToolState } from "../Tool";

/** A spring of 50 kN/mm (5e7 N/m) to start from; the inspector takes the real stiffness. */
export function defaultSupport(type: SupportType): Support {
  return type === "spring" ? { type, ky: 5e7 } : { type };
}

const idle: ToolState = {
  id: "idle",
  onPointer(input, ctx) {
    if (input.type !== "down") return;
    const { store } = ctx;
    // One undo entry even when the click also splits a segment to make the node.
    store.beginInteraction("Place support");
    const nodeId = nodeForPlacement(ctx, input.target, input.x);
    if (nodeId && store.run((doc) => setSupport(doc, { nodeId, support: defaultSupport(store.getState().ui.toolOptions.supportType) }))) {
      store.commitInteraction();
      store.setUi({ selection: { kind: "node", id: nodeId } });
    } else store.cancelInteraction();
  },
};

export const placeSupportTool: Tool = { id: "place-support", initial: "idle", states: [idle] };
