import { Arc, Arrow, Group, Line, Text } from "../konva";
import type { LoadShape } from "../../geometry/sceneLayout";
import { BEAM_Y } from "../../geometry/sceneLayout";
import { formatQuantity } from "../../units/formatQuantity";
import type { UnitSystemId } from "../../units/unitSystems";

const ARROW_SPACING = 28; // px between arrows inside a distributed block

function DistributedBlock({ shape, color, units }: { shape: Extract<LoadShape, { kind: "distributed" }>; color: string; units: UnitSystemId }) {
  if (shape.load.type !== "distributed") return null;
  const { px1, px2, base, h1, h2 } = shape;
  const width = px2 - px1;
  const count = Math.max(1, Math.floor(width / ARROW_SPACING));
  const arrows = [];
  for (let i = 0; i <= count; i++) {
    const px = px1 + (width * i) / count;
    const h = h1 + ((h2 - h1) * i) / count;
    const up = (shape.load.qy1 + ((shape.load.qy2 - shape.load.qy1) * i) / count) > 0;
    arrows.push(
      <Arrow key={i} points={up ? [px, base, px, base - h] : [px, base - h, px, base]} stroke={color} fill={color} strokeWidth={1} pointerLength={4} pointerWidth={4} />,
    );
  }
  const same = shape.load.qy1 === shape.load.qy2;
  const label = same
    ? formatQuantity(shape.load.qy1, units, "distributed")
    : `${formatQuantity(shape.load.qy1, units, "distributed")} → ${formatQuantity(shape.load.qy2, units, "distributed")}`;
  return (
    <>
      <Line points={[px1, base, px1, base - h1, px2, base - h2, px2, base]} closed fill={`${color}22`} stroke={color} strokeWidth={1} />
      {arrows}
      <Text x={px1 + 2} y={base - Math.max(h1, h2) - 14} text={label} fontSize={11} fill={color} />
    </>
  );
}

export function LoadSymbol({ shape, color, units }: { shape: LoadShape; color: string; units: UnitSystemId }) {
  switch (shape.kind) {
    case "distributed":
      return (
        <Group listening={false}>
          <DistributedBlock shape={shape} color={color} units={units} />
        </Group>
      );
    case "point": {
      if (shape.load.type !== "point") return null;
      const pts = shape.up ? [shape.px, shape.bottom, shape.px, shape.top] : [shape.px, shape.top, shape.px, shape.bottom];
      return (
        <Group listening={false}>
          <Arrow points={pts} stroke={color} fill={color} strokeWidth={2} pointerLength={7} pointerWidth={7} />
          <Text x={shape.px + 4} y={shape.top - 2} text={formatQuantity(shape.load.fy, units, "force")} fontSize={11} fill={color} />
        </Group>
      );
    }
    case "moment": {
      if (shape.load.type !== "moment") return null;
      // An open arc with its arrowhead showing the sense: counterclockwise for positive mz.
      const r = shape.radius;
      const tipAngle = shape.ccw ? -150 : -30;
      const tip = { x: shape.px + r * Math.cos((tipAngle * Math.PI) / 180), y: shape.cy + r * Math.sin((tipAngle * Math.PI) / 180) };
      const dir = shape.ccw ? 1 : -1;
      return (
        <Group listening={false}>
          <Arc x={shape.px} y={shape.cy} innerRadius={r} outerRadius={r} angle={240} rotation={-210} stroke={color} strokeWidth={2} />
          <Arrow points={[tip.x + 6 * dir, tip.y - 4, tip.x, tip.y + 1]} stroke={color} fill={color} strokeWidth={2} pointerLength={6} pointerWidth={6} />
          <Text x={shape.px + r + 2} y={shape.cy - r - 12} text={formatQuantity(shape.load.mz, units, "moment")} fontSize={11} fill={color} />
        </Group>
      );
    }
    case "settlement": {
      if (shape.load.type !== "settlement") return null;
      const y = BEAM_Y + 44;
      return (
        <Group listening={false}>
          <Arrow points={[shape.px + 16, y, shape.px + 16, y + 20]} stroke={color} fill={color} strokeWidth={1.5} pointerLength={5} pointerWidth={5} dash={[3, 2]} />
          <Text x={shape.px + 20} y={y + 6} text={`δ ${formatQuantity(shape.load.uy, units, "settlement")}`} fontSize={11} fill={color} />
        </Group>
      );
    }
  }
}
