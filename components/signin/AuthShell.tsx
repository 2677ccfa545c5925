import Link from 'next/link';
import type { ReactNode } from 'react';
import Wordmark from '@/components/Wordmark';

/** The frame of the signed-out account pages (forgotten password, invite and reset links): brand bar, one narrow column. */
export default function AuthShell({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col bg-concrete-50">
      <header className="bg-brand-800 px-6 py-4">
        <Link href="/signin" className="inline-block rounded focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-white">
          <Wordmark />
        </Link>
      </header>
      <main className="flex flex-1 items-start justify-center px-4 py-10 sm:items-center">
        <div className="card w-full max-w-md p-6 sm:p-8">
          <h1 className="text-2xl font-bold text-concrete-900">{title}</h1>
          {intro ? <div className="mb-6 mt-2 text-sm text-concrete-600">{intro}</div> : <div className="mb-6" />}
          {children}
        </div>
      </main>
    </div>
  );
}
