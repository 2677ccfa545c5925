'use client';

export type PointState = 'none' | 'pass' | 'fail' | 'pending' | 'old';

const STYLE: Record<PointState, string> = {
  none: 'bg-white border-concrete-300 text-concrete-700',
  pass: 'bg-pass-600 border-pass-700 text-white',
  fail: 'bg-fail-600 border-fail-600 text-white',
  pending: 'bg-caution-100 border-caution-500 text-caution-700',
  old: 'bg-concrete-200 border-concrete-400 text-concrete-700',
};

const WORD: Record<PointState, string> = {
  none: 'not checked',
  pass: 'passed',
  fail: 'out of tolerance',
  pending: 'not sent yet',
  old: 'checked against an older revision',
};

/** Every girder point of the girder as a tappable chip coloured by its latest check, with a legend. */
export default function FieldPointStrip({ points, states, current, onPick }: { points: number[]; states: PointState[]; current: number; onPick: (index: number) => void }) {
  return (
    <div className="mt-3">
      <div className="flex gap-1 overflow-x-auto pb-1" role="group" aria-label="Girder points">
        {points.map((p, i) => (
          <button
            key={p}
            type="button"
            onClick={() => onPick(i)}
            aria-current={i === current ? 'step' : undefined}
            aria-label={`Point ${p}: ${WORD[states[i]]}`}
            className={`tabular h-9 min-w-9 shrink-0 rounded border text-sm font-bold ${STYLE[states[i]]} ${i === current ? 'ring-2 ring-brand-500 ring-offset-1' : ''}`}
          >
            {p}
          </button>
        ))}
      </div>
      <p className="mt-1 flex flex-wrap gap-x-3 gap-y-1 text-xs text-concrete-600" aria-hidden="true">
        {(['pass', 'fail', 'pending', 'old', 'none'] as PointState[]).map((s) => (
          <span key={s} className="inline-flex items-center gap-1">
            <span className={`inline-block h-3 w-3 rounded-sm border ${STYLE[s]}`} />
            {WORD[s]}
          </span>
        ))}
      </p>
    </div>
  );
}
