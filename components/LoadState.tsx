import type { ApiError } from '@/lib/client/api-client';

/** A failed SWR read: the server's message and a button that asks again. */
export function LoadFailed({ error, retry }: { error: ApiError; retry: () => void }) {
  return (
    <div role="alert" className="card p-6">
      <p className="text-fail-600">{error.message}</p>
      <button type="button" className="btn-secondary mt-3" onClick={retry}>
        Try again
      </button>
    </div>
  );
}

/** A read still on its way, said in words (screen readers hear it through role="status"). */
export function Loading({ children }: { children: React.ReactNode }) {
  return (
    <p role="status" className="text-concrete-600">
      {children}
    </p>
  );
}
