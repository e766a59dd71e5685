import { classifyDbError, DbUnavailableError } from './db-errors';

// Error codes as mysql2 and Node's net module name them (mysql2 lib/constants/errors.js,
// Node "Common system errors"); which ones mean "retry later" is common practice, no source.
describe('classifyDbError', () => {
  const coded = (code: string, extra: object = {}) => Object.assign(new Error(code), { code, ...extra });

  it('counts refused, reset, timed-out and lost connections as an outage', () => {
    for (const code of ['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'PROTOCOL_CONNECTION_LOST', 'ER_SERVER_SHUTDOWN']) {
      expect(classifyDbError(coded(code))).toBe('outage');
    }
  });

  it("counts knex's pool timeout and the guard's own error as an outage", () => {
    expect(classifyDbError(Object.assign(new Error('Knex: Timeout acquiring a connection'), { name: 'KnexTimeoutError' }))).toBe('outage');
    expect(classifyDbError(new DbUnavailableError('no answer'))).toBe('outage');
  });

  it('counts an error mysql2 marks fatal as an outage, and looks through causes', () => {
    expect(classifyDbError(Object.assign(new Error("Can't add new command when connection is in closed state"), { fatal: true }))).toBe('outage');
    expect(classifyDbError(new Error('wrapped', { cause: coded('ECONNREFUSED') }))).toBe('outage');
  });

  it('counts deadlocks and lock-wait timeouts as busy', () => {
    expect(classifyDbError(coded('ER_LOCK_DEADLOCK', { errno: 1213 }))).toBe('busy');
    expect(classifyDbError(coded('ER_LOCK_WAIT_TIMEOUT', { errno: 1205 }))).toBe('busy');
  });

  it('leaves query mistakes, constraint errors and non-errors alone', () => {
    expect(classifyDbError(coded('ER_DUP_ENTRY'))).toBeNull();
    expect(classifyDbError(coded('ER_PARSE_ERROR'))).toBeNull();
    expect(classifyDbError(new TypeError('x is undefined'))).toBeNull();
    expect(classifyDbError('ECONNREFUSED')).toBeNull();
    expect(classifyDbError(null)).toBeNull();
  });
});
