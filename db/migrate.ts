// Applies every pending migration and reports each step; exits 1 on the first failure.
// Run: DATABASE_URL=postgres://… tsx db/migrate.ts  (npm start and npm test do this for you)
import { Migrator } from 'kysely';
import { connectDatabase } from './connect.ts';
import { migrationProvider } from './migrations/index.ts';

const url = process.env['DATABASE_URL'];
if (!url) {
  console.error('db/migrate: DATABASE_URL is not set');
  process.exit(1);
}
const db = connectDatabase(url, 2);
const migrator = new Migrator({ db, provider: migrationProvider });
const { error, results } = await migrator.migrateToLatest();
for (const r of results ?? []) console.log(`[migrate] ${r.status === 'Success' ? 'applied' : r.status}: ${r.migrationName}`);
if (!results?.length && !error) console.log('[migrate] database is up to date');
await db.destroy();
if (error) {
  console.error('[migrate] failed:', error);
  process.exit(1);
}
