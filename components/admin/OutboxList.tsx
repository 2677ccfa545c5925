import { dateTimeText } from '@/lib/units';

type Message = {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; content_type: string; size: number; content: string; encoding?: 'text' | 'base64' }[];
  sent_by: string | null;
  created_at: string;
};

/** Messages kept in the local outbox, newest first, each with its body and attachments. */
export default function OutboxList({ messages }: { messages: Message[] }) {
  if (messages.length === 0) {
    return <p className="card p-4 text-concrete-700">The outbox is empty. Field sheets e-mailed while no mail server is configured appear here.</p>;
  }
  return (
    <ol className="space-y-4">
      {messages.map((m) => (
        <li key={m.id} className="card p-4">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <h2 className="text-base font-bold text-concrete-900">{m.subject}</h2>
            <span className="tabular text-sm text-concrete-600">{dateTimeText(m.created_at)}</span>
          </div>
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
            <dt className="font-semibold text-concrete-700">To</dt>
            <dd className="text-concrete-900">{m.to.join(', ')}</dd>
            <dt className="font-semibold text-concrete-700">From</dt>
            <dd className="text-concrete-900">{m.from}</dd>
            <dt className="font-semibold text-concrete-700">Sent by</dt>
            <dd className="text-concrete-900">{m.sent_by ?? 'removed user'}</dd>
          </dl>
          <details className="mt-2">
            <summary className="cursor-pointer text-sm font-semibold text-brand-700">Message text</summary>
            <pre className="mt-1 max-h-72 overflow-auto whitespace-pre-wrap rounded bg-concrete-50 p-3 text-xs text-concrete-900">{m.text}</pre>
          </details>
          {m.attachments.map((a) =>
            a.encoding === 'base64' ? (
              // A file (the sheet's PDF): downloaded, not shown as text.
              <p key={a.filename} className="mt-2 text-sm">
                <a href={`data:${a.content_type.split(';')[0]};base64,${a.content}`} download={a.filename} className="font-semibold text-brand-700 underline">
                  {a.filename}
                </a>{' '}
                <span className="text-concrete-600">
                  ({a.content_type.split(';')[0]}, {(a.size / 1024).toFixed(1)} KB)
                </span>
              </p>
            ) : (
              <details key={a.filename} className="mt-2">
                <summary className="cursor-pointer text-sm font-semibold text-brand-700">
                  {a.filename}{' '}
                  <span className="font-normal text-concrete-600">
                    ({a.content_type.split(';')[0]}, {(a.size / 1024).toFixed(1)} KB)
                  </span>
                </summary>
                <pre className="tabular mt-1 max-h-72 overflow-auto rounded bg-concrete-50 p-3 text-xs text-concrete-900">{a.content}</pre>
              </details>
            ),
          )}
        </li>
      ))}
    </ol>
  );
}
