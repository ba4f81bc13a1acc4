import { EditorStore } from "../store/EditorStore";
import type { BeamDocument } from "../model/BeamDocument";
import { hitTest } from "../geometry/hitTest";
import { layoutScene, BEAM_Y } from "../geometry/sceneLayout";
import { screenToWorldX, worldToScreenX } from "../geometry/camera";
import { snapX } from "../geometry/snapping";
import type { ToolId } from "../store/uiState";
import { ToolRunner } from "./ToolRunner";
import { toolsById } from "./tools";
import type { PointerInput, ToolContext } from "./Tool";

/** A headless editor for tool tests: pointer events at world x (and a screen y), no React. */
export class TestEditor {
  readonly store: EditorStore;
  readonly runner: ToolRunner;
  readonly ctx: ToolContext;

  constructor(doc: BeamDocument) {
    this.store = new EditorStore(doc);
    this.store.setUi({ camera: { originX: -1, scale: 50 } });
    this.runner = new ToolRunner(toolsById.select);
    this.ctx = {
      store: this.store,
      snap: (x) => {
        const { camera, gridStep } = this.store.getState().ui;
        return snapX(x, { camera, step: gridStep, features: this.store.doc.nodes.map((n) => n.x) });
      },
    };
  }

  setTool(tool: ToolId): this {
    this.store.setUi({ tool });
    this.runner.setTool(toolsById[tool], this.ctx);
    return this;
  }

  private send(type: PointerInput["type"], x: number, py: number): this {
    const { camera, visibleCases } = this.store.getState().ui;
    const px = worldToScreenX(camera, x);
    const target = hitTest(layoutScene(this.store.doc, camera, visibleCases), px, py);
    this.runner.handle({ type, px, py, x: screenToWorldX(camera, px), target }, this.ctx);
    return this;
  }

  pointerDown(x: number, py = BEAM_Y): this {
    return this.send("down", x, py);
  }
  pointerMove(x: number, py = BEAM_Y): this {
    return this.send("move", x, py);
  }
  pointerUp(x: number, py = BEAM_Y): this {
    return this.send("up", x, py);
  }
  cancel(): this {
    return this.send("cancel", 0, 0);
  }
}
