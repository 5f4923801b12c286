// Direct database access for tests (e.g. to move a session's expiry into the past). One small pool per
// test file; call closeTestDb() in afterAll.
import type { Kysely } from 'kysely';
import { connectDatabase } from '@db/connect.ts';
import type { Database } from '@db/schema.ts';
import { testEnv } from './env.ts';

let db: Kysely<Database> | undefined;

export function testDb(): Kysely<Database> {
  db ??= connectDatabase(testEnv.databaseUrl, 3);
  return db;
}

export async function closeTestDb(): Promise<void> {
  await db?.destroy();
  db = undefined;
}
