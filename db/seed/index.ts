// Loads the demo guild (an invented river-town quilt guild). Idempotent: existing demo accounts are left as they are.
// Run: DATABASE_URL=postgres://… tsx db/seed/index.ts
import { readFileSync } from 'node:fs';
import { sql } from 'kysely';
import { connectDatabase } from '../connect.ts';
import { hashPassword } from '@server/auth/password.ts';
import type { Role, UnitsPreference } from '../schema.ts';
import { seedGuildContent } from './guildContent.ts';

interface DemoFile {
  password: string;
  accounts: { email: string; displayName: string; role: Role; units: UnitsPreference }[];
}

const url = process.env['DATABASE_URL'];
if (!url) {
  console.error('db/seed: DATABASE_URL is not set');
  process.exit(1);
}
const demo = JSON.parse(readFileSync(new URL('./demo-accounts.json', import.meta.url), 'utf8')) as DemoFile;
const db = connectDatabase(url, 2);
let added = 0;
for (const account of demo.accounts) {
  const existing = await db.selectFrom('account').select('id').where(sql<string>`lower(email)`, '=', account.email.toLowerCase()).executeTakeFirst();
  if (existing) continue;
  await db
    .insertInto('account')
    .values({ email: account.email, display_name: account.displayName, role: account.role, units: account.units, password_hash: await hashPassword(demo.password) })
    .execute();
  added += 1;
}
console.log(`[seed] demo guild: ${added} account(s) added, ${demo.accounts.length - added} already present`);
const emailOf = (name: string) => demo.accounts.find((a) => a.displayName === name)?.email;
const content = await seedGuildContent(db, { teacher: emailOf('Marigold Ashby'), tobias: emailOf('Tobias Wren'), saoirse: emailOf('Saoirse Lindqvist') }, new Date());
console.log(`[seed] demo content: ${content.designs} design(s), ${content.templates} template(s), ${content.classes} class(es), ${content.enrollments} enrollment(s) added`);
await db.destroy();
