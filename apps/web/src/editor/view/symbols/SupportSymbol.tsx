import { Circle, Group, Line } from "../konva";
import type { Support } from "../../model/BeamDocument";
import { colors } from "../colors";

// Supports in the usual engineering symbols, drawn at the node with the beam axis at y = 0:
// triangle for a pin, triangle on rollers for a roller (the engine treats both alike), hatched
// wall for a fixed end, wall with rollers for a guided end, zigzag coil for a spring.

const stroke = colors.ink;

function Hatch({ x1, x2, y, down = true }: { x1: number; x2: number; y: number; down?: boolean }) {
  const lines = [];
  for (let x = x1; x <= x2; x += 6) lines.push(<Line key={x} points={[x, y, x - 5, y + (down ? 6 : -6)]} stroke={stroke} strokeWidth={1} />);
  return (
    <>
      <Line points={[x1 - 3, y, x2 + 3, y]} stroke={stroke} strokeWidth={1.5} />
      {lines}
    </>
  );
}

function Wall({ side }: { side: "left" | "right" }) {
  const dir = side === "left" ? -1 : 1;
  const x = 4 * dir;
  const ticks = [];
  for (let y = -18; y <= 18; y += 6) ticks.push(<Line key={y} points={[x, y, x + 6 * dir, y + 5]} stroke={stroke} strokeWidth={1} />);
  return (
    <>
      <Line points={[x, -20, x, 20]} stroke={stroke} strokeWidth={2} />
      {ticks}
    </>
  );
}

function Pin({ rollers }: { rollers: boolean }) {
  const base = rollers ? 16 : 18;
  return (
    <>
      <Line points={[0, 4, -10, base, 10, base]} closed stroke={stroke} strokeWidth={1.5} fill={colors.paper} />
      {rollers && (
        <>
          <Circle x={-5} y={base + 3.5} radius={3} stroke={stroke} strokeWidth={1.2} />
          <Circle x={5} y={base + 3.5} radius={3} stroke={stroke} strokeWidth={1.2} />
        </>
      )}
      <Hatch x1={-12} x2={12} y={rollers ? base + 7 : base} />
    </>
  );
}

function Spring({ ky, kr }: { ky: number; kr: number }) {
  if (ky <= 0 && kr > 0) {
    // Rotational spring only: a coil around the node.
    const points: number[] = [];
    for (let t = 0; t <= 4 * Math.PI; t += 0.3) points.push(Math.cos(t) * (4 + t * 1.2), Math.sin(t) * (4 + t * 1.2));
    return <Line points={points} stroke={stroke} strokeWidth={1.2} />;
  }
  const zig = [0, 4, 0, 8];
  for (let i = 0; i < 6; i++) zig.push(i % 2 === 0 ? -6 : 6, 10 + i * 3.5);
  zig.push(0, 32, 0, 36);
  return (
    <>
      <Line points={zig} stroke={stroke} strokeWidth={1.3} />
      <Hatch x1={-10} x2={10} y={36} />
    </>
  );
}

export interface SupportSymbolProps {
  readonly support: Support;
  readonly px: number;
  readonly y: number;
  /** Which end of the beam the node is (walls face outward); null for an interior node. */
  readonly end: "left" | "right" | null;
  /** Draw a pin as a roller (every pinned support after the first, as is customary). */
  readonly roller: boolean;
}

export function SupportSymbol({ support, px, y, end, roller }: SupportSymbolProps) {
  let body;
  switch (support.type) {
    case "pinned":
      body = <Pin rollers={roller} />;
      break;
    case "fixed":
      body = end ? <Wall side={end} /> : <Line points={[-10, 4, 10, 4, 10, 20, -10, 20]} closed stroke={stroke} fill={colors.grid} strokeWidth={1.5} />;
      break;
    case "guided":
      body = (
        <>
          <Line points={[-12, 14, 12, 14]} stroke={stroke} strokeWidth={2} />
          <Line points={[-12, 4, 12, 4]} stroke={stroke} strokeWidth={2} />
          <Circle x={-6} y={9} radius={2.5} stroke={stroke} strokeWidth={1} />
          <Circle x={6} y={9} radius={2.5} stroke={stroke} strokeWidth={1} />
          <Hatch x1={-12} x2={12} y={20} />
        </>
      );
      break;
    case "spring":
      body = <Spring ky={support.ky ?? 0} kr={support.kr ?? 0} />;
      break;
  }
  return (
    <Group x={px} y={y} listening={false}>
      {body}
    </Group>
  );
}
