/** A select's choices: one per row, by its id and name, after an empty first one in the words `empty` when given. */
export function RowOptions({ rows, empty }: { rows: readonly { id: string; name: string }[]; empty?: string }) {
  return (
    <>
      {empty !== undefined ? <option value="">{empty}</option> : null}
      {rows.map((r) => (
        <option key={r.id} value={r.id}>
          {r.name}
        </option>
      ))}
    </>
  );
}
