import type { SketchData } from '@/lib/editor/plan-sketch-data';

/** Colour of spiral stretches in the plan sketch and its legend. */
export const SPIRAL_COLOUR = '#b45309';

/**
 * The plan sketch's marks for issue-10 geometry: spiral stretches of the alignment (solid, in their own
 * colour, titled with what they join), ticks at element joins, and dots at a flared edge's listed stations.
 */
export default function PlanSketchMarks({ s }: { s: SketchData }) {
  return (
    <g data-testid="plan-sketch-marks">
      {s.spirals.map((sp, i) => (
        <polyline key={i} points={sp.points} fill="none" stroke={SPIRAL_COLOUR} strokeWidth={3} data-spiral={i}>
          <title>{sp.label}</title>
        </polyline>
      ))}
      {s.joins.map((j, i) => (
        <line key={i} x1={j.x1} y1={j.y1} x2={j.x2} y2={j.y2} stroke="#1f7f70" strokeWidth={1.5} />
      ))}
      {s.flareStations.map((f, i) => (
        <circle key={i} cx={f.x} cy={f.y} r={3.5} fill="#fff" stroke="#6b665b" strokeWidth={1.5} data-flare-station={i} />
      ))}
    </g>
  );
}

/** Legend entries for the marks present in this sketch. */
export function PlanSketchMarksLegend({ s }: { s: SketchData }) {
  return (
    <>
      {s.spirals.length > 0 ? (
        <span className="flex items-center gap-1">
          <span className="inline-block h-1 w-5" style={{ background: SPIRAL_COLOUR }} aria-hidden="true" />
          Spiral ({s.spirals.length})
        </span>
      ) : null}
      {s.flareStations.length > 0 ? (
        <span className="flex items-center gap-1">
          <span className="inline-block h-2.5 w-2.5 rounded-full border-2 border-concrete-600 bg-white" aria-hidden="true" />
          Flared edge station
        </span>
      ) : null}
    </>
  );
}
