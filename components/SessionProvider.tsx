'use client';

import { SessionProvider as NextAuthSessionProvider } from 'next-auth/react';

/** Gives client components access to the next-auth session (useSession, signOut). */
export default function SessionProvider({ children }: { children: React.ReactNode }) {
  return <NextAuthSessionProvider>{children}</NextAuthSessionProvider>;
}
