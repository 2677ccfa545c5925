import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { authOptions } from '@/lib/auth/options';
import { lockedResponse } from '@/lib/auth/locked-response';

type Ctx = { params: Promise<{ nextauth: string[] }> };

async function handle(req: NextRequest, ctx: Ctx) {
  const locked = await lockedResponse(req);
  if (locked) return locked;
  return NextAuth(authOptions())(req, ctx);
}

export { handle as GET, handle as POST };
