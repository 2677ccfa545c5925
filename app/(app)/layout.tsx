import AppRail from '@/components/AppRail';
import SessionProvider from '@/components/SessionProvider';
import { requireUser } from '@/components/server-session';

export const dynamic = 'force-dynamic';

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const user = await requireUser();
  return (
    <SessionProvider>
      <div className="min-h-screen md:pl-60">
        <AppRail user={user} />
        <main id="main" className="mx-auto max-w-6xl px-4 py-6 md:px-8 md:py-8">
          {children}
        </main>
      </div>
    </SessionProvider>
  );
}
