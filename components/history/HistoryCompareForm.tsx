type Revision = { revision: number; author: string | null; createdAt: string };

/** Picks the two revisions to compare (a plain GET form, so the comparison has its own address). */
export default function HistoryCompareForm({ bridgeId, revisions, from, to }: { bridgeId: number; revisions: Revision[]; from: number | null; to: number | null }) {
  const options = revisions.map((r) => (
    <option key={r.revision} value={r.revision}>
      Revision {r.revision}
      {r.author ? ` · ${r.author}` : ''}
    </option>
  ));
  return (
    <form method="get" action={`/bridges/${bridgeId}/history`} className="card flex flex-wrap items-end gap-3 p-4">
      <div>
        <label htmlFor="compare-from" className="field-label">
          Compare
        </label>
        <select id="compare-from" name="from" defaultValue={from ?? undefined} className="field-input">
          {options}
        </select>
      </div>
      <div>
        <label htmlFor="compare-to" className="field-label">
          with
        </label>
        <select id="compare-to" name="to" defaultValue={to ?? undefined} className="field-input">
          {options}
        </select>
      </div>
      <button type="submit" className="btn-primary">
        Show changes
      </button>
    </form>
  );
}
