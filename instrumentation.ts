/**
 * Runs once when a server process starts (Next.js instrumentation). On the Node.js runtime it installs
 * the hook that takes the client's address from the connection unless TRUST_PROXY=1
 * (lib/auth/peer-address.ts), so the sign-in throttle cannot be dodged with a made-up X-Forwarded-For.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { installPeerAddressHook } = await import('@/lib/auth/peer-address');
  installPeerAddressHook();
}
