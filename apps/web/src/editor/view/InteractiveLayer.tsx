import { Circle, Layer, Line, Rect } from "./konva";
import { BEAM_Y, MODEL_HEIGHT, type SceneLayout } from "../geometry/sceneLayout";
import { worldToScreenX, type Camera } from "../geometry/camera";
import type { Selection } from "../store/uiState";
import type { ErrorRange } from "../results/errorLocation";
import { colors } from "./colors";

export interface InteractiveLayerProps {
  readonly layout: SceneLayout;
  readonly camera: Camera;
  readonly selection: Selection | null;
  readonly preview: { x1: number; x2: number } | null;
  readonly hoverX: number | null;
  readonly errorRange: ErrorRange | null;
}

function SelectionMark({ layout, selection }: { layout: SceneLayout; selection: Selection }) {
  if (selection.kind === "node") {
    const node = layout.nodes.find((n) => n.id === selection.id);
    return node ? <Circle x={node.px} y={BEAM_Y} radius={9} stroke={colors.selection} strokeWidth={2.5} /> : null;
  }
  if (selection.kind === "segment") {
    const s = layout.segments.find((seg) => seg.id === selection.id);
    return s ? <Rect x={s.px1} y={BEAM_Y - 7} width={s.px2 - s.px1} height={14} stroke={colors.selection} strokeWidth={2} fill={colors.selectionFill} /> : null;
  }
  if (selection.kind !== "load") return null;
  const shape = layout.loads.find((l) => l.id === selection.id);
  if (!shape) return null;
  switch (shape.kind) {
    case "point":
      return <Rect x={shape.px - 8} y={shape.top - 4} width={16} height={shape.bottom - shape.top + 6} stroke={colors.selection} strokeWidth={2} fill={colors.selectionFill} />;
    case "moment":
      return <Circle x={shape.px} y={shape.cy} radius={shape.radius + 5} stroke={colors.selection} strokeWidth={2} />;
    case "distributed": {
      const h = Math.max(shape.h1, shape.h2);
      return <Rect x={shape.px1 - 3} y={shape.base - h - 3} width={shape.px2 - shape.px1 + 6} height={h + 6} stroke={colors.selection} strokeWidth={2} fill={colors.selectionFill} />;
    }
    case "settlement":
      return <Rect x={shape.px + 8} y={BEAM_Y + 40} width={16} height={30} stroke={colors.selection} strokeWidth={2} />;
  }
}

/** Selection, previews, the hover cursor and the part of the beam an engine error points at. */
export function InteractiveLayer({ layout, camera, selection, preview, hoverX, errorRange }: InteractiveLayerProps) {
  const sx = (x: number) => worldToScreenX(camera, x);
  return (
    <Layer listening={false}>
      {errorRange && (
        <Rect
          x={sx(errorRange.x1) - 8}
          y={BEAM_Y - 30}
          width={Math.max(16, sx(errorRange.x2) - sx(errorRange.x1) + 16)}
          height={60}
          fill={colors.dangerFill}
          stroke={colors.danger}
          dash={[5, 3]}
        />
      )}
      {selection && <SelectionMark layout={layout} selection={selection} />}
      {preview && <Rect x={sx(preview.x1)} y={BEAM_Y - 40} width={Math.max(2, sx(preview.x2) - sx(preview.x1))} height={34} stroke={colors.selection} dash={[4, 3]} fill={colors.selectionFill} />}
      {hoverX !== null && <Line points={[sx(hoverX), 0, sx(hoverX), MODEL_HEIGHT]} stroke={colors.hover} strokeWidth={1} dash={[3, 3]} />}
    </Layer>
  );
}
