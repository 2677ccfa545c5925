/**
 * The caution carried wherever Chordline shows setting numbers: the numbers are geometry only and
 * the falsework, the bracket limits and the decisions belong to others.
 */
export default function SafetyCaution({ className = '' }: { className?: string }) {
  return (
    <aside role="note" aria-labelledby="safety-caution-title" className={`rounded-lg border border-caution-500 bg-caution-100 p-4 text-caution-700 ${className}`}>
      <h2 id="safety-caution-title" className="text-sm font-bold uppercase tracking-wide">
        Caution: geometry only
      </h2>
      <p className="mt-1 text-sm text-concrete-900">
        These numbers are geometry only. Overhang brackets carry wet concrete, the finishing machine rail and workers at the deck edge: bracket capacity, spacing, tie-back and fall protection follow
        the contractor&apos;s engineered falsework design, the bracket maker&apos;s limits, the agency&apos;s specifications and local codes. The engineer of record and the agency decide. Check every
        number against the plans before use.
      </p>
    </aside>
  );
}
