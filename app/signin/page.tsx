import type { Metadata } from 'next';
import Link from 'next/link';
import { headers } from 'next/headers';
import { redirect } from 'next/navigation';
import SessionProvider from '@/components/SessionProvider';
import SignInForm from '@/components/signin/SignInForm';
import Wordmark, { ChordlineMark } from '@/components/Wordmark';
import { currentUser } from '@/lib/auth/server-session';
import { safeCallbackPath } from '@/lib/auth/safe-callback';
import { appOrigin } from '@/lib/api/origin';

export const metadata: Metadata = { title: 'Sign in' };
export const dynamic = 'force-dynamic';

type Search = Promise<{ callbackUrl?: string | string[]; error?: string | string[] }>;

function first(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

export default async function SignInPage({ searchParams }: { searchParams: Search }) {
  const params = await searchParams;
  const callbackUrl = first(params.callbackUrl);
  if (await currentUser()) redirect(safeCallbackPath(callbackUrl, process.env.NEXTAUTH_URL ? new URL(process.env.NEXTAUTH_URL).origin : undefined));
  // The address sign-in requests must come from (the origin check's own rule, lib/api/origin.ts).
  const requestHeaders = await headers();
  const own = appOrigin(requestHeaders, `http://${requestHeaders.get('host') ?? 'localhost'}`);

  return (
    <SessionProvider>
      <div className="flex min-h-screen flex-col md:flex-row">
        <section className="relative flex flex-col justify-between overflow-hidden bg-brand-800 px-6 py-8 text-white md:w-1/2 md:px-12 md:py-12">
          <Wordmark />
          <div className="my-8 max-w-md md:my-0">
            <h1 className="text-3xl font-bold leading-tight md:text-4xl">Set the overhang to the girder, not to a guess.</h1>
            <p className="mt-4 text-brand-100">
              Chordline works out edge widths, edge drops, form targets and chord offsets at every girder point of a curved bridge, for the engineers who set the geometry and the crews and inspectors
              who set and check the forms.
            </p>
          </div>
          <ChordlineMark className="pointer-events-none absolute -bottom-16 -right-16 hidden h-80 w-80 text-brand-700 md:block" />
          <p className="relative text-sm text-brand-100">Geometry only: the plans, the falsework design and the engineer of record decide.</p>
        </section>
        <main className="flex flex-1 items-center justify-center px-6 py-10">
          <div className="w-full max-w-sm">
            <h2 className="text-2xl font-bold text-concrete-900">Sign in</h2>
            <p className="mb-6 mt-1 text-sm text-concrete-600">Use your e-mail address and your Chordline password.</p>
            <SignInForm callbackUrl={callbackUrl} initialError={first(params.error)} appOrigin={own} />
            <p className="mt-6 text-sm">
              <Link href="/forgot-password" className="font-semibold text-brand-700 underline-offset-2 hover:underline">
                Forgot password?
              </Link>
            </p>
          </div>
        </main>
      </div>
    </SessionProvider>
  );
}
