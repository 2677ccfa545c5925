import AppRail from '@/components/AppRail';
import SessionProvider from '@/components/SessionProvider';
import ServiceWorkerRegistration from '@/components/offline/ServiceWorkerRegistration';
import SignInRedirect from '@/components/signin/SignInRedirect';
import { currentUser } from '@/lib/auth/server-session';

export const dynamic = 'force-dynamic';

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  // Each page checks the session itself and knows its own address; the layout does not, so without a
  // session it lets the browser go to the sign-in page with the address it asked for.
  const user = await currentUser();
  if (!user) return <SignInRedirect />;
  return (
    <SessionProvider>
      <ServiceWorkerRegistration user={{ id: user.id, email: user.email }}>
        <a href="#main" className="sr-only focus:not-sr-only focus:fixed focus:left-2 focus:top-2 focus:z-50 focus:rounded-md focus:bg-white focus:px-3 focus:py-2 focus:text-brand-700">
          Skip to content
        </a>
        <div className="min-h-screen md:flex">
          <AppRail user={user} />
          <main id="main" className="mx-auto w-full min-w-0 max-w-6xl flex-1 px-4 py-6 md:px-8 md:py-8">
            {children}
          </main>
        </div>
      </ServiceWorkerRegistration>
    </SessionProvider>
  );
}
