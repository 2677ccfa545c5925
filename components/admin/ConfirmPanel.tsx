'use client';

/** An inline "are you sure" panel for a destructive admin action: the question, the action button (focused) and Keep. */
export default function ConfirmPanel({
  id,
  question,
  confirmLabel,
  busyLabel,
  busy,
  onConfirm,
  onKeep,
}: {
  id: string;
  question: string;
  confirmLabel: string;
  busyLabel: string;
  busy: boolean;
  onConfirm: () => void;
  onKeep: () => void;
}) {
  return (
    <div role="alertdialog" aria-labelledby={id} className="rounded-md border border-fail-600 bg-fail-100 p-3">
      <p id={id} className="text-sm font-semibold text-concrete-900">
        {question}
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        <button type="button" className="btn-danger" onClick={onConfirm} disabled={busy} autoFocus>
          {busy ? busyLabel : confirmLabel}
        </button>
        <button type="button" className="btn-secondary" onClick={onKeep} disabled={busy}>
          Keep
        </button>
      </div>
    </div>
  );
}
