'use client';

import { useId, useState } from 'react';
import EditorSelect from '@/components/editor/EditorSelect';
import { DEFLECTION_UNIT_WORDS, readDeflectionPaste, type DeflectionUnit, type PastedDeflection } from '@/lib/editor/deflection-paste';

/**
 * Paste from a spreadsheet or upload a CSV of deflection rows: the unit of the pasted values is said
 * and chosen on screen and converted to the bridge's unit; rows of numbers only go to the chosen
 * girder, span after span; rows may also start with the girder name and span number.
 */
export default function EditorDeflectionPaste({ into, girders, spans, onRows }: { into: DeflectionUnit; girders: string[]; spans: number; onRows: (rows: PastedDeflection[]) => void }) {
  const id = useId();
  const [text, setText] = useState('');
  const [unit, setUnit] = useState<DeflectionUnit>(into);
  const [girder, setGirder] = useState(girders[0] ?? '');
  const [firstSpan, setFirstSpan] = useState(1);
  const [report, setReport] = useState<{ ok: string | null; problems: string[] } | null>(null);
  const target = girders.includes(girder) ? girder : (girders[0] ?? '');

  function read(source: string, from: string) {
    const result = readDeflectionPaste(source, { unit, into, girders, spans, girder: target, firstSpan });
    if (result.rows.length > 0) onRows(result.rows);
    const list = result.rows.map((r) => `${r.girder} span ${r.span}`).join(', ');
    setReport({
      ok:
        result.rows.length > 0
          ? `Read ${result.rows.length} ${result.rows.length === 1 ? 'row' : 'rows'} from ${from} (${DEFLECTION_UNIT_WORDS[unit]}${unit === into ? '' : `, shown in ${DEFLECTION_UNIT_WORDS[into]}`}): ${list}.${result.header ? ' The first row was taken as a header.' : ''}`
          : null,
      problems: result.problems.length > 0 || result.rows.length > 0 ? result.problems : ['Nothing to read: paste rows of numbers, one row per girder and span.'],
    });
  }

  return (
    <div className="rounded-md border border-concrete-200 bg-concrete-50/60 p-3" data-testid="deflection-paste">
      <h3 className="text-sm font-bold text-concrete-800">Paste from a spreadsheet or upload a CSV</h3>
      <p className="mt-0.5 text-xs text-concrete-600">
        One row per girder and span, the values at 0.0, 0.1, … 1.0 of the span (tab- or comma-separated). Start a row with the girder name and span number (G1, 2, …), or paste rows of numbers only:
        they go to the girder below, span after span.
      </p>
      <div className="mt-2 flex flex-wrap items-end gap-3">
        <EditorSelect
          label="Values are in"
          value={unit}
          onChange={setUnit}
          options={(Object.keys(DEFLECTION_UNIT_WORDS) as DeflectionUnit[]).map((u) => ({ value: u, label: DEFLECTION_UNIT_WORDS[u] }))}
          width="w-36"
        />
        <EditorSelect label="Rows of numbers go to" value={target} onChange={setGirder} options={girders.map((g) => ({ value: g, label: g }))} width="w-28" />
        <EditorSelect
          label="from span"
          value={String(firstSpan)}
          onChange={(v) => setFirstSpan(Number(v))}
          options={Array.from({ length: spans }, (_, i) => ({ value: String(i + 1), label: String(i + 1) }))}
          width="w-24"
        />
      </div>
      <label htmlFor={`${id}-text`} className="mt-2 block text-xs font-semibold text-concrete-600">
        Pasted rows (values in {DEFLECTION_UNIT_WORDS[unit]})
      </label>
      <textarea
        id={`${id}-text`}
        value={text}
        onChange={(e) => setText(e.target.value)}
        rows={4}
        spellCheck={false}
        className="tabular mt-1 w-full rounded-md border border-concrete-300 bg-white p-2 font-mono text-xs"
        placeholder={'G1\t1\t0\t0.31\t0.58\t0.79\t0.92\t0.96\t0.92\t0.79\t0.58\t0.31\t0'}
      />
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <button type="button" className="btn-secondary" onClick={() => read(text, 'the pasted text')}>
          Read pasted rows
        </button>
        <label className="text-sm text-concrete-700">
          <span className="mr-2">or upload a CSV file</span>
          <input
            type="file"
            accept=".csv,.txt,text/csv,text/plain"
            className="text-sm"
            onChange={async (e) => {
              const file = e.target.files?.[0];
              if (file) read(await file.text(), file.name);
              e.target.value = '';
            }}
          />
        </label>
      </div>
      {report ? (
        <div role="status" className="mt-2 space-y-1 text-sm">
          {report.ok ? <p className="text-pass-700">{report.ok}</p> : null}
          {report.problems.length > 0 ? (
            <ul className="list-disc pl-5 text-fail-600">
              {report.problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
