import { NextResponse, type NextRequest } from 'next/server';
import type { z } from 'zod';
import { roleAllows, type Role } from '@/lib/auth/roles';
import { sessionUserFromRequest, type SessionUser } from '@/lib/auth/session';
import { errorResponse, invalidInput, jsonError } from './errors';
import { readJson } from './body';
import { crossSiteReason, UNSAFE_METHODS } from './origin';

type Access = 'anyone' | 'signed-in' | readonly Role[];

type Context<P, B> = { req: NextRequest; user: SessionUser; params: P; body: B };

type RouteContext<P> = { params: Promise<P> };

/**
 * Wraps a route handler so the session, the role and the body schema are checked on the server
 * before the handler runs. 401 when not signed in, 403 without the role, 400 with field errors when
 * the body fails the schema. Anything thrown becomes a JSON error without a stack trace.
 */
export function withRole<P = Record<string, never>, S extends z.ZodType | undefined = undefined>(
  access: Access,
  schema: S,
  handler: (ctx: Context<P, S extends z.ZodType ? z.infer<S> : undefined>) => Promise<Response>,
): (req: NextRequest, route: RouteContext<P>) => Promise<Response> {
  return async (req, route) => {
    try {
      // Cross-site request forgery: anything that changes data must come from the app's own origin.
      const crossSite = crossSiteReason(req);
      if (crossSite) return jsonError(403, crossSite);
      // A body of another type is refused; no body at all is left to readJson (400, "send JSON").
      if (schema && UNSAFE_METHODS.has(req.method) && req.body !== null && !isJson(req)) {
        return jsonError(415, 'Send the body as JSON with the header Content-Type: application/json.');
      }
      // Open routes never look at the session: nothing there depends on who asks.
      const user = access === 'anyone' ? null : await sessionUserFromRequest(req);
      if (access !== 'anyone') {
        if (!user) return jsonError(401, 'Sign in to continue.');
        if (access !== 'signed-in' && !roleAllows(user.role, access)) {
          return jsonError(403, `Your role (${user.role}) may not do this; it needs ${access.join(' or ')}.`);
        }
      }
      let body: unknown = undefined;
      if (schema) {
        const parsed = schema.safeParse(await readJson(req));
        if (!parsed.success) throw invalidInput(parsed.error);
        body = parsed.data;
      }
      const params = ((await route?.params) ?? {}) as P;
      return noStore(await handler({ req, user: user as SessionUser, params, body: body as never }), access);
    } catch (err) {
      return noStore(errorResponse(err), access);
    }
  };
}

function isJson(req: NextRequest): boolean {
  return /^application\/json\s*(;|$)/i.test(req.headers.get('content-type') ?? '');
}

/** Answers that depend on who asked are never stored by the browser or a proxy (they outlive sign-out). */
function noStore(res: Response, access: Access): Response {
  if (access !== 'anyone') res.headers.set('Cache-Control', 'no-store');
  return res;
}

/** A 200 JSON answer; handlers return whitelisted plain objects only. */
export function ok(data: unknown, status = 200): NextResponse {
  return NextResponse.json(data, { status });
}
