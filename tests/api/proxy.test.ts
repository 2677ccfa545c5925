/**
 * The request proxy (proxy.ts, run by Next.js before every route): a broken %-escape in an API path
 * is a JSON 400 instead of a plain-text 500; a state-changing request from another origin is refused
 * for every path (next-auth's endpoints and server actions included); HSTS only when served over https.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { proxy } from '@/proxy';

afterEach(() => {
  delete process.env.TRUST_PROXY;
});

describe('proxy', () => {
  it('GET /api/bridges/%E0%A4%A answers a JSON 400', async () => {
    const res = proxy(new NextRequest('http://localhost:3000/api/bridges/%E0%A4%A'));
    expect(res.status).toBe(400);
    expect((await res.json()).error).toMatch(/broken %-escape/);
  });

  it('refuses a sign-in POST and a server action POST from another origin; lets same-origin ones through', () => {
    for (const path of ['/api/auth/callback/credentials', '/bridges/1/edit']) {
      const foreign = proxy(new NextRequest(`http://localhost:3000${path}`, { method: 'POST', headers: { origin: 'http://localhost:3100' } }));
      expect(foreign.status, path).toBe(403);
      const own = proxy(new NextRequest(`http://localhost:3000${path}`, { method: 'POST', headers: { origin: 'http://localhost:3000' } }));
      expect(own.headers.get('x-middleware-next'), path).toBe('1');
    }
  });

  it('sends HSTS only when served over https (here through the trusted proxy)', () => {
    const plain = proxy(new NextRequest('http://localhost:3000/bridges'));
    expect(plain.headers.get('strict-transport-security')).toBeNull();
    const headers = { 'x-forwarded-proto': 'https', 'x-forwarded-host': 'deck.example.test' };
    expect(proxy(new NextRequest('http://localhost:3000/bridges', { headers })).headers.get('strict-transport-security')).toBeNull();
    process.env.TRUST_PROXY = '1';
    expect(proxy(new NextRequest('http://localhost:3000/bridges', { headers })).headers.get('strict-transport-security')).toMatch(/max-age=\d+/);
  });
});
