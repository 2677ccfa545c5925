'use client';

import { useEffect } from 'react';

/**
 * Shown by a segment's error.tsx. Server errors reach the browser without their message in
 * production, so the text says what to do rather than repeating it.
 */
export default function ErrorPanel({ error, retry, what }: { error: unknown; retry: () => void; what: string }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  const digest = error instanceof Error ? (error as Error & { digest?: string }).digest : undefined;
  return (
    <div role="alert" className="card max-w-xl p-6">
      <h1 className="text-lg font-bold text-fail-600">Could not load {what}</h1>
      <p className="mt-2 text-concrete-700">
        Something went wrong while loading this page. Try again; if it keeps happening, tell your administrator
        {digest ? (
          <>
            {' '}
            and quote the reference <code className="font-mono text-sm">{digest}</code>
          </>
        ) : null}
        .
      </p>
      <button type="button" className="btn-primary mt-4" onClick={() => retry()}>
        Try again
      </button>
    </div>
  );
}
