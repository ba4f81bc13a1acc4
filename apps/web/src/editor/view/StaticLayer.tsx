import { memo } from "react";
import { Circle, Layer, Line, Rect } from "./konva";
import type { BeamDocument } from "../model/BeamDocument";
import { BEAM_THICKNESS, BEAM_Y, MODEL_HEIGHT, type SceneLayout } from "../geometry/sceneLayout";
import type { Camera } from "../geometry/camera";
import { gridLines } from "../geometry/snapping";
import { worldToScreenX } from "../geometry/camera";
import { caseColor, colors } from "./colors";
import { DimensionLines } from "./DimensionLines";
import { LoadSymbol } from "./symbols/LoadSymbol";
import { SupportSymbol } from "./symbols/SupportSymbol";

export interface StaticLayerProps {
  readonly doc: BeamDocument;
  readonly layout: SceneLayout;
  readonly camera: Camera;
  readonly width: number;
  readonly gridStep: number;
}

/** The model drawn to scale: grid, beam, supports, hinges, loads, dimensions. Read-only. */
export const StaticLayer = memo(function StaticLayer({ doc, layout, camera, width, gridStep }: StaticLayerProps) {
  const caseIndex = new Map(doc.loadCases.map((c, i) => [c.id, i]));
  const firstPinned = doc.nodes.findIndex((n) => n.support?.type === "pinned");
  return (
    <Layer listening={false}>
      <Rect x={0} y={0} width={width} height={MODEL_HEIGHT} fill={colors.paper} />
      {gridLines(camera, width, gridStep).map((x) => (
        <Line key={x} points={[worldToScreenX(camera, x), BEAM_Y + 30, worldToScreenX(camera, x), BEAM_Y + 36]} stroke={colors.grid} strokeWidth={1} />
      ))}
      {layout.segments.map((s) => (
        <Rect key={s.id} x={s.px1} y={BEAM_Y - BEAM_THICKNESS / 2} width={Math.max(0, s.px2 - s.px1)} height={BEAM_THICKNESS} fill={colors.ink} />
      ))}
      {doc.nodes.map((n, i) =>
        n.support ? (
          <SupportSymbol
            key={n.id}
            support={n.support}
            px={layout.nodes[i]!.px}
            y={BEAM_Y + BEAM_THICKNESS / 2}
            end={i === 0 ? "left" : i === doc.nodes.length - 1 ? "right" : null}
            roller={n.support.type === "pinned" && i !== firstPinned}
          />
        ) : null,
      )}
      {doc.nodes.map((n, i) =>
        n.hinge ? <Circle key={n.id} x={layout.nodes[i]!.px} y={BEAM_Y} radius={5} fill={colors.paper} stroke={colors.ink} strokeWidth={1.5} /> : null,
      )}
      {layout.loads.map((shape) => (
        <LoadSymbol key={shape.id} shape={shape} color={caseColor(caseIndex.get(shape.caseId) ?? 0)} units={doc.units} />
      ))}
      <DimensionLines doc={doc} nodes={layout.nodes} />
    </Layer>
  );
});
