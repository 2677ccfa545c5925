'use client';

import { useState } from 'react';
import type { BracketRow } from '@/components/checks/check-types';
import type { CheckBody } from '@/components/offline/offline-db';
import { parseLength, type Units } from '@/lib/units';

type Props = {
  formId: string;
  span: number;
  girder: string;
  row: BracketRow;
  units: Units;
  onRecord: (body: CheckBody) => void;
};

type Errors = { width?: string; reading?: string };

function check(width: number | null, reading: number | null, units: Units, readingAsked: boolean): Errors {
  const errs: Errors = {};
  if (width !== null && (!Number.isFinite(width) || width <= 0)) errs.width = units === 'm' ? 'Type the width in metres, e.g. 1.382.' : `Type decimal feet (4.53) or feet-inches (4'-6 3/8").`;
  if (reading !== null && !Number.isFinite(reading)) errs.reading = units === 'm' ? 'Type the reading in metres, e.g. 0.084.' : 'Type the reading in decimal feet, e.g. 0.32.';
  if (width === null && reading === null) errs.width = 'Type the measured edge width' + (readingAsked ? ' or the level-bar reading.' : '.');
  return errs;
}

/**
 * The measurement at one bracket: edge width (decimal or feet-inches), level-bar reading where the top
 * of girder was surveyed, and a note. Submitted by the Record button in the bottom bar (form={formId}).
 * Mount it with a key per bracket so moving on clears it.
 */
export default function FieldMeasureForm({ formId, span, girder, row, units, onRecord }: Props) {
  const [widthText, setWidthText] = useState('');
  const [readingText, setReadingText] = useState('');
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<Errors>({});

  function submit(event: React.FormEvent) {
    event.preventDefault();
    const width = parseLength(widthText, units);
    const reading = row.reading === null ? null : parseLength(readingText, units);
    const errs = check(width, reading, units, row.reading !== null);
    setErrors(errs);
    if (errs.width || errs.reading) return;
    onRecord({ span, girder, point: row.point, measured_edge_width: width, measured_drop_from_girder_top: reading, note: note.trim() });
    setWidthText('');
    setReadingText('');
    setNote('');
  }

  const field = (name: 'width' | 'reading') => ({
    'aria-invalid': errors[name] ? true : undefined,
    'aria-describedby': errors[name] ? `${formId}-${name}-error` : undefined,
  });

  return (
    <form id={formId} onSubmit={submit} noValidate className="mt-4 space-y-3">
      <div>
        <label htmlFor={`${formId}-width`} className="field-label">
          Measured edge width <span className="font-normal text-concrete-500">(from the string line, {units === 'm' ? 'm' : 'ft or ft-in'})</span>
        </label>
        <input
          id={`${formId}-width`}
          inputMode={units === 'm' ? 'decimal' : 'text'}
          autoComplete="off"
          value={widthText}
          onChange={(e) => setWidthText(e.target.value)}
          placeholder={units === 'm' ? 'e.g. 1.382' : `e.g. 4.53 or 4'-6 3/8"`}
          {...field('width')}
          className="field-input tabular h-14 text-2xl"
        />
        {errors.width ? (
          <p id={`${formId}-width-error`} className="field-error">
            {errors.width}
          </p>
        ) : null}
      </div>
      <div>
        <label htmlFor={`${formId}-reading`} className="field-label">
          Level-bar reading from the girder top <span className="font-normal text-concrete-500">({units})</span>
        </label>
        {row.reading === null ? (
          <p id={`${formId}-reading`} className="mt-1 rounded-md border border-concrete-300 bg-concrete-100 px-3 py-2 text-sm text-concrete-700">
            The top of girder was not surveyed at this point, so there is no reading to check here. Record the edge width only.
          </p>
        ) : (
          <>
            <input
              id={`${formId}-reading`}
              inputMode="decimal"
              autoComplete="off"
              value={readingText}
              onChange={(e) => setReadingText(e.target.value)}
              placeholder={units === 'm' ? 'e.g. 0.084' : 'e.g. 0.32'}
              {...field('reading')}
              className="field-input tabular h-14 text-2xl"
            />
            {errors.reading ? (
              <p id={`${formId}-reading-error`} className="field-error">
                {errors.reading}
              </p>
            ) : null}
          </>
        )}
      </div>
      <div>
        <label htmlFor={`${formId}-note`} className="field-label">
          Note <span className="font-normal text-concrete-500">(optional)</span>
        </label>
        <input id={`${formId}-note`} value={note} maxLength={500} onChange={(e) => setNote(e.target.value)} className="field-input" />
      </div>
    </form>
  );
}
