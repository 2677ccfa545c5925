'use client';

import ErrorPanel from '@/components/ErrorPanel';

export default function EditError({ error, retry }: { error: unknown; retry: () => void }) {
  return <ErrorPanel error={error} retry={retry} what="the geometry editor" />;
}
