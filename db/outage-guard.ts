// Bounds every database call of the server in time, and fails fast while the database is away.
//
// Knex has acquire and connect timeouts but no query timeout. A stopped server (a frozen process,
// a cut network) keeps its TCP connections open, so a query on one would hang forever and, once
// back in the pool, hang the next request too. So every query races a timer; on timeout its
// connection is destroyed, never reused. The first outage error closes a gate: from then on
// queries and acquires fail at once, and a probe opens a fresh connection every PROBE_EVERY_MS
// until one answers. So one slow timeout, not one per query, is the price of an outage, and the
// pool is usable again within a probe interval of the database's return.
import ClientMySQL2 from 'knex/lib/dialects/mysql2';
import { createConnection, type ConnectionOptions } from 'mysql2';
import { classifyDbError, DbUnavailableError } from './db-errors';

export interface DbTimeouts {
  /** TCP connect plus handshake, ms (mysql2 connectTimeout). */
  connectMs: number;
  /** Waiting for a pooled connection, ms (knex acquireConnectionTimeout). */
  acquireMs: number;
  /** One query, ms; beyond it the database counts as stalled. */
  queryMs: number;
}

// Every route must answer within 2 s: the first request of an outage waits one query timeout,
// the rest fail at once. Queries of this app take milliseconds; lock waits end earlier (1 s) with
// their own error, so a busy row never counts as an outage.
export const defaultTimeouts: DbTimeouts = { connectMs: 1000, acquireMs: 1200, queryMs: 1500 };
export const LOCK_WAIT_SECONDS = 1;
const PROBE_EVERY_MS = 100;

export function dbTimeoutsFromEnv(env: NodeJS.ProcessEnv = process.env): DbTimeouts {
  const ms = (name: string, fallback: number) => {
    const v = Number(env[name]);
    return Number.isFinite(v) && v > 0 ? v : fallback;
  };
  return {
    connectMs: ms('DB_CONNECT_TIMEOUT_MS', defaultTimeouts.connectMs),
    acquireMs: ms('DB_ACQUIRE_TIMEOUT_MS', defaultTimeouts.acquireMs),
    queryMs: ms('DB_QUERY_TIMEOUT_MS', defaultTimeouts.queryMs),
  };
}

interface RawConnection {
  __knex__disposed?: unknown;
  _fatalError?: unknown;
  stream?: { destroyed?: boolean; destroy(): void };
  destroy(): void;
  on(event: 'error', listener: (err: unknown) => void): void;
  query(sql: string, cb: (err: unknown) => void): void;
}

/** Closes the socket without the polite COM_QUIT, which a frozen server would never answer. */
function hardClose(conn: RawConnection, reason: unknown): void {
  conn.__knex__disposed ??= reason;
  // A late socket error on a connection nobody listens to would crash the process.
  conn.on('error', () => undefined);
  conn.destroy();
  conn.stream?.destroy();
}

function withTimer<T>(promise: Promise<T>, ms: number, onTimeout: () => Error): Promise<T> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(onTimeout()), ms);
    promise.then(
      (v) => {
        clearTimeout(timer);
        resolve(v);
      },
      (err: unknown) => {
        clearTimeout(timer);
        reject(err);
      },
    );
  });
}

export interface OutageLog {
  down(reason: string): void;
  up(afterMs: number): void;
}

const consoleLog: OutageLog = {
  down: (reason) => console.warn(`[conestack] database unreachable (${reason}); answering 503 until it is back`),
  up: (afterMs) => console.log(`[conestack] database reachable again after ${afterMs} ms`),
};

/** A knex client class (pass as `client`) with the query timeout and the outage gate. */
export function guardedMySql2Client(connection: ConnectionOptions, timeouts: DbTimeouts, log: OutageLog = consoleLog) {
  let down: { reason: unknown; since: number; probe: NodeJS.Timeout } | null = null;
  let probing = false;
  const waiting = new Set<(err: Error) => void>();

  const unavailable = () => new DbUnavailableError('The database is not reachable right now', down?.reason);

  function trip(reason: unknown): void {
    if (down) return;
    const probe = setInterval(() => void runProbe(), PROBE_EVERY_MS);
    probe.unref();
    down = { reason, since: Date.now(), probe };
    log.down(reason instanceof Error ? reason.message.split('\n')[0] : String(reason));
    for (const reject of waiting) reject(unavailable());
    waiting.clear();
  }

  function noteFailure(err: unknown): void {
    if (classifyDbError(err) === 'outage') trip(err);
  }

  async function runProbe(): Promise<void> {
    if (probing || !down) return;
    probing = true;
    // Outside the pool, so a probe never waits behind (or leaves behind) a pooled connection.
    const conn = createConnection({ ...connection, connectTimeout: timeouts.connectMs }) as unknown as RawConnection;
    conn.on('error', () => undefined);
    try {
      // connectTimeout bounds the handshake; the ping gets the usual query bound.
      await withTimer(new Promise<void>((resolve, reject) => conn.query('select 1', (err) => (err ? reject(err) : resolve()))), timeouts.connectMs + timeouts.queryMs, () => new Error('probe timed out'));
      if (down) {
        clearInterval(down.probe);
        log.up(Date.now() - down.since);
        down = null;
      }
    } catch {
      // Still away; the next tick tries again.
    } finally {
      hardClose(conn, 'probe done');
      probing = false;
    }
  }

  // Transactions run on Object.create(prototype) copies of the client, so state lives in this closure.
  return class GuardedClient extends ClientMySQL2 {
    async acquireConnection(): Promise<unknown> {
      if (down) throw unavailable();
      const pending = super.acquireConnection();
      let leave: (err: Error) => void = () => undefined;
      const tripped = new Promise<never>((_resolve, reject) => {
        leave = reject;
        waiting.add(reject);
      });
      try {
        return await Promise.race([pending, tripped]);
      } catch (err) {
        noteFailure(err);
        // If the gate closed first, a connection that turns up later goes straight back.
        pending.then((c) => this.releaseConnection(c), () => undefined);
        throw err;
      } finally {
        waiting.delete(leave);
      }
    }

    _query(connection: unknown, obj: unknown): Promise<unknown> {
      const conn = connection as RawConnection;
      if (down || conn.__knex__disposed) {
        // Also drops a connection that may hold an open transaction, so it is never reused.
        const err = down ? unavailable() : new DbUnavailableError('The database connection was lost', conn.__knex__disposed);
        hardClose(conn, err);
        return Promise.reject(err);
      }
      return withTimer(super._query(connection, obj), timeouts.queryMs, () => {
        const err = new DbUnavailableError(`The database did not answer within ${timeouts.queryMs} ms`);
        hardClose(conn, err);
        trip(err);
        return err;
      }).catch((err: unknown) => {
        noteFailure(err);
        throw err;
      });
    }

    async destroyRawConnection(connection: unknown): Promise<void> {
      const conn = connection as RawConnection;
      if (conn.__knex__disposed || conn._fatalError || conn.stream?.destroyed) return hardClose(conn, 'disposed');
      const timer = setTimeout(() => hardClose(conn, 'no reply to quit'), timeouts.connectMs);
      try {
        await super.destroyRawConnection(connection);
      } finally {
        clearTimeout(timer);
      }
    }
  };
}
