'use client';

import type { OutboxItem } from '@/components/offline/offline-db';
import type { RefusedItem } from './use-field-queue';

type Props = {
  mine: OutboxItem[];
  others: OutboxItem[];
  refused: RefusedItem[];
  onSendNow: () => void;
  onDismiss: (key: string) => void;
};

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function counts(items: OutboxItem[]): string {
  const checks = items.filter((i) => i.kind === 'check').length;
  const photos = items.length - checks;
  return [checks ? plural(checks, 'measurement', 'measurements') : '', photos ? plural(photos, 'photo', 'photos') : ''].filter(Boolean).join(' and ');
}

/**
 * What this phone holds for the bridge and has not sent: this user's items (with the last reason they
 * did not go and a Send now button), other people's (they go when that person signs in here), and the
 * server's refusals with their reasons.
 */
export default function FieldQueuePanel({ mine, others, refused, onSendNow, onDismiss }: Props) {
  const reason = mine.find((i) => i.lastError)?.lastError ?? null;
  const byPerson = [...new Set(others.map((i) => i.userEmail))];
  return (
    <>
      {refused.map((r) => (
        <div key={r.key} role="alert" className="mt-3 rounded-md border border-fail-600 bg-fail-100 p-3 text-sm">
          <p className="font-semibold text-fail-600">Not recorded: {r.what}</p>
          <p className="mt-1 text-concrete-900">{r.reason}</p>
          <button type="button" className="btn-secondary mt-2" onClick={() => onDismiss(r.key)}>
            Dismiss
          </button>
        </div>
      ))}
      {mine.length > 0 ? (
        <div className="mt-3 rounded-md border border-caution-500 bg-caution-100 p-3 text-sm text-concrete-900" data-testid="field-queue">
          <p>
            {counts(mine)} kept on this phone, sent by themselves in the order taken when the connection allows.
            {reason ? <span className="mt-1 block font-semibold text-caution-700">{reason}</span> : null}
          </p>
          <button type="button" className="btn-secondary mt-2" onClick={onSendNow}>
            Send now
          </button>
        </div>
      ) : null}
      {byPerson.map((email) => (
        <p key={email} className="mt-3 rounded-md border border-concrete-300 bg-white p-3 text-sm text-concrete-700">
          {counts(others.filter((i) => i.userEmail === email))} taken on this phone by {email} wait for that person to sign in here; they are sent under their name.
        </p>
      ))}
    </>
  );
}
