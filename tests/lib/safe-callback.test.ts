/**
 * Open redirect (issue 11, defect 3): after sign-in the browser goes only to a same-origin path.
 * The reproduced attack: /signin?callbackUrl=/%09/evil.example:3100/x, which browsers read as
 * //evil.example:3100/x because the URL parser drops tabs and line breaks (WHATWG URL Standard,
 * "basic URL parser": ASCII tab or newline is removed from the input).
 */
import { describe, expect, it } from 'vitest';
import { isLocalPath, safeCallbackPath } from '@/lib/auth/safe-callback';

const ORIGIN = 'http://localhost:3000';

describe('safeCallbackPath', () => {
  it('refuses every path a browser would read as another site', () => {
    for (const raw of [
      '/\t/evil.example:3100/x',
      decodeURIComponent('/%09/evil.example:3100/x'),
      '/\n/evil.example',
      '/\r/evil.example',
      '//evil.example',
      '/\\evil.example',
      '/\\/evil.example',
      '/ /evil.example',
      '/bridges\\..\\/evil.example',
      '/\u0000/evil.example',
      '/\u00a0/evil.example',
      '/\u2028/evil.example',
      'http://evil.example/x',
      'https://localhost:3000.evil.example/x',
      'javascript:alert(1)',
      'evil.example',
    ]) {
      expect(safeCallbackPath(raw, ORIGIN), JSON.stringify(raw)).toBe('/bridges');
    }
  });

  it('keeps a path on this site, and the path of an absolute URL of this origin', () => {
    expect(safeCallbackPath('/bridges/4/field?span=2#p3', ORIGIN)).toBe('/bridges/4/field?span=2#p3');
    expect(safeCallbackPath('http://localhost:3000/bridges/4', ORIGIN)).toBe('/bridges/4');
    expect(safeCallbackPath('/signin', ORIGIN)).toBe('/bridges');
    expect(safeCallbackPath('/api/admin/users', ORIGIN)).toBe('/bridges');
  });

  it('agrees with the browser: whatever it accepts resolves on this origin', () => {
    // The WHATWG URL parser (Node's URL) is the browser's own reading of the same text.
    for (const raw of ['/bridges', '/a/b?c=//d', '/x#//y', '/%2F%2Fevil.example', '/\t/evil.example', '/\\evil.example']) {
      if (isLocalPath(raw)) expect(new URL(raw, ORIGIN).origin, raw).toBe(ORIGIN);
    }
  });
});
