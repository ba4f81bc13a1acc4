/** A column of a plain table head; `hidden` keeps the name for screen readers only (an actions column). */
export interface TableColumn {
  readonly label: string;
  readonly hidden?: boolean;
}

/**
 * The head row of the app's plain (not sortable) tables. `false` entries are left out, so a column
 * shown only for some roles reads `canEdit && { label: "Actions", hidden: true }`.
 */
export function TableHead({ columns, compact = false }: { readonly columns: readonly (TableColumn | string | false)[]; readonly compact?: boolean }) {
  const shown = columns.filter((c): c is TableColumn | string => c !== false).map((c) => (typeof c === "string" ? { label: c } : c));
  const padding = compact ? "py-1.5" : "py-2";
  return (
    <thead className="border-b border-paper-200 text-xs uppercase tracking-wide text-paper-600">
      <tr>
        {shown.map((c, i) => (
          <th key={c.label} scope="col" className={`${padding} ${i < shown.length - 1 ? "pr-3 " : ""}font-medium`}>
            {c.hidden ? <span className="sr-only">{c.label}</span> : c.label}
          </th>
        ))}
      </tr>
    </thead>
  );
}
