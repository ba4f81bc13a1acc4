import { useEffect, useMemo, useRef } from "react";
import { Stage } from "react-konva";
import type Konva from "konva";
import { fitCamera, screenToWorldX, zoomAt, panBy } from "../geometry/camera";
import { hitTest } from "../geometry/hitTest";
import { layoutScene, MODEL_HEIGHT } from "../geometry/sceneLayout";
import { snapX } from "../geometry/snapping";
import { useEditor, useEditorStore } from "../store/useEditor";
import type { PointerInput, ToolContext } from "../tools/Tool";
import { ToolRunner } from "../tools/ToolRunner";
import { toolsById } from "../tools/tools";
import type { ErrorRange } from "../results/errorLocation";
import { InteractiveLayer } from "./InteractiveLayer";
import { StaticLayer } from "./StaticLayer";
import { useElementWidth } from "./useElementWidth";

const toolCursor = { select: "default", pan: "grab", "place-support": "crosshair", "place-hinge": "crosshair", "place-load": "crosshair", split: "crosshair" } as const;

/** The model canvas. Pointer input goes to the active tool; drawing reads the store only. */
export function EditorCanvas({ errorRange }: { errorRange: ErrorRange | null }) {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const camera = useEditor((s) => s.ui.camera);
  const tool = useEditor((s) => s.ui.tool);
  const selection = useEditor((s) => s.ui.selection);
  const visibleCases = useEditor((s) => s.ui.visibleCases);
  const preview = useEditor((s) => s.ui.preview);
  const hoverX = useEditor((s) => s.ui.hoverX);
  const gridStep = useEditor((s) => s.ui.gridStep);
  const container = useRef<HTMLDivElement>(null);
  const width = useElementWidth(container);
  const layout = useMemo(() => layoutScene(doc, camera, visibleCases), [doc, camera, visibleCases]);
  const runner = useRef(new ToolRunner(toolsById.select));
  const fitted = useRef(false);

  const ctx: ToolContext = useMemo(
    () => ({
      store,
      snap: (x) => {
        const { camera: cam, gridStep: step } = store.getState().ui;
        return snapX(x, { camera: cam, step, features: store.doc.nodes.map((n) => n.x) });
      },
    }),
    [store],
  );

  useEffect(() => runner.current.setTool(toolsById[tool], ctx), [tool, ctx]);

  useEffect(() => {
    store.setUi({ viewportWidth: width });
    if (!fitted.current && width > 0) {
      fitted.current = true;
      const d = store.doc;
      store.setUi({ camera: fitCamera(d.nodes[0]?.x ?? 0, d.nodes[d.nodes.length - 1]?.x ?? 1, width) });
    }
  }, [width, store]);

  const send = (type: PointerInput["type"], stage: Konva.Stage | null) => {
    const pos = stage?.getPointerPosition();
    if (!pos) return;
    const ui = store.getState().ui;
    const x = screenToWorldX(ui.camera, pos.x);
    const target = hitTest(layoutScene(store.doc, ui.camera, ui.visibleCases), pos.x, pos.y);
    runner.current.handle({ type, px: pos.x, py: pos.y, x, target }, ctx);
    if (type === "move") store.setUi({ hoverX: x });
  };

  const onWheel = (e: Konva.KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const pos = e.target.getStage()?.getPointerPosition();
    if (!pos) return;
    if (e.evt.shiftKey) store.updateUi((ui) => ({ camera: panBy(ui.camera, -e.evt.deltaY) }));
    else store.updateUi((ui) => ({ camera: zoomAt(ui.camera, Math.exp(-e.evt.deltaY * 0.0015), pos.x) }));
  };

  return (
    <div
      ref={container}
      className="relative w-full overflow-hidden rounded-md border border-paper-300 bg-paper-50"
      style={{ height: MODEL_HEIGHT, cursor: toolCursor[tool] }}
      onKeyDown={(e) => {
        if (e.key === "Escape") runner.current.handle({ type: "cancel", px: 0, py: 0, x: 0, target: null }, ctx);
      }}
      tabIndex={0}
      role="application"
      aria-label="Beam canvas. Use the tables or the inspector for exact keyboard entry."
    >
      <Stage
        width={width}
        height={MODEL_HEIGHT}
        onPointerDown={(e) => send("down", e.target.getStage())}
        onPointerMove={(e) => send("move", e.target.getStage())}
        onPointerUp={(e) => send("up", e.target.getStage())}
        onPointerLeave={() => store.setUi({ hoverX: null })}
        onWheel={onWheel}
      >
        <StaticLayer doc={doc} layout={layout} camera={camera} width={width} gridStep={gridStep} />
        <InteractiveLayer layout={layout} camera={camera} selection={selection} preview={preview} hoverX={hoverX} errorRange={errorRange} />
      </Stage>
    </div>
  );
}
