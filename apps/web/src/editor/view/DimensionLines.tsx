import { Group, Line, Text } from "./konva";
import type { BeamDocument } from "../model/BeamDocument";
import { BEAM_Y } from "../geometry/sceneLayout";
import { formatFeetInches, formatQuantity } from "../units/formatQuantity";
import { colors } from "./colors";
import type { NodeShape } from "../geometry/sceneLayout";

const ROW1 = BEAM_Y + 52; // per-segment dimensions
const ROW2 = BEAM_Y + 76; // overall length

function lengthLabel(metres: number, doc: BeamDocument): string {
  return doc.units === "us" ? formatFeetInches(metres) : formatQuantity(metres, "si", "length", 5);
}

function Dimension({ px1, px2, y, label }: { px1: number; px2: number; y: number; label: string }) {
  const width = px2 - px1;
  return (
    <Group listening={false}>
      <Line points={[px1, y, px2, y]} stroke={colors.dimension} strokeWidth={1} />
      <Line points={[px1, y - 5, px1, y + 5]} stroke={colors.dimension} strokeWidth={1} />
      <Line points={[px2, y - 5, px2, y + 5]} stroke={colors.dimension} strokeWidth={1} />
      <Line points={[px1 - 3, y + 3, px1 + 3, y - 3]} stroke={colors.dimension} strokeWidth={1.2} />
      <Line points={[px2 - 3, y + 3, px2 + 3, y - 3]} stroke={colors.dimension} strokeWidth={1.2} />
      {width > 36 && <Text x={px1} width={width} y={y - 14} align="center" text={label} fontSize={11} fill={colors.dimension} />}
    </Group>
  );
}

/** Dimension lines under the beam: each segment, then the overall length. */
export function DimensionLines({ doc, nodes }: { doc: BeamDocument; nodes: readonly NodeShape[] }) {
  const first = nodes[0];
  const last = nodes[nodes.length - 1];
  return (
    <>
      {nodes.slice(1).map((n, i) => {
        const a = nodes[i]!;
        return <Dimension key={n.id} px1={a.px} px2={n.px} y={ROW1} label={lengthLabel(doc.nodes[i + 1]!.x - doc.nodes[i]!.x, doc)} />;
      })}
      {first && last && nodes.length > 2 && (
        <Dimension px1={first.px} px2={last.px} y={ROW2} label={lengthLabel(doc.nodes[doc.nodes.length - 1]!.x - doc.nodes[0]!.x, doc)} />
      )}
    </>
  );
}
