/** A small titled table for the geometry summary: header cells and rows of already-formatted text. */
export default function SummaryTable({
  title,
  headers,
  rows,
  numericFrom = 1,
  empty,
}: {
  title: string;
  headers: string[];
  rows: React.ReactNode[][];
  /** Columns from this index on are right-aligned numbers. */
  numericFrom?: number;
  empty?: string;
}) {
  return (
    <section className="card overflow-hidden">
      <h3 className="border-b border-concrete-200 bg-concrete-100 px-4 py-2 text-sm font-bold text-concrete-800">{title}</h3>
      {rows.length === 0 ? (
        <p className="px-4 py-3 text-sm text-concrete-600">{empty ?? 'None.'}</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <thead className="text-concrete-600">
              <tr>
                {headers.map((h, i) => (
                  <th key={h} scope="col" className={`whitespace-nowrap px-4 py-2 font-semibold ${i >= numericFrom ? 'text-right' : 'text-left'}`}>
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {rows.map((row, r) => (
                <tr key={r} className="border-t border-concrete-100">
                  {row.map((cell, i) => (
                    <td key={i} className={`whitespace-nowrap px-4 py-2 ${i >= numericFrom ? 'text-right' : 'text-left'}`}>
                      {cell}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
