import { rampCss } from './builders/ramp';
import { lengthText, type Units } from '@/lib/units';

/** Colour legend for edge width, in the bridge's units, plus what each line colour means. */
export default function Legend({ range, units, points = true }: { range: [number, number]; units: Units; points?: boolean }) {
  const mid = (range[0] + range[1]) / 2;
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
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-concrete-700">
        <li className="flex items-center gap-2">
          <span className="inline-block h-0.5 w-6 bg-white ring-1 ring-concrete-400" aria-hidden="true" /> Form edge at form target
        </li>
        <li className="flex items-center gap-2">
          <span className="inline-block h-0.5 w-6" style={{ background: '#e0442b' }} aria-hidden="true" /> String line, girder end to girder end
        </li>
        <li className="flex items-center gap-2">
          <span className="inline-block h-0.5 w-6 bg-brand-700" aria-hidden="true" /> Alignment at profile grade
        </li>
        {points ? (
          <li className="flex items-center gap-2">
            <span className="inline-block h-3 w-3 rounded-full bg-concrete-900" aria-hidden="true" /> Girder point (click for its numbers)
          </li>
        ) : null}
      </ul>
    </div>
  );
}
