'use client';

import ErrorPanel from '@/components/ErrorPanel';

export default function HistoryError({ error, retry }: { error: unknown; retry: () => void }) {
  return <ErrorPanel error={error} retry={retry} what="the revision history" />;
}
