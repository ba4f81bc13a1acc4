import { addLoad } from "../../commands/loadCommands";
import type { BeamDocument } from "../../model/BeamDocument";
import type { ToolState } from "../Tool";
import { newLoad } from "./newLoad";

/** The span (between neighbouring nodes) containing x: a click without a drag loads that span. */
function spanAround(doc: BeamDocument, x: number): [number, number] {
  for (let i = 0; i + 1 < doc.nodes.length; i++) {
    const a = doc.nodes[i]!.x;
    const b = doc.nodes[i + 1]!.x;
    if (x >= a && x <= b) return [a, b];
  }
  return [doc.nodes[0]?.x ?? 0, doc.nodes[doc.nodes.length - 1]?.x ?? 0];
}

/** Dragging out a distributed load from where the press began. */
export const drawing: ToolState = {
  id: "drawing",
  onPointer(input, ctx, data) {
    const { store } = ctx;
    const doc = store.doc;
    const lo = doc.nodes[0]?.x ?? 0;
    const hi = doc.nodes[doc.nodes.length - 1]?.x ?? 0;
    const startX = data.startX as number;
    const x = Math.min(Math.max(ctx.snap(input.x), lo), hi);
    switch (input.type) {
      case "move":
        store.setUi({ preview: { x1: Math.min(startX, x), x2: Math.max(startX, x) } });
        return;
      case "up": {
        store.setUi({ preview: null });
        const caseId = store.getState().ui.activeCaseId;
        if (!caseId) return { to: "idle" };
        const [x1, x2] = Math.abs(x - startX) < 1e-9 ? spanAround(doc, startX) : [startX, x];
        const load = newLoad("distributed", x1, x2);
        if (store.run((d) => addLoad(d, { caseId, load }))) store.setUi({ selection: { kind: "load", id: load.id } });
        return { to: "idle" };
      }
      case "cancel":
        store.setUi({ preview: null });
        return { to: "idle" };
      case "down":
        return;
    }
  },
};
