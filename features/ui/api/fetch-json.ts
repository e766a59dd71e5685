import { isErrorEnvelope } from '../../../shared/api/errors';

/** An API failure carrying the server's envelope code, so screens can tell 404 from an outage. */
export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
    this.name = 'ApiRequestError';
  }
}

// Same origin in the browser (the server serves the app and the API); absolute for jsdom and tools.
export const apiBase = (): string =>
  typeof window !== 'undefined' && window.location?.origin && window.location.origin !== 'null' ? window.location.origin : 'http://127.0.0.1:8080';

export async function fetchJson<T>(path: string): Promise<T> {
  const res = await fetch(`${apiBase()}${path}`, { headers: { accept: 'application/json' }, credentials: 'same-origin' });
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    if (isErrorEnvelope(body)) throw new ApiRequestError(res.status, body.error.code, body.error.message);
    throw new ApiRequestError(res.status, 'http_error', `Request failed with status ${res.status}`);
  }
  return body as T;
}
