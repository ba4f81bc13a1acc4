import { splitSpan } from "../../commands/nodeCommands";
import { createNodeId } from "../../model/ids";
import type { Tool, ToolState } from "../Tool";

const idle: ToolState = {
  id: "idle",
  onPointer(input, ctx) {
    if (input.type !== "down" || input.target?.kind !== "segment") return;
    const segmentId = input.target.id;
    const nodeId = createNodeId();
    if (ctx.store.run((doc) => splitSpan(doc, { segmentId, x: ctx.snap(input.x), nodeId }))) {
      ctx.store.setUi({ selection: { kind: "node", id: nodeId } });
    }
  },
};

export const splitTool: Tool = { id: "split", initial: "idle", states: [idle] };
