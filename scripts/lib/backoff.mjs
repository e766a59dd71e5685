// How long `npm start` waits before restarting a child that died; kept apart so tests can load it.
export const defaultBackoff = { initialMs: 500, maxMs: 10_000, stableMs: 30_000 };

/**
 * The wait before the next restart: `initialMs` the first time and after a run of at least
 * `stableMs`, otherwise double the last wait up to `maxMs`, so a child that dies on start does
 * not spin but one that ran for a while comes back quickly.
 */
export function nextDelay(previousMs, uptimeMs, backoff = defaultBackoff) {
  if (previousMs === null || uptimeMs >= backoff.stableMs) return backoff.initialMs;
  return Math.min(previousMs * 2, backoff.maxMs);
}
