import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { Database } from './schema.ts';

// Return timestamps as Date and bigint counts as numbers where they fit: pg's default for int8 is a string.
pg.types.setTypeParser(20, (value: string) => {
  const n = Number(value);
  return Number.isSafeInteger(n) ? n : value;
});

/** One Kysely over a pg Pool. Used by the app (src/server/db.ts), the migration runner, the seed and tests. */
export function connectDatabase(connectionString: string, max = 10): Kysely<Database> {
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString, max }) }) });
}
