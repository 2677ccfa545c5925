/**
 * The sign-in throttle's per-client limit needs an address the client cannot choose. Next.js only
 * fills X-Forwarded-For from the socket when the request has none, so a client talking to the app
 * directly could name any address it likes and never be slowed. Unless TRUST_PROXY=1 (the app sits
 * behind a reverse proxy that sets the header), this hook replaces whatever X-Forwarded-For a request
 * carries with the address of the connection itself, before Next.js sees the request. Installed once
 * per server process from instrumentation.ts.
 */
import http from 'node:http';
import { trustProxy } from '@/lib/api/origin';

const INSTALLED = Symbol.for('chordline.peerAddressHook');

type Emit = (this: http.Server, event: string | symbol, ...args: unknown[]) => boolean;

/**
 * Makes every HTTP server of this process set X-Forwarded-For to the connection's own address on each
 * request unless the proxy is trusted. Safe to call more than once.
 */
export function installPeerAddressHook(proto: { emit: Emit } & Record<symbol, unknown> = http.Server.prototype as unknown as { emit: Emit } & Record<symbol, unknown>): void {
  if (proto[INSTALLED]) return;
  proto[INSTALLED] = true;
  const original = proto.emit;
  proto.emit = function (this: http.Server, event: string | symbol, ...args: unknown[]): boolean {
    if (event === 'request' && !trustProxy()) {
      const req = args[0] as http.IncomingMessage;
      const peer = req.socket?.remoteAddress;
      if (peer) req.headers['x-forwarded-for'] = peer;
      else delete req.headers['x-forwarded-for'];
    }
    return original.call(this, event, ...args);
  };
}
