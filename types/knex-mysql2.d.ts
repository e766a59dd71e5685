// Knex's own MySQL2 client class, which the outage guard extends; knex ships no types for it.
declare module 'knex/lib/dialects/mysql2' {
  import type { Knex } from 'knex';

  class ClientMySQL2 {
    constructor(config: Knex.Config);
    connectionSettings: object;
    acquireConnection(): Promise<unknown>;
    releaseConnection(connection: unknown): Promise<void>;
    acquireRawConnection(): Promise<unknown>;
    destroyRawConnection(connection: unknown): Promise<void>;
    _query(connection: unknown, obj: unknown): Promise<unknown>;
  }
  export = ClientMySQL2;
}
