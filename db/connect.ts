import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { Database } from './schema.ts';

// Return timestamps as Date and bigint counts as numbers where they fit: pg's default for int8 is a string.
pg.types.setTypeParser(20, (value: string) => {
  const n = Number(value);
  return Number.isSafeInteger(n) ? n : value;
});

/** Longest wait for a new connection (ms): a database that does not answer fails the request instead of hanging it. */
export const CONNECT_TIMEOUT_MS = 5_000;

export interface ConnectOptions {
  /** Pool size. */
  readonly max?: number;
  /** Told about connection errors outside a query (the server went away); default: one line on stderr. */
  readonly onConnectionError?: (error: Error) => void;
}

/**
 * One Kysely over a pg Pool. Used by the app (src/server/db.ts), the migration runner, the seed and tests.
 * When PostgreSQL restarts, every open connection ends with an error event. pg emits it on the pool (idle
 * connections) or on the client (connections lent out between queries); an error event with no listener
 * kills the process, so both get one here. The broken connection is dropped by the pool and the next
 * query opens a fresh one: the app recovers by itself once the database is back.
 */
export function connectDatabase(connectionString: string, options: number | ConnectOptions = {}): Kysely<Database> {
  const { max = 10, onConnectionError = logConnectionError } = typeof options === 'number' ? { max: options } : options;
  const pool = new pg.Pool({ connectionString, max, connectionTimeoutMillis: CONNECT_TIMEOUT_MS });
  // Every client carries a listener for its whole life (it is told first); the pool's own event repeats the
  // same error for idle clients, so its listener only keeps the process alive.
  pool.on('connect', (client) => client.on('error', (error) => onConnectionError(error)));
  pool.on('error', () => {});
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}

function logConnectionError(error: Error): void {
  console.error(`[db] connection lost: ${error.message}`);
}
