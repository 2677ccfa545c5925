/** next-auth's CSRF token for a new visitor, and that visitor's cookies as a Cookie header value. */
export async function csrfJar(base: string): Promise<{ csrfToken: string; jar: string }> {
  const res = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await res.json()) as { csrfToken: string };
  const jar = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  return { csrfToken, jar };
}
