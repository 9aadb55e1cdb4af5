/** A column of a plain table's head: its words, and classes of its own (alignment) beside the shared ones. */
export type HeadColumn = string | { label: string; className?: string };

/**
 * The head of a plain (not sortable) table: one row of column names, each cell with `cellClassName`
 * ("px-3 py-1.5 font-medium") and its own classes.
 */
export function HeadRow({ columns, className, cellClassName }: { columns: readonly HeadColumn[]; className?: string; cellClassName: string }) {
  return (
    <thead className={className}>
      <tr>
        {columns.map((c) => {
          const { label, className: own } = typeof c === "string" ? { label: c, className: undefined } : c;
          return (
            <th key={label} className={own ? `${cellClassName} ${own}` : cellClassName}>
              {label}
            </th>
          );
        })}
      </tr>
    </thead>
  );
}
