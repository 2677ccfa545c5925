'use client';

import ErrorPanel from '@/components/ErrorPanel';

export default function SignInError({ error, retry }: { error: unknown; retry: () => void }) {
  return (
    <div className="p-8">
      <ErrorPanel error={error} retry={retry} what="the sign-in page" />
    </div>
  );
}
