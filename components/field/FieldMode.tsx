'use client';

import Link from 'next/link';
import { useCallback, useId, useMemo, useRef, useState } from 'react';
import useSWR from 'swr';
import { fetcher, type ApiError } from '@/lib/client/api-client';
import type { BracketGroup, CheckRow } from '@/components/checks/check-types';
import FieldPointStrip, { type PointState } from '@/components/field/FieldPointStrip';
import FieldResult, { type Verdict } from '@/components/field/FieldResult';
import FieldTargets from '@/components/field/FieldTargets';
import PhotoCaptureButton from '@/components/field/PhotoCaptureButton';
import SafetyCaution from '@/components/SafetyCaution';
import { useFieldQueue, type PendingCheck } from '@/components/field/use-field-queue';
import { bracketVerdict } from '@/lib/field/verdict';
import { parseLength, stationText, type Units } from '@/lib/units';

type Props = {
  bridge: { id: number; name: string; revision: number };
  units: Units;
  groups: BracketGroup[];
  widthTolerance: number;
  readingTolerance: number;
  canRecord: boolean;
};

const bracketKey = (span: number, girder: string, point: number) => `${span}|${girder}|${point}`;

/** The verdict the server would give, worked out at once on the phone (the server's answer replaces it). */
function localVerdict(p: PendingCheck, targets: { width: number; reading: number | null }, tol: { width: number; reading: number }): Verdict {
  const judged = bracketVerdict(
    { measuredWidth: p.measured_edge_width, computedWidth: targets.width, measuredReading: p.measured_drop_from_girder_top, computedReading: targets.reading },
    tol,
  );
  return {
    ...judged,
    measuredWidth: p.measured_edge_width,
    measuredReading: p.measured_drop_from_girder_top,
    state: p.lastError ? 'waiting' : 'sending',
    note: p.lastError,
    when: p.typedAt,
    checkId: null,
    revision: null,
  };
}

function serverVerdict(c: CheckRow): Verdict {
  return {
    widthDeviation: c.width_deviation,
    readingDeviation: c.reading_deviation,
    widthPass: c.width_pass,
    readingPass: c.reading_pass,
    pass: c.pass,
    measuredWidth: c.measured_edge_width,
    measuredReading: c.measured_drop_from_girder_top,
    state: 'saved',
    note: null,
    when: c.created_at,
    checkId: c.id,
    revision: c.revision,
  };
}

/**
 * Field mode: full screen on a phone, one bracket at a time. Pick span and girder, step point by point,
 * read the targets, type the measurement and see pass or fail at once. Entries are kept on the phone
 * until the server has them, so a dropped connection loses nothing.
 */
export default function FieldMode({ bridge, units, groups, widthTolerance, readingTolerance, canRecord }: Props) {
  const id = useId();
  const spans = useMemo(() => [...new Set(groups.map((g) => g.span))], [groups]);
  const [span, setSpan] = useState(spans[0]);
  const girders = groups.filter((g) => g.span === span);
  const [girder, setGirder] = useState(girders[0]?.girder ?? '');
  const group = girders.find((g) => g.girder === girder) ?? girders[0];
  const [index, setIndex] = useState(0);
  const row = group.rows[Math.min(index, group.rows.length - 1)];
  const [widthText, setWidthText] = useState('');
  const [readingText, setReadingText] = useState('');
  const [note, setNote] = useState('');
  const [inputError, setInputError] = useState<{ width?: string; reading?: string }>({});
  const resultRef = useRef<HTMLDivElement>(null);

  const checksKey = `/api/bridges/${bridge.id}/checks`;
  const { data: checks, error, mutate } = useSWR<CheckRow[], ApiError>(checksKey, fetcher, { revalidateOnFocus: true, errorRetryInterval: 10000 });

  const onSaved = useCallback(
    (check: CheckRow) => {
      void mutate((list) => [check, ...(list ?? []).filter((c) => c.id !== check.id)], { revalidate: false });
    },
    [mutate],
  );
  const queue = useFieldQueue(bridge.id, onSaved);

  const targetsOf = useCallback(
    (s: number, g: string, p: number) => {
      const r = groups.find((x) => x.span === s && x.girder === g)?.rows.find((x) => x.point === p);
      return r ? { width: r.edge_width, reading: r.reading } : null;
    },
    [groups],
  );
  const tol = { width: widthTolerance, reading: readingTolerance };

  /** Latest word on every bracket: a pending entry (newest) wins over the server's latest check. */
  const latest = useMemo(() => {
    const map = new Map<string, Verdict>();
    for (const c of [...(checks ?? [])].reverse()) map.set(bracketKey(c.span, c.girder, c.point), serverVerdict(c));
    for (const p of queue.pending) {
      const t = targetsOf(p.span, p.girder, p.point);
      if (t) map.set(bracketKey(p.span, p.girder, p.point), localVerdict(p, t, tol));
    }
    return map;
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [checks, queue.pending, targetsOf, widthTolerance, readingTolerance]);

  const states: PointState[] = group.rows.map((r) => {
    const v = latest.get(bracketKey(span, group.girder, r.point));
    if (!v) return 'none';
    if (v.state !== 'saved') return 'pending';
    if (v.revision !== null && v.revision !== bridge.revision) return 'old';
    return v.pass ? 'pass' : 'fail';
  });
  const current = latest.get(bracketKey(span, group.girder, row.point)) ?? null;
  const done = states.filter((s) => s === 'pass').length;

  function go(to: number) {
    setIndex(Math.max(0, Math.min(group.rows.length - 1, to)));
    setWidthText('');
    setReadingText('');
    setNote('');
    setInputError({});
  }

  function record(event: React.FormEvent) {
    event.preventDefault();
    const width = parseLength(widthText, units);
    const reading = row.reading === null ? null : parseLength(readingText, units);
    const errs: { width?: string; reading?: string } = {};
    if (width !== null && (!Number.isFinite(width) || width <= 0))
      errs.width = units === 'm' ? 'Type the width in metres, e.g. 1.382.' : `Type decimal feet (4.53) or feet-inches (4'-6 3/8").`;
    if (reading !== null && !Number.isFinite(reading)) errs.reading = units === 'm' ? 'Type the reading in metres, e.g. 0.084.' : 'Type the reading in decimal feet, e.g. 0.32.';
    if (width === null && reading === null) errs.width = 'Type the measured edge width' + (row.reading !== null ? ' or the level-bar reading.' : '.');
    setInputError(errs);
    if (errs.width || errs.reading) return;
    queue.enqueue({ span, girder: group.girder, point: row.point, measured_edge_width: width, measured_drop_from_girder_top: reading, note: note.trim() });
    setWidthText('');
    setReadingText('');
    setNote('');
    // Show the verdict at once, above the boxes, even with the keyboard open.
    (document.activeElement as HTMLElement | null)?.blur();
    requestAnimationFrame(() => resultRef.current?.scrollIntoView({ block: 'nearest', behavior: 'smooth' }));
  }

  const waiting = queue.pending.length;

  return (
    <div className="fixed inset-0 z-40 flex flex-col bg-concrete-50 md:relative md:inset-auto md:z-auto md:min-h-[80vh] md:overflow-hidden md:rounded-lg md:border md:border-concrete-200">
      <header className="flex items-center gap-3 bg-brand-800 px-4 py-3 text-white">
        <Link href={`/bridges/${bridge.id}/checks`} className="rounded-md px-2 py-1 text-sm font-semibold text-brand-100 hover:bg-brand-700" aria-label="Leave field mode, go to the check history">
          ◀ Checks
        </Link>
        <div className="min-w-0 flex-1">
          <h1 className="truncate text-base font-bold leading-tight">{bridge.name}</h1>
          <p className="text-xs text-brand-100">
            Field mode · revision <span className="tabular">{bridge.revision}</span>
          </p>
        </div>
        <p
          role="status"
          aria-live="polite"
          className={`rounded-full px-3 py-1 text-xs font-bold ${waiting ? 'bg-caution-100 text-caution-700' : 'bg-brand-700 text-brand-50'}`}
          title={
            waiting
              ? 'Measurements kept on this phone; they go to the server by themselves when the connection allows.'
              : 'Every measurement recorded on this phone has reached the server.'
          }
        >
          {waiting ? `${waiting} not sent${queue.online ? '' : ' · offline'}` : error ? 'Offline' : 'All sent'}
        </p>
      </header>

      <div className="flex-1 overflow-y-auto px-4 pb-4 pt-3">
        <div className="grid grid-cols-2 gap-3">
          <fieldset>
            <legend className="field-label">Span</legend>
            <div className="mt-1 flex gap-1">
              {spans.map((s) => (
                <button
                  key={s}
                  type="button"
                  aria-pressed={s === span}
                  onClick={() => {
                    setSpan(s);
                    const g = groups.find((x) => x.span === s && x.girder === girder) ?? groups.find((x) => x.span === s)!;
                    setGirder(g.girder);
                    go(0);
                  }}
                  className={`h-12 flex-1 rounded-md text-lg font-bold ${s === span ? 'bg-brand-600 text-white' : 'border border-concrete-300 bg-white text-concrete-800'}`}
                >
                  {s}
                </button>
              ))}
            </div>
          </fieldset>
          <fieldset>
            <legend className="field-label">Exterior girder</legend>
            <div className="mt-1 flex gap-1">
              {girders.map((g) => (
                <button
                  key={g.girder}
                  type="button"
                  aria-pressed={g.girder === group.girder}
                  onClick={() => {
                    setGirder(g.girder);
                    go(0);
                  }}
                  className={`h-12 flex-1 rounded-md text-base font-bold leading-tight ${g.girder === group.girder ? 'bg-brand-600 text-white' : 'border border-concrete-300 bg-white text-concrete-800'}`}
                >
                  {g.girder}
                  <span className="block text-xs font-semibold opacity-80">{g.side === 'left' ? 'LT' : 'RT'}</span>
                </button>
              ))}
            </div>
          </fieldset>
        </div>

        <FieldPointStrip points={group.rows.map((r) => r.point)} states={states} current={index} onPick={go} />
        <p className="mt-1 text-sm text-concrete-600">
          <span className="tabular font-semibold text-concrete-800">{done}</span> of {group.rows.length} brackets passed on {group.girder}, span {span}
        </p>

        <section aria-labelledby={`${id}-bracket`} className="mt-3">
          <h2 id={`${id}-bracket`} className="flex items-baseline justify-between">
            <span className="text-2xl font-bold text-concrete-900">
              Point <span className="tabular">{row.point}</span>
              <span className="text-base font-semibold text-concrete-500"> / {group.rows[group.rows.length - 1].point}</span>
            </span>
            <span className="tabular text-2xl font-semibold text-concrete-700">{stationText(row.station, units)}</span>
          </h2>
          <FieldTargets row={row} units={units} />
        </section>

        <div ref={resultRef} className="scroll-mt-2">
          <FieldResult verdict={current} units={units} widthTolerance={widthTolerance} readingTolerance={readingTolerance} currentRevision={bridge.revision} />
        </div>
        {canRecord && current?.checkId ? (
          <PhotoCaptureButton key={current.checkId} bridgeId={bridge.id} checkId={current.checkId} onAttached={() => void mutate()} />
        ) : null}

        {canRecord ? (
          <form id={`${id}-form`} onSubmit={record} noValidate className="mt-4 space-y-3">
            <div>
              <label htmlFor={`${id}-width`} className="field-label">
                Measured edge width <span className="font-normal text-concrete-500">(from the string line, {units === 'm' ? 'm' : 'ft or ft-in'})</span>
              </label>
              <input
                id={`${id}-width`}
                inputMode={units === 'm' ? 'decimal' : 'text'}
                autoComplete="off"
                value={widthText}
                onChange={(e) => setWidthText(e.target.value)}
                placeholder={units === 'm' ? 'e.g. 1.382' : `e.g. 4.53 or 4'-6 3/8"`}
                aria-invalid={inputError.width ? true : undefined}
                aria-describedby={inputError.width ? `${id}-width-error` : undefined}
                className="field-input tabular h-14 text-2xl"
              />
              {inputError.width ? (
                <p id={`${id}-width-error`} className="field-error">
                  {inputError.width}
                </p>
              ) : null}
            </div>
            <div>
              <label htmlFor={`${id}-reading`} className="field-label">
                Level-bar reading from the girder top <span className="font-normal text-concrete-500">({units})</span>
              </label>
              {row.reading === null ? (
                <p id={`${id}-reading`} className="mt-1 rounded-md border border-concrete-300 bg-concrete-100 px-3 py-2 text-sm text-concrete-700">
                  The top of girder was not surveyed at this point, so there is no reading to check here. Record the edge width only.
                </p>
              ) : (
                <>
                  <input
                    id={`${id}-reading`}
                    inputMode="decimal"
                    autoComplete="off"
                    value={readingText}
                    onChange={(e) => setReadingText(e.target.value)}
                    placeholder={units === 'm' ? 'e.g. 0.084' : 'e.g. 0.32'}
                    aria-invalid={inputError.reading ? true : undefined}
                    aria-describedby={inputError.reading ? `${id}-reading-error` : undefined}
                    className="field-input tabular h-14 text-2xl"
                  />
                  {inputError.reading ? (
                    <p id={`${id}-reading-error`} className="field-error">
                      {inputError.reading}
                    </p>
                  ) : null}
                </>
              )}
            </div>
            <div>
              <label htmlFor={`${id}-note`} className="field-label">
                Note <span className="font-normal text-concrete-500">(optional)</span>
              </label>
              <input id={`${id}-note`} value={note} maxLength={500} onChange={(e) => setNote(e.target.value)} className="field-input" />
            </div>
          </form>
        ) : (
          <p className="mt-4 rounded-md border border-concrete-300 bg-white p-3 text-sm text-concrete-700">
            Read only: your role can see the targets; inspectors record the checks.
          </p>
        )}


        {queue.refused.map((r) => (
          <div key={r.key} role="alert" className="mt-3 rounded-md border border-fail-600 bg-fail-100 p-3 text-sm">
            <p className="font-semibold text-fail-600">
              Not recorded: span {r.span}, {r.girder}, point {r.point}
            </p>
            <p className="mt-1 text-concrete-900">{r.reason}</p>
            <button type="button" className="btn-secondary mt-2" onClick={() => queue.dismissRefused(r.key)}>
              Dismiss
            </button>
          </div>
        ))}
        {waiting > 0 ? (
          <div className="mt-3 rounded-md border border-caution-500 bg-caution-100 p-3 text-sm text-concrete-900">
            <p>
              {waiting} {waiting === 1 ? 'entry is' : 'entries are'} kept on this phone and will be sent when the connection allows.
            </p>
            <button type="button" className="btn-secondary mt-2" onClick={() => void queue.retryNow()}>
              Send now
            </button>
          </div>
        ) : null}
        {error && !checks ? <p className="mt-3 text-sm text-caution-700">Could not load earlier checks ({error.message}). New entries are still kept and sent.</p> : null}
        <SafetyCaution className="mt-6" />
      </div>

      <nav aria-label="Bracket" className="grid grid-cols-[1fr_1.4fr_1fr] gap-2 border-t border-concrete-200 bg-white px-3 py-3">
        <button type="button" className="btn-secondary h-14 text-lg" onClick={() => go(index - 1)} disabled={index === 0}>
          ◀ Prev
        </button>
        {canRecord ? (
          <button type="submit" form={`${id}-form`} className="btn-primary h-14 text-lg">
            Record
          </button>
        ) : (
          <span />
        )}
        <button type="button" className="btn-secondary h-14 text-lg" onClick={() => go(index + 1)} disabled={index >= group.rows.length - 1}>
          Next ▶
        </button>
      </nav>
    </div>
  );
}
