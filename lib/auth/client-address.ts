import { trustProxy } from '@/lib/api/origin';

type HeaderSource = { get(name: string): string | null } | Record<string, string | string[] | undefined>;

function header(headers: HeaderSource, name: string): string | null {
  if (typeof (headers as { get?: unknown }).get === 'function') return (headers as { get(n: string): string | null }).get(name);
  const v = (headers as Record<string, string | string[] | undefined>)[name];
  return Array.isArray(v) ? v.join(',') : (v ?? null);
}

/**
 * The client's address for the sign-in throttle. Without TRUST_PROXY the server process replaces any
 * X-Forwarded-For a request brings with the connection's own address before Next.js sees it
 * (lib/auth/peer-address.ts, installed by instrumentation.ts), so the header holds exactly that one
 * address. Behind a trusted proxy (TRUST_PROXY=1) the header is the proxy's and its last entry is the
 * address the proxy itself saw, which the client cannot forge.
 */
export function clientAddress(headers: HeaderSource): string {
  const list = (header(headers, 'x-forwarded-for') ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
  const pick = trustProxy() ? list[list.length - 1] : list[0];
  return (pick || 'unknown').slice(0, 100);
}
