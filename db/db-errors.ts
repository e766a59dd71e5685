// Which database failures mean "try again shortly" rather than "the request was wrong" or "bug".
// The error middleware answers both kinds with 503 db_unavailable; only an outage also closes the
// connection gate in db/outage-guard.ts.

/** Raised by the outage guard: the database did not answer in time, or is known to be away. */
export class DbUnavailableError extends Error {
  readonly code = 'DB_UNAVAILABLE';
  constructor(message: string, cause?: unknown) {
    super(message, cause === undefined ? undefined : { cause });
    this.name = 'DbUnavailableError';
  }
}

export type DbErrorKind = 'outage' | 'busy';

// Socket and protocol failures (Node and mysql2 codes) and the server refusing or dropping us.
const OUTAGE_CODES = new Set([
  'DB_UNAVAILABLE',
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'ENOTFOUND',
  'EAI_AGAIN',
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_SEQUENCE_TIMEOUT',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR',
  'PROTOCOL_ENQUEUE_AFTER_QUIT',
  'ER_SERVER_SHUTDOWN',
  'ER_CONNECTION_KILLED',
  'ER_CON_COUNT_ERROR',
  'ER_TOO_MANY_USER_CONNECTIONS',
]);
// The server is up but another transaction holds what we need; a retry normally succeeds.
const BUSY_CODES = new Set(['ER_LOCK_WAIT_TIMEOUT', 'ER_LOCK_DEADLOCK']);

/** 'outage', 'busy' or null (not a database availability problem), following `cause` chains. */
export function classifyDbError(err: unknown): DbErrorKind | null {
  for (let e = err, depth = 0; typeof e === 'object' && e !== null && depth < 5; e = (e as { cause?: unknown }).cause, depth++) {
    const { code, name, fatal } = e as { code?: unknown; name?: unknown; fatal?: unknown };
    if (typeof code === 'string' && OUTAGE_CODES.has(code)) return 'outage';
    if (typeof code === 'string' && BUSY_CODES.has(code)) return 'busy';
    // Knex's pool gave up waiting for a connection.
    if (name === 'KnexTimeoutError') return 'outage';
    // mysql2 marks errors that broke the connection itself as fatal.
    if (fatal === true) return 'outage';
  }
  return null;
}

export const isDbUnavailable = (err: unknown): boolean => classifyDbError(err) !== null;

/** A deadlock or lock-wait timeout: the transaction was rolled back and may simply be run again. */
export const isLockConflict = (err: unknown): boolean => classifyDbError(err) === 'busy';
