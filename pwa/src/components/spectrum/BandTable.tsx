/** A small table of bands under a heading (explained peaks, missing bands). */
export function BandTable({ caption, columns, rows, testId }: { caption: string; columns: readonly string[]; rows: readonly (readonly string[])[]; testId: string }) {
  return (
    <div className="sb-table-wrap">
      <table className="sb-table sb-band-table" data-testid={testId}>
        <caption className="sb-band-table__caption">{caption}</caption>
        <thead>
          <tr>
            {columns.map((c) => (
              <th key={c} scope="col">
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => (
            <tr key={i}>
              {row.map((cell, j) => (
                <td key={j}>{cell}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
