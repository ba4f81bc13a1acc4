import type { CheckInput, SpanCheckRow } from "@spanwright/solver/design";
import { formatNumber } from "../editor/units/formatQuantity";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { formatDesign, quantityOfSiUnit } from "./designUnits";

function formatValue(value: number | string, unit: string, symbol: string, units: UnitSystemId): string {
  if (typeof value === "string") return value;
  return unit === "" ? formatNumber(value) : formatDesign(value, units, quantityOfSiUnit(unit, symbol));
}

function InputList({ inputs, units }: { inputs: readonly CheckInput[]; units: UnitSystemId }) {
  return (
    <ul className="grid grid-cols-2 gap-x-4 gap-y-0.5">
      {inputs.map((i) => (
        <li key={i.symbol} title={i.description} className="whitespace-nowrap">
          <span className="font-mono">{i.symbol}</span> = {formatValue(i.value, i.unit, i.symbol, units)}
        </li>
      ))}
    </ul>
  );
}

const statusClasses = {
  pass: "bg-success-50 text-success-600",
  fail: "bg-danger-50 text-danger-700",
  "not-covered": "bg-caution-50 text-caution-700",
} as const;

const statusLabels = { pass: "Pass", fail: "Fail", "not-covered": "Not covered" } as const;

/** One row per check: inputs, formula, clause, demand, capacity, utilisation and pass/fail. */
export function CheckTable({ rows, units }: { rows: readonly SpanCheckRow[]; units: UnitSystemId }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[64rem] text-sm" aria-label="Member checks">
        <thead>
          <tr className="border-b border-paper-300 text-left text-xs uppercase tracking-wide text-paper-600">
            <th className="py-1 pr-3">Span</th>
            <th className="py-1 pr-3">Case</th>
            <th className="py-1 pr-3">Check</th>
            <th className="py-1 pr-3">Inputs</th>
            <th className="py-1 pr-3">Formula</th>
            <th className="py-1 pr-3">Clause</th>
            <th className="py-1 pr-3 text-right">Demand</th>
            <th className="py-1 pr-3 text-right">Capacity</th>
            <th className="py-1 pr-3 text-right">Utilisation</th>
            <th className="py-1">Result</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => {
            const c = r.check;
            return (
              <tr key={`${r.span}-${r.caseId}-${c.id}-${i}`} className="border-b border-paper-200 align-top" data-status={c.status}>
                <td className="py-2 pr-3 whitespace-nowrap">
                  {r.span}
                  <div className="text-xs text-paper-600">
                    x = {formatDesign(r.x1, units, "length")} – {formatDesign(r.x2, units, "length")}
                  </div>
                </td>
                <td className="py-2 pr-3 font-mono">{r.caseId}</td>
                <td className="py-2 pr-3">{c.title}</td>
                <td className="min-w-[16rem] py-2 pr-3 text-xs text-paper-700">
                  <InputList inputs={c.inputs} units={units} />
                </td>
                <td className="py-2 pr-3 font-mono text-xs">{c.formula}</td>
                <td className="py-2 pr-3 text-xs text-paper-700">
                  {c.source}
                  {c.notes.map((n) => (
                    <div key={n} className="mt-1 text-paper-600">
                      {n}
                    </div>
                  ))}
                </td>
                {c.status === "not-covered" ? (
                  <td colSpan={3} className="py-2 pr-3 text-xs text-caution-700">
                    {c.reason}
                  </td>
                ) : (
                  <>
                    <td className="py-2 pr-3 text-right font-mono tabular-nums whitespace-nowrap">{formatValue(c.demand, c.unit, "", units)}</td>
                    <td className="py-2 pr-3 text-right font-mono tabular-nums whitespace-nowrap">{formatValue(c.capacity, c.unit, "", units)}</td>
                    <td className="py-2 pr-3 text-right font-mono tabular-nums" data-utilisation={c.utilisation}>
                      {formatNumber(c.utilisation, 3)}
                    </td>
                  </>
                )}
                <td className="py-2">
                  <span className={`rounded-sm px-2 py-0.5 text-xs font-semibold ${statusClasses[c.status]}`}>{statusLabels[c.status]}</span>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
