import type { SectionProperties } from "@spanwright/solver/design";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { formatDesign, type DesignQuantity } from "./designUnits";

interface Row {
  readonly symbol: string;
  readonly name: string;
  readonly value: number | null;
  readonly quantity: DesignQuantity;
}

function rowsOf(p: SectionProperties): Row[] {
  return [
    { symbol: "A", name: "Area", value: p.A, quantity: "area" },
    { symbol: "I", name: "Second moment of area (strong axis)", value: p.I, quantity: "secondMoment" },
    { symbol: "d", name: "Depth", value: p.depth, quantity: "dimension" },
    { symbol: "ȳtop", name: "Centroid below the top fibre", value: p.yTop, quantity: "dimension" },
    { symbol: "Stop", name: "Elastic modulus to the top fibre, I/ȳtop", value: p.Stop, quantity: "sectionModulus" },
    { symbol: "Sbot", name: "Elastic modulus to the bottom fibre", value: p.Sbot, quantity: "sectionModulus" },
    { symbol: "Z", name: "Plastic modulus", value: p.Z, quantity: "sectionModulus" },
    { symbol: "Q", name: "First moment of area at the neutral axis", value: p.Q, quantity: "sectionModulus" },
    { symbol: "b(NA)", name: "Width at the neutral axis", value: p.bNA, quantity: "dimension" },
    { symbol: "As", name: "Shear area (Timoshenko)", value: p.shearArea, quantity: "area" },
    { symbol: "κ", name: "Shear factor As/A", value: p.shearFactor, quantity: "ratio" },
  ];
}

/** Read-only table of computed section properties in display units. */
export function SectionPropertiesTable({ properties, units }: { properties: SectionProperties; units: UnitSystemId }) {
  return (
    <table className="w-full text-sm" aria-label="Section properties">
      <tbody>
        {rowsOf(properties).map((r) => (
          <tr key={r.symbol} className="border-b border-paper-200 last:border-0">
            <th scope="row" className="w-16 py-1 pr-2 text-left font-mono font-medium text-ink-800">
              {r.symbol}
            </th>
            <td className="py-1 pr-2 text-paper-700">{r.name}</td>
            <td className="py-1 text-right font-mono tabular-nums text-ink-900" data-symbol={r.symbol}>
              {r.value === null ? "not known" : formatDesign(r.value, units, r.quantity)}
            </td>
          </tr>
        ))}
        <tr>
          <td colSpan={3} className="pt-2 text-xs text-paper-600">
            Shear area basis: {properties.shearAreaBasis}
          </td>
        </tr>
      </tbody>
    </table>
  );
}
