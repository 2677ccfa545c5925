/** Shown by a segment's loading.tsx while its server page loads. */
export default function LoadingPanel({ what }: { what: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 text-concrete-600">
      <span className="h-4 w-4 animate-spin rounded-full border-2 border-concrete-300 border-t-brand-600" aria-hidden="true" />
      Loading {what}…
    </div>
  );
}
