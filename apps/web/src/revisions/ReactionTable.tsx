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
import type { ProjectUnits, ReactionTableJson } from "@spanwright/contracts";
import { Alert } from "../components/Alert";
import { Caution } from "../components/Caution";
import { CopyTableButton } from "./CopyTableButton";
import { SortableTableHead } from "./SortableTableHead";
import { reactionTableToTsv } from "./copyAsTable";
import {
  describeColumn,
  groupLabels,
  pivotReactions,
  type ReactionGroup,
  type ReactionSupportRow,
} from "./pivotReactions";
import { formatReaction, toDisplay } from "./reactionUnits";

const helper = createColumnHelper<ReactionSupportRow>();
// Columns of mixed value types (string, number) share one array; react-table's own docs type it so.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Column = ColumnDef<ReactionSupportRow, any>;
const allGroups: ReactionGroup[] = ["case", "combination", "envelope"];

/**
 * The reaction table handed to the foundation designer: a row per support, columns per load case,
 * combination and envelope, in the project's units. Signs: the force the support exerts on the
 * beam, positive upward, so a negative Fy pulls the beam down (uplift, flagged).
 */
export function ReactionTable({
  table,
  units,
  caption,
}: {
  table: ReactionTableJson;
  units: ProjectUnits;
  caption?: string;
}) {
  const pivot = useMemo(() => pivotReactions(table), [table]);
  const [groups, setGroups] = useState<ReadonlySet<ReactionGroup>>(new Set(allGroups));
  const [supportFilter, setSupportFilter] = useState("");
  const [upliftOnly, setUpliftOnly] = useState(false);
  const [sorting, setSorting] = useState<SortingState>([]);

  const visibleColumns = useMemo(() => pivot.columns.filter((c) => groups.has(c.group)), [pivot, groups]);
  const data = useMemo(() => (upliftOnly ? pivot.rows.filter((r) => r.hasUplift) : pivot.rows), [pivot, upliftOnly]);

  const columns = useMemo(() => {
    const fixed: Column[] = [
      helper.accessor("label", {
        header: "Support",
        cell: (info) => (
          <span className="font-medium text-ink-900">
            {info.getValue()}
            {info.row.original.hasUplift && (
              <span className="ml-2 rounded-sm bg-danger-50 px-1.5 py-0.5 text-xs font-semibold text-danger-700">uplift</span>
            )}
          </span>
        ),
      }),
      helper.accessor((r) => r.x, {
        id: "x",
        header: `x (${units.length.label})`,
        cell: (info) => Number(toDisplay(units, "length", info.getValue()).toPrecision(6)),
        enableColumnFilter: false,
      }),
      helper.accessor("support", { header: "Type", enableColumnFilter: false }),
    ];
    const grouped = allGroups
      .filter((g) => visibleColumns.some((c) => c.group === g))
      .map((g) =>
        helper.group({
          id: `group-${g}`,
          header: groupLabels[g],
          columns: visibleColumns
            .filter((c) => c.group === g)
            .map((c) =>
              helper.accessor((r) => r.values[c.key] ?? Number.NaN, {
                id: c.key,
                header: `${describeColumn(c)} (${units[c.unitKind].label})`,
                sortUndefined: "last",
                enableColumnFilter: false,
                cell: (info) => {
                  const uplift = info.row.original.upliftKeys.has(c.key);
                  const value = info.row.original.values[c.key];
                  return (
                    <span className={uplift ? "font-semibold text-danger-700" : undefined} title={uplift ? "Uplift: the support pulls the beam down" : undefined}>
                      {value === undefined ? "" : formatReaction(units, c.unitKind, value)}
                      {uplift && <span className="sr-only"> (uplift)</span>}
                    </span>
                  );
                },
              }),
            ),
        }),
      ) as Column[];
    return [...fixed, ...grouped];
  }, [visibleColumns, units]);

  const reactTable = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: supportFilter },
    onSortingChange: setSorting,
    // Ascending first for every column, numbers included, so one click always means the same.
    sortDescFirst: false,
    onGlobalFilterChange: setSupportFilter,
    globalFilterFn: (row, _columnId, filter: string) =>
      row.original.label.toLowerCase().includes(filter.trim().toLowerCase()) ||
      row.original.support.toLowerCase().includes(filter.trim().toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const shownRows = reactTable.getRowModel().rows.map((r) => r.original);
  const upliftLabels = pivot.rows.filter((r) => r.hasUplift).map((r) => r.label);

  const toggleGroup = (g: ReactionGroup) =>
    setGroups((prev) => {
      const next = new Set(prev);
      if (next.has(g)) next.delete(g);
      else next.add(g);
      return next;
    });

  return (
    <div className="space-y-3">
      {upliftLabels.length > 0 && (
        <Alert tone="caution" title="Uplift">
          {`${upliftLabels.join(", ")} pull${upliftLabels.length === 1 ? "s" : ""} the beam down in at least one case or combination: the support must hold the beam down.`}
        </Alert>
      )}
      <div className="flex flex-wrap items-end gap-4 text-sm">
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-800">Filter supports</span>
          <input
            type="search"
            value={supportFilter}
            onChange={(e) => setSupportFilter(e.target.value)}
            placeholder="S2, fixed…"
            className="h-8 rounded-md border border-paper-300 bg-white px-2 text-sm"
          />
        </label>
        <fieldset className="flex flex-wrap gap-3">
          <legend className="sr-only">Columns</legend>
          {allGroups.map((g) => (
            <label key={g} className="flex items-center gap-1.5">
              <input type="checkbox" checked={groups.has(g)} onChange={() => toggleGroup(g)} />
              {groupLabels[g]}
            </label>
          ))}
          <label className="flex items-center gap-1.5">
            <input type="checkbox" checked={upliftOnly} onChange={(e) => setUpliftOnly(e.target.checked)} />
            Uplift only
          </label>
        </fieldset>
        <CopyTableButton text={() => reactionTableToTsv(visibleColumns, shownRows, units)} />
      </div>
      <div className="overflow-x-auto rounded-md border border-paper-200">
        <table className="w-full text-left text-sm">
          {caption !== undefined && <caption className="sr-only">{caption}</caption>}
          <SortableTableHead table={reactTable} />
          <tbody>
            {reactTable.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-paper-100 last:border-0">
                {row.getVisibleCells().map((c) => (
                  <td key={c.id} className="tabular whitespace-nowrap px-3 py-2 text-paper-800">
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {shownRows.length === 0 && (
              <tr>
                <td colSpan={reactTable.getVisibleLeafColumns().length} className="px-3 py-4 text-paper-600">
                  No support matches the filter.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-paper-600">
        Signs: the force the support exerts on the beam, Fy positive upward, Mz positive counterclockwise. Load cases are
        unfactored; combinations are factored.
      </p>
      <Caution />
    </div>
  );
}
