/**
 * The app's own origin and the same-origin check every state-changing request passes (cross-site
 * request forgery). The origin is NEXTAUTH_URL's; with TRUST_PROXY=1 (the app sits behind a reverse
 * proxy that sets them) it is taken from X-Forwarded-Proto and X-Forwarded-Host instead.
 */
import type { NextRequest } from 'next/server';

/** Methods that change something and therefore need the app's own origin. */
export const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** True when TRUST_PROXY=1: X-Forwarded-Proto/Host are believed (only behind a proxy that sets them). */
export function trustProxy(): boolean {
  return process.env.TRUST_PROXY === '1' || process.env.TRUST_PROXY === 'true';
}

function configuredOrigin(): string | null {
  const url = process.env.NEXTAUTH_URL;
  if (!url) return null;
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
}

type HeaderSource = { get(name: string): string | null };

/** The origin the proxy says the browser used, or null when not trusted or not given. */
export function forwardedOrigin(headers: HeaderSource): string | null {
  if (!trustProxy()) return null;
  const host = headers.get('x-forwarded-host')?.split(',')[0].trim();
  const proto = (headers.get('x-forwarded-proto')?.split(',')[0].trim() || 'http').toLowerCase();
  if (!host || !/^[A-Za-z0-9.\-:[\]]+$/.test(host) || (proto !== 'http' && proto !== 'https')) return null;
  try {
    return new URL(`${proto}://${host}`).origin;
  } catch {
    return null;
  }
}

/** The app's own origin for this request: the trusted proxy's, else NEXTAUTH_URL's, else the request URL's. */
export function appOrigin(headers: HeaderSource, requestUrl?: string): string {
  const forwarded = forwardedOrigin(headers);
  if (forwarded) return forwarded;
  const configured = configuredOrigin();
  if (configured) return configured;
  return requestUrl ? new URL(requestUrl).origin : 'http://localhost';
}

/** True when the browser reached the app over https (directly per NEXTAUTH_URL, or per the trusted proxy). */
export function servedOverHttps(headers: HeaderSource): boolean {
  return appOrigin(headers).startsWith('https:');
}

function originOf(value: string): string | null {
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}

/**
 * Why a request may not change anything, or null when it comes from the app itself. The Origin
 * header decides; without it, Sec-Fetch-Site must say same-origin, or else the Referer must be the
 * app's own. A request with none of them is refused: browsers send Origin on every unsafe request,
 * and clients outside a browser are asked to send it too.
 */
export function crossSiteReason(req: Pick<NextRequest, 'headers' | 'method' | 'url'>): string | null {
  if (!UNSAFE_METHODS.has(req.method.toUpperCase())) return null;
  const own = appOrigin(req.headers, req.url);
  const origin = req.headers.get('origin');
  if (origin !== null) {
    return origin !== 'null' && originOf(origin) === own ? null : `Requests that change data must come from this app (${own}); this one came from ${origin.slice(0, 100)}.`;
  }
  const site = req.headers.get('sec-fetch-site');
  if (site !== null) return site === 'same-origin' ? null : 'Requests that change data must come from this app; this one came from another site.';
  const referer = req.headers.get('referer');
  if (referer !== null) return originOf(referer) === own ? null : 'Requests that change data must come from this app; this one came from another page.';
  return `Requests that change data must carry an Origin header with this app's address (${own}).`;
}
