import { NextResponse, type NextRequest } from 'next/server';
import { isLocked, WINDOW_MS } from './throttle';

/**
 * A 429 answer when a credentials sign-in targets an account locked by repeated failures; null
 * otherwise. The `url` field lets next-auth's client report the error code "locked".
 */
export async function lockedResponse(req: NextRequest): Promise<NextResponse | null> {
  if (req.method !== 'POST' || !req.nextUrl.pathname.endsWith('/callback/credentials')) return null;
  let email = '';
  try {
    const form = await req.clone().formData();
    email = String(form.get('email') ?? '');
  } catch {
    return null;
  }
  if (!email || !(await isLocked(email))) return null;
  const minutes = Math.round(WINDOW_MS / 60000);
  const url = new URL('/signin?error=locked', req.nextUrl.origin).toString();
  return NextResponse.json(
    { error: `Too many failed sign-ins for this account. Wait ${minutes} minutes and try again, or ask an administrator to reset the password.`, url },
    { status: 429, headers: { 'Retry-After': String(WINDOW_MS / 1000) } },
  );
}
