/**
 * Runs before every request (Next.js 16 Proxy). Defence in depth around what the route handlers
 * already check: a state-changing request from another origin is refused here too (this also covers
 * next-auth's own endpoints and any server action); an API path whose percent-encoding does not
 * decode is a JSON 400 instead of the framework's plain-text 500; and when the app is served over
 * https (NEXTAUTH_URL, or X-Forwarded-Proto behind TRUST_PROXY=1) browsers are told to keep to it (HSTS).
 */
import { NextResponse, type NextRequest } from 'next/server';
import { crossSiteReason, servedOverHttps } from '@/lib/api/origin';

const json = (status: number, error: string) => NextResponse.json({ error }, { status, headers: { 'Cache-Control': 'no-store' } });

export function proxy(req: NextRequest): NextResponse {
  const crossSite = crossSiteReason(req);
  if (crossSite) return json(403, crossSite);
  const raw = req.nextUrl.pathname;
  if (raw.startsWith('/api/')) {
    try {
      decodeURIComponent(raw);
    } catch {
      return json(400, 'The address is not valid: it holds a broken %-escape. Check the link and try again.');
    }
  }
  const res = NextResponse.next();
  if (servedOverHttps(req.headers)) res.headers.set('Strict-Transport-Security', 'max-age=31536000; includeSubDomains');
  return res;
}

export const config = {
  // Everything but the framework's static files and the icon.
  matcher: ['/((?!_next/static|_next/image|icon.svg).*)'],
};
