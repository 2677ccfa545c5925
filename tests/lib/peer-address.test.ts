/**
 * The sign-in throttle's client address (issue 11, defect 6 follow-up): without TRUST_PROXY a client
 * talking to the app directly cannot choose the address it is counted under by sending its own
 * X-Forwarded-For; the hook puts the connection's own address there before the app sees the request.
 * With TRUST_PROXY=1 the proxy's header is kept, and the throttle takes its last entry.
 * A real HTTP server on loopback, with the hook installed on its own copy of the server prototype.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { installPeerAddressHook } from '@/lib/auth/peer-address';
import { clientAddress } from '@/lib/auth/client-address';

class HookedServer extends http.Server {}
let server: HookedServer;
let url: string;
const seen: (string | undefined)[] = [];

beforeAll(async () => {
  installPeerAddressHook(HookedServer.prototype as never);
  server = new HookedServer((req, res) => {
    seen.push(req.headers['x-forwarded-for'] as string | undefined);
    res.end(clientAddress(req.headers as Record<string, string>));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/`;
});

afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));
afterEach(() => {
  delete process.env.TRUST_PROXY;
});

/** GET with the given X-Forwarded-For on a fresh connection; the address the throttle would count. */
function counted(xff?: string): Promise<string> {
  return new Promise((resolve, reject) => {
    const req = http.get(url, { agent: false, headers: xff ? { 'x-forwarded-for': xff } : {} }, (res) => {
      let body = '';
      res.on('data', (d) => (body += d));
      res.on('end', () => resolve(body));
    });
    req.on('error', reject);
  });
}

describe('client address for the sign-in throttle', () => {
  it('without TRUST_PROXY a made-up X-Forwarded-For is replaced by the connection’s address', async () => {
    expect(await counted('203.0.113.77')).toBe('127.0.0.1');
    expect(await counted('203.0.113.78, 198.51.100.9')).toBe('127.0.0.1');
    expect(await counted()).toBe('127.0.0.1');
    expect(seen.slice(-3)).toEqual(['127.0.0.1', '127.0.0.1', '127.0.0.1']);
  });

  it('with TRUST_PROXY=1 the proxy’s header is kept and its last entry (what the proxy saw) is counted', async () => {
    process.env.TRUST_PROXY = '1';
    expect(await counted('203.0.113.78, 198.51.100.9')).toBe('198.51.100.9');
  });

  it('installing twice wraps once', () => {
    const emit = HookedServer.prototype.emit;
    installPeerAddressHook(HookedServer.prototype as never);
    expect(HookedServer.prototype.emit).toBe(emit);
  });
});
