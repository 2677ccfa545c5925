'use client';

import { useState } from 'react';
import { elevationCell, type Units } from '@/lib/units';

export type SurveyPreviewJson = {
  bridge_id: number;
  revision: number;
  units: Units;
  header: boolean;
  delimiter: string;
  decimal_comma: boolean;
  file_problems: string[];
  rows: { line: number; girder: string; span: number | null; point: number | null; elevation: number | null; problems: string[]; replaces: number | null }[];
  summary: { rows: number; good: number; bad: number; replacing: number };
};

/** The per-row report of a survey file that has been checked but not stored. */
export default function SurveyPreviewTable({ preview, filename }: { preview: SurveyPreviewJson; filename: string }) {
  const [onlyProblems, setOnlyProblems] = useState(preview.summary.bad > 0);
  const elev = (v: number | null) => elevationCell(v, preview.units);
  const rows = onlyProblems ? preview.rows.filter((r) => r.problems.length > 0) : preview.rows;
  const { summary } = preview;
  return (
    <div>
      <div className={`rounded-md border p-3 text-sm ${summary.bad > 0 || preview.file_problems.length ? 'border-fail-600 bg-fail-100' : 'border-pass-600 bg-pass-100'}`}>
        <p className="font-semibold text-concrete-900">
          {filename}: {summary.rows} {summary.rows === 1 ? 'row' : 'rows'} checked against revision {preview.revision} — {summary.good} good,{' '}
          <span className={summary.bad > 0 ? 'text-fail-600' : ''}>{summary.bad} with problems</span>
          {summary.replacing > 0 ? `, ${summary.replacing} would replace a stored value` : ''}. Nothing has been stored yet.
        </p>
        <p className="mt-1 text-concrete-700" data-testid="survey-delimiter">
          Cells separated by {preview.delimiter}
          {preview.decimal_comma ? '; a decimal comma in an elevation is read as a decimal point' : ''}.
        </p>
        {preview.file_problems.map((p) => (
          <p key={p} className="mt-1 text-fail-600">
            {p}
          </p>
        ))}
      </div>
      {preview.rows.length > 0 ? (
        <>
          <label className="mt-3 inline-flex min-h-11 items-center gap-2 text-sm text-concrete-800">
            <input type="checkbox" className="h-5 w-5" checked={onlyProblems} onChange={(e) => setOnlyProblems(e.target.checked)} />
            Show only rows with problems
          </label>
          <div className="card mt-2 max-h-[28rem] overflow-auto">
            <table className="w-full text-sm">
              <caption className="sr-only">Row report of {filename}</caption>
              <thead className="sticky top-0 bg-concrete-100 text-concrete-600">
                <tr>
                  <th scope="col" className="px-3 py-2 text-right font-semibold">
                    Line
                  </th>
                  <th scope="col" className="px-3 py-2 text-left font-semibold">
                    Girder
                  </th>
                  <th scope="col" className="px-3 py-2 text-right font-semibold">
                    Span
                  </th>
                  <th scope="col" className="px-3 py-2 text-right font-semibold">
                    Point
                  </th>
                  <th scope="col" className="px-3 py-2 text-right font-semibold">
                    Top of girder ({preview.units})
                  </th>
                  <th scope="col" className="px-3 py-2 text-right font-semibold">
                    Stored now ({preview.units})
                  </th>
                  <th scope="col" className="px-3 py-2 text-left font-semibold">
                    Check
                  </th>
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={r.line} className={`border-t border-concrete-100 ${r.problems.length ? 'bg-fail-100' : ''}`}>
                    <th scope="row" className="px-3 py-1.5 text-right font-semibold text-concrete-800">
                      {r.line}
                    </th>
                    <td className="px-3 py-1.5">{r.girder || '—'}</td>
                    <td className="px-3 py-1.5 text-right">{r.span ?? '—'}</td>
                    <td className="px-3 py-1.5 text-right">{r.point ?? '—'}</td>
                    <td className="px-3 py-1.5 text-right">{elev(r.elevation)}</td>
                    <td className="px-3 py-1.5 text-right text-concrete-600">{elev(r.replaces)}</td>
                    <td className={`px-3 py-1.5 ${r.problems.length ? 'text-fail-600' : 'text-pass-700'}`}>{r.problems.length ? r.problems.join(' ') : 'OK'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      ) : null}
    </div>
  );
}
