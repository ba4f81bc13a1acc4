import { flexRender, type Header, type Table } from "@tanstack/react-table";

/**
 * A column header of the reaction tables: a leaf column that can sort is a button with the sort
 * direction announced through aria-sort; group and placeholder headers are plain text.
 */
export function SortableHeaderCell<Row>({ header }: { header: Header<Row, unknown> }) {
  const sorted = header.column.getIsSorted();
  const sortable = !header.isPlaceholder && header.subHeaders.length === 0 && header.column.getCanSort();
  const label = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
  return (
    <th
      colSpan={header.colSpan}
      scope="col"
      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
      className="whitespace-nowrap px-3 py-2 font-medium"
    >
      {sortable ? (
        <button type="button" className="hover:underline" onClick={header.column.getToggleSortingHandler()}>
          {label}
          <span aria-hidden="true">{sorted === "asc" ? " ▲" : sorted === "desc" ? " ▼" : ""}</span>
        </button>
      ) : (
        label
      )}
    </th>
  );
}

/** The header rows of a reaction table, one sortable cell per leaf column. */
export function SortableTableHead<Row>({ table }: { table: Table<Row> }) {
  return (
    <thead className="bg-paper-50 text-xs text-paper-700">
      {table.getHeaderGroups().map((hg) => (
        <tr key={hg.id} className="border-b border-paper-200">
          {hg.headers.map((h) => (
            <SortableHeaderCell key={h.id} header={h} />
          ))}
        </tr>
      ))}
    </thead>
  );
}
