/** Error shape every API route answers with: `{ error, fields? }`. */
export type ApiErrorBody = { error?: string; fields?: Record<string, string[]> };

/** A failed API call: the HTTP status and the server's own message and field errors. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string[]> = {},
  ) {
    super(message);
  }
}

async function readBody(res: Response): Promise<unknown> {
  const text = await res.text();
  if (!text) return null;
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

function toError(res: Response, body: unknown): ApiError {
  const b = (body ?? {}) as ApiErrorBody;
  const fallback = res.status === 401 ? 'Your session has ended. Sign in again.' : `The server answered ${res.status}. Try again; if it keeps happening, tell your administrator.`;
  return new ApiError(res.status, b.error ?? fallback, b.fields ?? {});
}

/** SWR fetcher: JSON on success, an ApiError carrying the server's message otherwise. */
export async function fetcher<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: 'application/json' } });
  const body = await readBody(res);
  if (!res.ok) throw toError(res, body);
  return body as T;
}

/** Sends a JSON write (POST, PATCH, DELETE) and returns the parsed answer or throws an ApiError. */
export async function sendJson<T>(url: string, method: 'POST' | 'PATCH' | 'DELETE', data?: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: data === undefined ? { accept: 'application/json' } : { 'content-type': 'application/json', accept: 'application/json' },
      body: data === undefined ? undefined : JSON.stringify(data),
    });
  } catch {
    throw new ApiError(0, 'The server could not be reached. Check the connection and try again.');
  }
  const body = await readBody(res);
  if (!res.ok) throw toError(res, body);
  return body as T;
}
