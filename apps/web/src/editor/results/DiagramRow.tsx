import { Circle, Group, Line, Rect, Text } from "../view/konva";
import type { Quantity } from "@spanwright/solver";
import { worldToScreenX, type Camera } from "../geometry/camera";
import { formatQuantity } from "../units/formatQuantity";
import type { QuantityKind, UnitSystemId } from "../units/unitSystems";
import type { Series } from "./resultSeries";

export const ROW_HEIGHT = 104;
const PAD = 16;

export const quantityInfo: Record<Quantity, { label: string; kind: QuantityKind; color: string }> = {
  V: { label: "Shear V", kind: "force", color: "#2c4368" },
  M: { label: "Moment M (sagging +)", kind: "moment", color: "#9c6d1f" },
  uy: { label: "Deflection (up +)", kind: "deflection", color: "#2f6b43" },
  rz: { label: "Rotation (CCW +)", kind: "rotation", color: "#85301f" },
};

function polyline(camera: Camera, x: Float64Array, y: Float64Array, toPx: (v: number) => number): number[] {
  const points = new Array<number>(x.length * 2);
  for (let i = 0; i < x.length; i++) {
    points[2 * i] = worldToScreenX(camera, x[i]!);
    points[2 * i + 1] = toPx(y[i]!);
  }
  return points;
}

export interface DiagramRowProps {
  readonly series: Series | null;
  readonly quantity: Quantity;
  readonly top: number;
  readonly width: number;
  readonly camera: Camera;
  readonly units: UnitSystemId;
}

/** One diagram under the beam on the shared x scale; an envelope shows as a band between its lines. */
export function DiagramRow({ series, quantity, top, width, camera, units }: DiagramRowProps) {
  const info = quantityInfo[quantity];
  const mid = top + ROW_HEIGHT / 2;
  let maxAbs = 0;
  for (const line of series?.lines ?? []) for (const v of line) maxAbs = Math.max(maxAbs, Math.abs(v));
  const scale = maxAbs > 0 ? (ROW_HEIGHT / 2 - PAD) / maxAbs : 0;
  const toPx = (v: number) => mid - v * scale;
  const x0 = series ? worldToScreenX(camera, series.x[0] ?? 0) : 0;
  const x1 = series ? worldToScreenX(camera, series.x[series.x.length - 1] ?? 0) : 0;
  const lines = series?.lines.map((l) => polyline(camera, series.x, l, toPx)) ?? [];
  const fills = lines.map((pts) => [x0, mid, ...pts, x1, mid]);
  const marks = [series?.max, series?.min].filter((e): e is NonNullable<typeof e> => !!e && Math.abs(e.value) > maxAbs * 1e-9);
  return (
    <Group listening={false}>
      <Rect x={0} y={top} width={width} height={ROW_HEIGHT} fill="#ffffff" stroke="#e8e3d8" strokeWidth={1} />
      <Text x={6} y={top + 4} text={info.label} fontSize={11} fill="#4f4a41" />
      {!series && <Text x={6} y={mid - 6} text={quantity === "rz" ? "No rotation envelope: pick a case or combination." : "No result."} fontSize={11} fill="#8a8373" />}
      <Line points={[x0, mid, x1, mid]} stroke="#b3ab9a" strokeWidth={1} />
      {fills.map((pts, i) => (
        <Line key={`f${i}`} points={pts} closed fill={`${info.color}1f`} strokeEnabled={false} />
      ))}
      {lines.map((pts, i) => (
        <Line key={`l${i}`} points={pts} stroke={info.color} strokeWidth={1.5} dash={i === 1 ? [5, 3] : undefined} />
      ))}
      {marks.map((e, i) => {
        const px = worldToScreenX(camera, e.x);
        const py = toPx(e.value);
        const above = e.value >= 0;
        const text = formatQuantity(e.value, units, info.kind);
        // Keep labels inside the row: near the right edge they sit left of their point.
        const labelWidth = text.length * 6.5;
        const lx = px + 4 + labelWidth > width ? px - 4 - labelWidth : px + 4;
        return (
          <Group key={i}>
            <Circle x={px} y={py} radius={3} fill={info.color} />
            <Text x={lx} y={above ? py - 14 : py + 3} text={text} fontSize={11} fill={info.color} fontStyle="bold" />
          </Group>
        );
      })}
    </Group>
  );
}
