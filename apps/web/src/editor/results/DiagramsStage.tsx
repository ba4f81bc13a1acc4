import { useMemo } from "react";
import { Layer, Line, Stage } from "../view/konva";
import type { Analysis } from "@spanwright/solver";
import type { Camera } from "../geometry/camera";
import { screenToWorldX, worldToScreenX } from "../geometry/camera";
import type { UnitSystemId } from "../units/unitSystems";
import { DiagramRow, ROW_HEIGHT } from "./DiagramRow";
import { quantities, seriesFor } from "./resultSeries";

export interface DiagramsStageProps {
  readonly analysis: Analysis;
  readonly name: string;
  readonly isEnvelope: boolean;
  readonly camera: Camera;
  readonly width: number;
  readonly units: UnitSystemId;
  readonly hoverX: number | null;
  readonly onHover: (x: number | null) => void;
  /** A click picks x for the section view. */
  readonly onPick?: (x: number) => void;
  /** Where the section view is, m; drawn as a solid line. */
  readonly pickedX?: number | null;
}

/** V, M, deflection and rotation stacked under the beam, on the canvas's camera. */
export function DiagramsStage({ analysis, name, isEnvelope, camera, width, units, hoverX, onHover, onPick, pickedX = null }: DiagramsStageProps) {
  const series = useMemo(() => quantities.map((q) => seriesFor(analysis, name, isEnvelope, q)), [analysis, name, isEnvelope]);
  const height = ROW_HEIGHT * quantities.length;
  return (
    <div
      onPointerMove={(e) => onHover(screenToWorldX(camera, e.clientX - e.currentTarget.getBoundingClientRect().left))}
      onPointerLeave={() => onHover(null)}
      onClick={(e) => onPick?.(screenToWorldX(camera, e.clientX - e.currentTarget.getBoundingClientRect().left))}
    >
    <Stage width={width} height={height}>
      <Layer listening={false}>
        {quantities.map((q, i) => (
          <DiagramRow key={q} series={series[i] ?? null} quantity={q} top={i * ROW_HEIGHT} width={width} camera={camera} units={units} />
        ))}
      </Layer>
      <Layer listening={false}>
        {pickedX !== null && <Line points={[worldToScreenX(camera, pickedX), 0, worldToScreenX(camera, pickedX), height]} stroke="#9c6d1f" strokeWidth={1.5} />}
        {hoverX !== null && <Line points={[worldToScreenX(camera, hoverX), 0, worldToScreenX(camera, hoverX), height]} stroke="#8198bd" strokeWidth={1} dash={[3, 3]} />}
      </Layer>
    </Stage>
    </div>
  );
}
