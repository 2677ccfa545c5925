import { dateTimeText, deviationText, readingLength, tapeLength, toleranceText, type Units } from '@/lib/units';
import { fixHint, verdictWord } from '@/lib/field/verdict';

/** What the screen knows about a bracket's latest measurement: from the server, or worked out on the phone. */
export type Verdict = {
  widthDeviation: number | null;
  readingDeviation: number | null;
  widthPass: boolean | null;
  readingPass: boolean | null;
  pass: boolean;
  measuredWidth: number | null;
  measuredReading: number | null;
  state: 'saved' | 'sending' | 'waiting';
  note: string | null;
  when: string;
  checkId: number | null;
  /** The phone's key of a measurement not yet on the server (a photo can wait for it). */
  clientKey: string | null;
  revision: number | null;
};

function Line({ kind, measured, deviation, pass, tolerance, units }: { kind: 'width' | 'reading'; measured: number; deviation: number | null; pass: boolean | null; tolerance: number; units: Units }) {
  return (
    <div className="border-t border-black/10 py-1 first:border-t-0">
      <div className="flex items-baseline justify-between gap-2">
        <span className="text-sm font-semibold">{kind === 'width' ? `Width ${tapeLength(measured, units)}` : `Reading ${readingLength(measured, units)}`}</span>
        <span className="tabular text-2xl font-bold">
          {deviationText(deviation, units, kind)} <span className="text-sm font-semibold">{verdictWord(pass, tolerance, units, kind)}</span>
        </span>
      </div>
      {pass === false && deviation !== null ? (
        <p className="text-sm font-semibold" data-testid={`fix-${kind}`}>
          {fixHint(kind, deviation, units)}
        </p>
      ) : null}
    </div>
  );
}

/** Pass or fail of the bracket's latest measurement, in large type, with where it stands (saved, sending, kept). */
export default function FieldResult({
  verdict,
  units,
  widthTolerance,
  readingTolerance,
  currentRevision,
}: {
  verdict: Verdict | null;
  units: Units;
  widthTolerance: number;
  readingTolerance: number;
  currentRevision: number;
}) {
  if (!verdict) {
    return (
      <p className="mt-4 rounded-lg border border-dashed border-concrete-300 p-3 text-sm text-concrete-600" data-testid="field-result">
        Not checked yet. Tolerance {toleranceText(widthTolerance, units)} on the width, {toleranceText(readingTolerance, units, 'reading')} on the reading.
      </p>
    );
  }
  const old = verdict.revision !== null && verdict.revision !== currentRevision;
  const tone = verdict.pass ? 'border-pass-600 bg-pass-100 text-pass-700' : 'border-fail-600 bg-fail-100 text-fail-600';
  const status =
    verdict.state === 'saved' ? `Saved as check #${verdict.checkId} · ${dateTimeText(verdict.when)}` : verdict.state === 'sending' ? 'Sending…' : (verdict.note ?? 'Kept on this phone; will resend.');
  return (
    <div role="status" aria-live="polite" className={`mt-4 rounded-lg border-2 p-3 ${tone}`} data-testid="field-result">
      <p className="text-3xl font-black tracking-wide" data-testid="field-verdict">
        {verdict.pass ? 'PASS' : 'FAIL'}
      </p>
      {verdict.measuredWidth !== null ? (
        <Line kind="width" measured={verdict.measuredWidth} deviation={verdict.widthDeviation} pass={verdict.widthPass} tolerance={widthTolerance} units={units} />
      ) : null}
      {verdict.measuredReading !== null ? (
        <Line kind="reading" measured={verdict.measuredReading} deviation={verdict.readingDeviation} pass={verdict.readingPass} tolerance={readingTolerance} units={units} />
      ) : null}
      <p className={`mt-1 text-xs font-semibold ${verdict.state === 'saved' ? 'text-concrete-700' : 'text-caution-700'}`}>{status}</p>
      {old ? (
        <p className="mt-1 text-xs font-semibold text-caution-700">
          Checked against revision {verdict.revision}; the geometry is now at revision {currentRevision}. Check again.
        </p>
      ) : null}
    </div>
  );
}
