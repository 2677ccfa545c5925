import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { authOptions } from '@/lib/auth/options';
import { throttleResponse } from '@/lib/auth/throttle-response';
import { crossSiteReason } from '@/lib/api/origin';
import { jsonError } from '@/lib/api/errors';

type Ctx = { params: Promise<{ nextauth: string[] }> };

async function handle(req: NextRequest, ctx: Ctx) {
  const crossSite = crossSiteReason(req);
  if (crossSite) return jsonError(403, crossSite);
  const throttled = await throttleResponse(req);
  if (throttled) return throttled;
  return NextAuth(authOptions(req.headers))(req, ctx);
}

export { handle as GET, handle as POST };
