/** Chordline's mark: an arc (the deck edge on a curve) over its chord (the straight girder). */
export function ChordlineMark({ className = 'h-7 w-7' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <path d="M4 22 Q16 4 28 22" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      <line x1="4" y1="22" x2="28" y2="22" stroke="currentColor" strokeWidth="3" strokeLinecap="round" opacity="0.55" />
      <line x1="16" y1="13" x2="16" y2="22" stroke="currentColor" strokeWidth="1.5" strokeDasharray="2 2" opacity="0.8" />
    </svg>
  );
}

/** The mark with the product name beside it. */
export default function Wordmark({ tone = 'light' }: { tone?: 'light' | 'dark' }) {
  const color = tone === 'light' ? 'text-white' : 'text-brand-700';
  return (
    <span className={`inline-flex items-center gap-2 ${color}`}>
      <ChordlineMark />
      <span className="text-xl font-bold tracking-tight">Chordline</span>
    </span>
  );
}
