import PlanSketchMarks, { PlanSketchMarksLegend } from '@/components/editor/PlanSketchMarks';
import type { SketchData } from '@/lib/editor/plan-sketch-data';
import type { Units } from '@/lib/units';

/**
 * The plan sketch drawing (SVG) from laid-out sketch data: alignment (dashed), deck outline, bent lines
 * and girders (exterior girders darker), north arrow and scale bar, with its legend. No hooks, so a
 * server page can render it as plain markup; the editor's live preview wraps it in PlanSketch.
 */
export default function PlanSketchSvg({ s, name, units, compact = false }: { s: SketchData; name: string; units: Units; compact?: boolean }) {
  const u = units;
  return (
    <figure>
      <svg
        viewBox={`0 0 ${s.width} ${s.height}`}
        className="h-auto w-full rounded-md border border-concrete-200 bg-white"
        role="img"
        aria-label={`Plan sketch of ${name}: alignment, deck edges, ${s.bents.length} bents and ${s.girders.length} girders`}
        data-testid="plan-sketch"
      >
        {s.deck ? <polygon points={s.deck} fill="#efede8" stroke="#6b665b" strokeWidth={1.5} /> : null}
        <polyline points={s.alignment} fill="none" stroke="#1f7f70" strokeWidth={1.5} strokeDasharray="10 4 2 4" />
        <PlanSketchMarks s={s} />
        {s.girders.map((g) => (
          <polyline key={g.name} points={g.points} fill="none" stroke={g.exterior ? '#12544b' : '#6fbcae'} strokeWidth={g.exterior ? 2.5 : 1.5} data-girder={g.name} />
        ))}
        {s.bents.map((b) => (
          <g key={b.name}>
            <line x1={b.x1} y1={b.y1} x2={b.x2} y2={b.y2} stroke="#3a3732" strokeWidth={2} />
            <text x={b.labelX} y={b.labelY} fontSize={13} textAnchor="middle" fill="#3a3732">
              {b.name}
            </text>
          </g>
        ))}
        {s.spans.map((sp) => (
          <text key={sp.span} x={sp.x} y={sp.y} fontSize={13} textAnchor="middle" fill="#6b665b" fontWeight={600}>
            Span {sp.span}
          </text>
        ))}
        <g transform={`translate(${s.width - 24} 26) rotate(${s.northDeg})`}>
          <path d="M0,-14 L5,6 L0,2 L-5,6 Z" fill="#24221f" />
          <text y={-17} fontSize={12} textAnchor="middle" fill="#24221f" transform={`rotate(${-s.northDeg} 0 -21)`}>
            N
          </text>
        </g>
        <g transform={`translate(12 ${s.height - 12})`}>
          <line x1={0} y1={0} x2={s.scale.px} y2={0} stroke="#24221f" strokeWidth={2} />
          <line x1={0} y1={-4} x2={0} y2={4} stroke="#24221f" strokeWidth={1.5} />
          <line x1={s.scale.px} y1={-4} x2={s.scale.px} y2={4} stroke="#24221f" strokeWidth={1.5} />
          <text x={s.scale.px + 6} y={4} fontSize={12} fill="#24221f">
            {s.scale.length} {u}
          </text>
        </g>
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-concrete-600">
        <span className="flex items-center gap-1">
          <svg width="22" height="6" aria-hidden="true">
            <line x1="0" y1="3" x2="22" y2="3" stroke="#1f7f70" strokeWidth="1.5" strokeDasharray="6 3 2 3" />
          </svg>
          Alignment
        </span>
        <span className="flex items-center gap-1">
          <span className="inline-block h-3 w-5 border border-concrete-600 bg-concrete-100" aria-hidden="true" />
          Deck
        </span>
        <span className="flex items-center gap-1">
          <span className="inline-block h-0.5 w-5 bg-brand-700" aria-hidden="true" />
          Exterior girder
        </span>
        <span className="flex items-center gap-1">
          <span className="inline-block h-0.5 w-5 bg-brand-300" aria-hidden="true" />
          Interior girder
        </span>
        <span className="flex items-center gap-1">
          <span className="inline-block h-0.5 w-5 bg-concrete-800" aria-hidden="true" />
          Bent line
        </span>
        <PlanSketchMarksLegend s={s} />
        {compact ? null : <span>Up-station to the right; drawn to scale.</span>}
      </figcaption>
    </figure>
  );
}
