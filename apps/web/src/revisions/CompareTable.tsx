import { useMemo, useState } from "react";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import type { ProjectUnits, ValueChangeJson } from "@spanwright/contracts";
import { CopyTableButton } from "./CopyTableButton";
import { SortableTableHead } from "./SortableTableHead";
import {
  compareRowsToTsv,
  isHighlighted,
  severityClasses,
  severityLabels,
  toCompareRows,
  type CompareRow,
} from "./compareSeverity";
import { formatPercent, formatReaction, formatSigned, toDisplay } from "./reactionUnits";

const helper = createColumnHelper<CompareRow>();
// Mixed value types in one column array, as react-table's docs type it.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Column = ColumnDef<CompareRow, any>;

/** Older and newer reaction side by side, with the absolute and percent change per value. */
export function CompareTable({
  values,
  units,
  thresholdPct,
  from,
  to,
}: {
  values: readonly ValueChangeJson[];
  units: ProjectUnits;
  thresholdPct: number;
  from: number;
  to: number;
}) {
  const rows = useMemo(() => toCompareRows(values, thresholdPct), [values, thresholdPct]);
  const [highlightedOnly, setHighlightedOnly] = useState(false);
  const [filter, setFilter] = useState("");
  const [sorting, setSorting] = useState<SortingState>([]);
  const data = useMemo(() => (highlightedOnly ? rows.filter((r) => isHighlighted(r.severity)) : rows), [rows, highlightedOnly]);

  const columns = useMemo((): Column[] => {
    const value = (pick: (r: CompareRow) => number | null, id: string, header: string): Column =>
      helper.accessor((r) => pick(r) ?? Number.NaN, {
        id,
        header,
        cell: (info) => {
          const v = pick(info.row.original);
          return v === null ? "—" : formatReaction(units, info.row.original.unitKind, v);
        },
      });
    return [
      helper.accessor("label", { header: "Support" }),
      helper.accessor("result", { header: "Result" }),
      helper.accessor((r) => units[r.unitKind].label, { id: "unit", header: "Unit", enableSorting: false }),
      value((r) => r.before, "before", `r${from}`),
      value((r) => r.after, "after", `r${to}`),
      helper.accessor((r) => (r.change === null ? Number.NaN : toDisplay(units, r.unitKind, r.change)), {
        id: "change",
        header: "Change",
        cell: (info) => (info.row.original.change === null ? "—" : formatSigned(info.getValue<number>())),
      }),
      helper.accessor((r) => (r.changePct === null ? Number.NaN : Math.abs(r.changePct)), {
        id: "changePct",
        header: "Change %",
        cell: (info) => (info.row.original.changePct === null ? "—" : formatPercent(info.row.original.changePct)),
      }),
      helper.accessor("severity", {
        header: "",
        enableSorting: false,
        cell: (info) => {
          const severity = info.row.original.severity;
          return isHighlighted(severity) ? severityLabels[severity] : "";
        },
      }),
    ];
  }, [units, from, to]);

  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    sortDescFirst: false,
    globalFilterFn: (row, _id, f: string) =>
      `${row.original.label} ${row.original.result}`.toLowerCase().includes(f.trim().toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const shown = table.getRowModel().rows.map((r) => r.original);
  const highlightedCount = rows.filter((r) => isHighlighted(r.severity)).length;

  return (
    <div className="space-y-3">
      <p className="text-sm text-paper-700">
        {highlightedCount === 0
          ? `No reaction changes by more than ${thresholdPct} %.`
          : `${highlightedCount} value${highlightedCount === 1 ? "" : "s"} changed by more than ${thresholdPct} % (the project threshold), appeared or disappeared.`}
      </p>
      <div className="flex flex-wrap items-end gap-4 text-sm">
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-800">Filter</span>
          <input
            type="search"
            value={filter}
            onChange={(e) => setFilter(e.target.value)}
            placeholder="S2, C1…"
            className="h-8 rounded-md border border-paper-300 bg-white px-2 text-sm"
          />
        </label>
        <label className="flex items-center gap-1.5">
          <input type="checkbox" checked={highlightedOnly} onChange={(e) => setHighlightedOnly(e.target.checked)} />
          Only changes beyond the threshold
        </label>
        <CopyTableButton text={() => compareRowsToTsv(shown, units, from, to)} />
      </div>
      <div className="overflow-x-auto rounded-md border border-paper-200">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">{`Reactions of r${from} and r${to} with the change`}</caption>
          <SortableTableHead table={table} />
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.original.key} data-severity={row.original.severity}
                className={`border-b border-paper-100 last:border-0 ${severityClasses[row.original.severity]}`}>
                {row.getVisibleCells().map((c) => (
                  <td key={c.id} className="tabular whitespace-nowrap px-3 py-1.5">
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
