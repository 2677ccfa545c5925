'use client';

import type { BracketGroup } from '@/components/checks/check-types';
import FieldPointStrip, { type PointState } from './FieldPointStrip';

type Props = {
  groups: BracketGroup[];
  span: number;
  group: BracketGroup;
  index: number;
  states: PointState[];
  onSpan: (span: number) => void;
  onGirder: (girder: string) => void;
  onPoint: (index: number) => void;
};

const choice = (on: boolean) => (on ? 'bg-brand-600 text-white' : 'border border-concrete-300 bg-white text-concrete-800');

/** Span and exterior girder as big buttons, then the girder's points coloured by their latest check. */
export default function FieldPointPicker({ groups, span, group, index, states, onSpan, onGirder, onPoint }: Props) {
  const spans = [...new Set(groups.map((g) => g.span))];
  const girders = groups.filter((g) => g.span === span);
  const passed = states.filter((s) => s === 'pass').length;
  return (
    <>
      <div className="grid grid-cols-2 gap-3">
        <fieldset>
          <legend className="field-label">Span</legend>
          <div className="mt-1 flex gap-1">
            {spans.map((s) => (
              <button key={s} type="button" aria-pressed={s === span} onClick={() => onSpan(s)} className={`h-12 flex-1 rounded-md text-lg font-bold ${choice(s === span)}`}>
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
                onClick={() => onGirder(g.girder)}
                className={`h-12 flex-1 rounded-md text-base font-bold leading-tight ${choice(g.girder === group.girder)}`}
              >
                {g.girder}
                <span className="block text-xs font-semibold opacity-80">{g.side === 'left' ? 'LT' : 'RT'}</span>
              </button>
            ))}
          </div>
        </fieldset>
      </div>
      <FieldPointStrip points={group.rows.map((r) => r.point)} states={states} current={index} onPick={onPoint} />
      <p className="mt-1 text-sm text-concrete-600">
        <span className="tabular font-semibold text-concrete-800">{passed}</span> of {group.rows.length} brackets passed on {group.girder}, span {span}
      </p>
    </>
  );
}
