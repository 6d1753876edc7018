/** An API failure with the server's message and field issues. */
export class ApiError extends Error {
  constructor(
    public status: number,
    message: string,
    public issues: { path: string; message: string }[] = [],
    public body: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

let csrf: string | null = null;

/** Remembers the token a sign-in returned (the session, and so its token, is new). */
export function setCsrfToken(token: string | null) {
  csrf = token;
}

/** The session's CSRF token, fetched once and then reused. */
export async function getCsrfToken(): Promise<string> {
  if (!csrf) {
    const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
    csrf = ((await res.json()) as { token: string }).token;
  }
  return csrf;
}

type Options = { method?: string; body?: unknown; signal?: AbortSignal; retried?: boolean };

/** JSON requests to /api with the CSRF header on state changes; non-2xx throws ApiError. */
export async function api<T = unknown>(path: string, opts: Options = {}): Promise<T> {
  const method = opts.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (opts.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['X-CSRF-Token'] = await getCsrfToken();
  let res: Response;
  try {
    res = await fetch(`/api${path}`, {
      method,
      headers,
      credentials: 'same-origin',
      signal: opts.signal,
      body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
    });
  } catch (e) {
    if ((e as Error).name === 'AbortError') throw e;
    throw new ApiError(0, 'Cannot reach the server; check your connection and try again');
  }
  if (res.status === 204) return undefined as T;
  const body = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) {
    // The session may have been renewed elsewhere: fetch a fresh token once and retry.
    if (res.status === 403 && body.code === 'csrf' && !opts.retried) {
      csrf = null;
      return api<T>(path, { ...opts, retried: true });
    }
    throw new ApiError(res.status, String(body.error ?? res.statusText), (body.issues as ApiError['issues']) ?? [], body);
  }
  return body as T;
}
