import { flexRender, type Header } from "@tanstack/react-table";

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
