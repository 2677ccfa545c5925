/** Check progress as a bar and in words: brackets whose latest checks pass, of all brackets. */
export default function PortfolioProgress({ passing, total }: { passing: number; total: number }) {
  const share = total > 0 ? Math.min(1, passing / total) : 0;
  return (
    <div className="min-w-32">
      <div className="h-2 overflow-hidden rounded-full bg-concrete-200" aria-hidden="true">
        <div className="h-full rounded-full bg-pass-600" style={{ width: `${(share * 100).toFixed(1)}%` }} />
      </div>
      <p className="mt-1 text-xs text-concrete-700">
        <span className="tabular font-semibold text-concrete-900">{passing}</span> of <span className="tabular">{total}</span> brackets pass
      </p>
    </div>
  );
}
