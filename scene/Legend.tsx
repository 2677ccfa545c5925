import { rampCss } from './builders/ramp';
import { lengthText, type Units } from '@/lib/units';
import { groundGridSpacing } from './objects/ground-grid';

type Props = {
  range: [number, number];
  units: Units;
  points?: boolean;
  /** Largest dead-load deflection in the form targets (bridge units); 0 or absent when there are none. */
  deflection?: number;
};

function Swatch({ color, line = false, label }: { color: string; line?: boolean; label: string }) {
  return (
    <li className="flex items-center gap-2">
      <span className={line ? 'inline-block h-0.5 w-6 ring-1 ring-concrete-400' : 'inline-block h-3 w-4 rounded-sm ring-1 ring-concrete-400'} style={{ background: color }} aria-hidden="true" />{' '}
      {label}
    </li>
  );
}

/** Colour legend for edge width, in the bridge's units, plus what each part and line colour means. */
export default function Legend({ range, units, points = true, deflection = 0 }: Props) {
  const mid = (range[0] + range[1]) / 2;
  const grid = groundGridSpacing(units);
  return (
    <div className="space-y-3 text-sm" data-testid="edge-legend">
      <div>
        <div className="font-semibold text-concrete-800">Edge width, girder centreline to deck edge</div>
        <div className="mt-1 h-3 rounded" style={{ background: rampCss() }} aria-hidden="true" />
        {lengthText(range[0], units) === lengthText(range[1], units) ? (
          <div className="mt-1 tabular text-concrete-700">{lengthText(range[0], units)} all along: the width does not change on this bridge</div>
        ) : (
          <div className="mt-1 flex justify-between tabular text-concrete-700">
            <span>{lengthText(range[0], units)}</span>
            <span>{lengthText(mid, units)}</span>
            <span>{lengthText(range[1], units)}</span>
          </div>
        )}
      </div>
      {deflection > 0 ? (
        <p className="rounded border border-brand-100 bg-brand-50 p-2 text-concrete-800" data-testid="deflection-note">
          Form targets and screed grades include the girders&apos; dead-load deflection (up to <span className="tabular">{lengthText(deflection, units)}</span>): the forms are set above grade and come
          down with the girders as the deck is poured.
        </p>
      ) : null}
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-concrete-700">
        <Swatch color="#ffffff" line label="Form edge at form target" />
        <Swatch color="#e0442b" line label="String line, girder end to girder end" />
        <Swatch color="#12544b" line label="Alignment at profile grade" />
        <Swatch color="#66717a" label="Girders" />
        <Swatch color="#c79d5f" label="Overhang form" />
        <Swatch color="#23282c" label="Brackets (fixed to the girder)" />
        <Swatch color="#8a1f11" label="Screw jacks to the form" />
        <Swatch color="#e8b100" label="Handrail posts and rail" />
        {points ? (
          <li className="flex items-center gap-2">
            <span className="inline-block h-3 w-3 rounded-full bg-concrete-900" aria-hidden="true" /> Girder point (click for its numbers)
          </li>
        ) : null}
      </ul>
      <p className="text-concrete-600">
        Ground grid: {grid.cell} {units} squares, a heavier line every {grid.section} {units}.
      </p>
    </div>
  );
}
