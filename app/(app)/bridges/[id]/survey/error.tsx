'use client';

import ErrorPanel from '@/components/ErrorPanel';

export default function SurveyError({ error, retry }: { error: unknown; retry: () => void }) {
  return <ErrorPanel error={error} retry={retry} what="the top-of-girder survey" />;
}
