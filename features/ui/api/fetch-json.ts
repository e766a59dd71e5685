import { isErrorEnvelope } from '../../../shared/api/errors';

/** An API failure carrying the server's envelope code, so screens can tell 404 from an outage. */
export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    /** The envelope's details, e.g. `{ fields }` on a 400, so forms can place messages beside inputs. */
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiRequestError';
  }
}

// Same origin in the browser (the server serves the app and the API); absolute for jsdom and tools.
export const apiBase = (): string =>
  typeof window !== 'undefined' && window.location?.origin && window.location.origin !== 'null' ? window.location.origin : 'http://127.0.0.1:8080';

async function readJson<T>(res: Response): Promise<T> {
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    if (isErrorEnvelope(body)) throw new ApiRequestError(res.status, body.error.code, body.error.message, body.error.details);
    throw new ApiRequestError(res.status, 'http_error', `Request failed with status ${res.status}`);
  }
  return body as T;
}

export async function fetchJson<T>(path: string): Promise<T> {
  const res = await fetch(`${apiBase()}${path}`, { headers: { accept: 'application/json' }, credentials: 'same-origin' });
  return readJson<T>(res);
}

export async function postJson<T>(path: string, body: unknown, options: { signal?: AbortSignal } = {}): Promise<T> {
  const res = await fetch(`${apiBase()}${path}`, {
    method: 'POST',
    headers: { accept: 'application/json', 'content-type': 'application/json' },
    body: JSON.stringify(body),
    credentials: 'same-origin',
    signal: options.signal,
  });
  return readJson<T>(res);
}

/** Any state-changing call; the browser adds the Origin header the server's CSRF check reads. */
export async function sendJson<T>(method: 'POST' | 'PATCH' | 'DELETE', path: string, body?: unknown): Promise<T | null> {
  const res = await fetch(`${apiBase()}${path}`, {
    method,
    headers: { accept: 'application/json', ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
    body: body === undefined ? undefined : JSON.stringify(body),
    credentials: 'same-origin',
  });
  if (res.status === 204) return null;
  return readJson<T>(res);
}
