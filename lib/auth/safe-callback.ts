/**
 * True when `path` is a path on this site and nothing else: one leading `/`, no second `/` or `\`
 * right after it (a browser reads `//host` and `/\host` as another site), and no control characters
 * or whitespace anywhere (browsers drop tabs and line breaks, so `/\t/host` becomes `//host`).
 */
export function isLocalPath(path: string): boolean {
  if (!path.startsWith('/') || path[1] === '/' || path[1] === '\\') return false;
  // Control characters (C0, DEL, C1), every kind of Unicode space and the invisible format characters.
  if (/[\u0000-\u0020\u007f-\u00a0\u00ad\u1680\u180e\u2000-\u200f\u2028-\u202f\u205f-\u206f\u3000\ufeff]/.test(path)) return false;
  return !path.includes('\\');
}

/**
 * Where to go after signing in: only a path on this site (never another origin, never the sign-in
 * page itself or an API route); /bridges otherwise. An absolute URL counts only when its origin is
 * `origin` (the app's own), and then only its path is kept.
 */
export function safeCallbackPath(raw: string | null | undefined, origin?: string): string {
  const path = localPathOf(raw, origin);
  if (!path) return '/bridges';
  if (path === '/signin' || path.startsWith('/signin?') || path.startsWith('/api/')) return '/bridges';
  return path;
}

/** The same-origin path `raw` names, or null. */
export function localPathOf(raw: string | null | undefined, origin?: string): string | null {
  if (!raw) return null;
  let path = raw;
  if (/^https?:\/\//i.test(raw)) {
    if (!isLocalPath(`/${raw.replace(/^https?:\/\//i, '')}`)) return null;
    try {
      const url = new URL(raw);
      if (!origin || url.origin !== origin) return null;
      path = `${url.pathname}${url.search}${url.hash}`;
    } catch {
      return null;
    }
  }
  return isLocalPath(path) ? path : null;
}
