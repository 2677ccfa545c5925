import { NextResponse, type NextRequest } from 'next/server';
import { clientAddress } from './client-address';
import { signInVerdict } from './throttle';

/**
 * A 429 answer when a credentials sign-in must wait (too many failures from this client address, or
 * an account being slowed after failures); null otherwise. The `url` field lets next-auth's client
 * report the error code "locked".
 */
export async function throttleResponse(req: NextRequest): Promise<NextResponse | null> {
  if (req.method !== 'POST' || !req.nextUrl.pathname.endsWith('/callback/credentials')) return null;
  let email = '';
  try {
    const form = await req.clone().formData();
    email = String(form.get('email') ?? '');
  } catch {
    return null;
  }
  const verdict = await signInVerdict(email, clientAddress(req.headers));
  if (!verdict) return null;
  const seconds = Math.ceil(verdict.waitMs / 1000);
  const wait = seconds >= 90 ? `${Math.ceil(seconds / 60)} minutes` : `${seconds} seconds`;
  const error =
    verdict.scope === 'client'
      ? `Too many failed sign-ins from this device or network. Wait ${wait} and try again.`
      : `Too many failed sign-ins for this account; attempts are slowed. Wait ${wait} and try again, or ask an administrator to reset the password.`;
  const url = new URL('/signin?error=locked', req.nextUrl.origin).toString();
  return NextResponse.json({ error, url }, { status: 429, headers: { 'Retry-After': String(seconds), 'Cache-Control': 'no-store' } });
}
