/**
 * Where to go after signing in: only a path on this site (never another origin, never the sign-in
 * page itself); /bridges otherwise.
 */
export function safeCallbackPath(raw: string | null | undefined, origin?: string): string {
  if (!raw) return '/bridges';
  let path = raw;
  if (/^https?:\/\//i.test(raw)) {
    try {
      const url = new URL(raw);
      if (!origin || url.origin !== origin) return '/bridges';
      path = `${url.pathname}${url.search}${url.hash}`;
    } catch {
      return '/bridges';
    }
  }
  if (!path.startsWith('/') || path.startsWith('//') || path.startsWith('/\\')) return '/bridges';
  if (path === '/signin' || path.startsWith('/signin?') || path.startsWith('/api/')) return '/bridges';
  return path;
}
