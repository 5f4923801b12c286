// The demo guild's content: Tobias's and Saoirse's designs, Marigold's template and class. Accounts are looked
// up by the demo file's e-mails (admin, teacher, quilter, quilter in that order).
import { sql, type Kysely } from 'kysely';
import type { Database } from '../schema.ts';
import { seedGuildClass } from './guildClass.ts';
import { seedDesign } from './guildDesigns.ts';
import { saoirseDrawings, tobiasDrawings } from './guildDrawings.ts';

async function accountId(db: Kysely<Database>, email: string | undefined): Promise<string> {
  if (!email) throw new Error('db/seed/guildContent: demo-accounts.json has fewer than four accounts');
  const row = await db.selectFrom('account').select('id').where(sql<string>`lower(email)`, '=', email.toLowerCase()).executeTakeFirst();
  if (!row) throw new Error(`db/seed/guildContent: demo account ${email} is missing`);
  return row.id;
}

export async function seedGuildContent(db: Kysely<Database>, emails: readonly string[], now: Date) {
  const [, teacher, tobias, saoirse] = await Promise.all([0, 1, 2, 3].map((i) => (i === 0 ? Promise.resolve('') : accountId(db, emails[i]))));
  let designs = 0;
  for (const [owner, drawings] of [[tobias!, tobiasDrawings()], [saoirse!, saoirseDrawings()]] as const) {
    for (const d of drawings) if ((await seedDesign(db, owner, d)).added) designs += 1;
  }
  const taught = await seedGuildClass(db, teacher!, [tobias!, saoirse!], now);
  return { designs, ...taught };
}
