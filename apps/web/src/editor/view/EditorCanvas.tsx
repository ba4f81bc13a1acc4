import { useEffect, useMemo, useRef, type PointerEvent as ReactPointerEvent } from "react";
import { Stage } from "./konva";
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
  const layoutRef = useRef(layout);
  layoutRef.current = layout;
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

  // Pointer input is read from the container element with pointer capture, so a drag that leaves
  // the canvas keeps moving and still ends (one undo entry) when the button is released outside.
  const send = (type: PointerInput["type"], e: ReactPointerEvent<HTMLDivElement>) => {
    const rect = e.currentTarget.getBoundingClientRect();
    const px = e.clientX - rect.left;
    const py = e.clientY - rect.top;
    const ui = store.getState().ui;
    const x = screenToWorldX(ui.camera, px);
    // Hit-test what is on screen: the layout of the last render.
    const target = hitTest(layoutRef.current, px, py);
    runner.current.handle({ type, px, py, x, target }, ctx);
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
      style={{ height: MODEL_HEIGHT, cursor: toolCursor[tool], touchAction: "none" }}
      onKeyDown={(e) => {
        if (e.key === "Escape") runner.current.handle({ type: "cancel", px: 0, py: 0, x: 0, target: null }, ctx);
      }}
      onPointerDown={(e) => {
        if (e.button !== 0) return;
        e.currentTarget.setPointerCapture(e.pointerId);
        send("down", e);
      }}
      onPointerMove={(e) => send("move", e)}
      onPointerUp={(e) => {
        send("up", e);
        if (e.currentTarget.hasPointerCapture(e.pointerId)) e.currentTarget.releasePointerCapture(e.pointerId);
      }}
      onPointerCancel={(e) => send("cancel", e)}
      onPointerLeave={() => store.setUi({ hoverX: null })}
      tabIndex={0}
      role="application"
      aria-label="Beam canvas. Use the tables or the inspector for exact keyboard entry."
    >
      <Stage width={width} height={MODEL_HEIGHT} onWheel={onWheel}>
        <StaticLayer doc={doc} layout={layout} camera={camera} width={width} gridStep={gridStep} />
        <InteractiveLayer layout={layout} camera={camera} selection={selection} preview={preview} hoverX={hoverX} errorRange={errorRange} />
      </Stage>
    </div>
  );
}
