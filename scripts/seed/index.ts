// Loads the demo guild (an invented river-town quilt guild). Idempotent: existing demo accounts are left as they are.
// Run: DATABASE_URL=postgres://… tsx scripts/seed/index.ts
// It writes through the app's repositories and services (src/server), never with queries of its own.
import { readFileSync } from 'node:fs';
import { connectDatabase } from '@db/connect.ts';
import type { Role, UnitsPreference } from '@db/schema.ts';
import { hashPassword } from '@server/auth/password.ts';
import { findAccountRowByEmail, insertAccount } from '@server/accounts/account.repository.ts';
import { seedGuildContent } from './guildContent.ts';

interface DemoFile {
  password: string;
  accounts: { email: string; displayName: string; role: Role; units: UnitsPreference }[];
}

const url = process.env['DATABASE_URL'];
if (!url) {
  console.error('scripts/seed: DATABASE_URL is not set');
  process.exit(1);
}
const demo = JSON.parse(readFileSync(new URL('./demo-accounts.json', import.meta.url), 'utf8')) as DemoFile;
const db = connectDatabase(url, 2);
let added = 0;
for (const account of demo.accounts) {
  if (await findAccountRowByEmail(db, account.email)) continue;
  const passwordHash = await hashPassword(demo.password);
  if (await insertAccount(db, { email: account.email, displayName: account.displayName, role: account.role, units: account.units, passwordHash })) added += 1;
}
console.log(`[seed] demo guild: ${added} account(s) added, ${demo.accounts.length - added} already present`);
const emailOf = (name: string) => demo.accounts.find((a) => a.displayName === name)?.email;
const content = await seedGuildContent(db, { teacher: emailOf('Marigold Ashby'), tobias: emailOf('Tobias Wren'), saoirse: emailOf('Saoirse Lindqvist') }, new Date());
console.log(`[seed] demo content: ${content.designs} design(s), ${content.templates} template(s), ${content.classes} class(es), ${content.enrollments} enrollment(s), ${content.quilts} quilt(s) added`);
await db.destroy();
