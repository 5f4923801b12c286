// The demo guild's content: Tobias's and Saoirse's designs, Marigold's template and class. Accounts are looked
// up by the e-mails the demo file gives them.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { findAccountRowByEmail } from '@server/accounts/account.repository.ts';
import { seedGuildClass } from './guildClass.ts';
import { seedGuildQuilt } from './guildQuilt.ts';
import { seedDesign } from './guildDesigns.ts';
import { saoirseDrawings, tobiasDrawings } from './guildDrawings.ts';

async function accountId(db: Kysely<Database>, email: string | undefined): Promise<string> {
  if (!email) throw new Error('scripts/seed/guildContent: demo-accounts.json lacks a demo account the content needs');
  const row = await findAccountRowByEmail(db, email);
  if (!row) throw new Error(`scripts/seed/guildContent: demo account ${email} is missing`);
  return row.id;
}

export interface GuildPeople {
  readonly teacher: string | undefined;
  readonly tobias: string | undefined;
  readonly saoirse: string | undefined;
}

/** Adds the guild's designs, templates, class and quilt for the people (e-mails) named; idempotent. */
export async function seedGuildContent(db: Kysely<Database>, emails: GuildPeople, now: Date) {
  const [teacher, tobias, saoirse] = await Promise.all([emails.teacher, emails.tobias, emails.saoirse].map((e) => accountId(db, e)));
  let designs = 0;
  for (const [owner, drawings] of [[tobias!, tobiasDrawings()], [saoirse!, saoirseDrawings()]] as const) {
    for (const d of drawings) if ((await seedDesign(db, owner, d)).added) designs += 1;
  }
  const taught = await seedGuildClass(db, teacher!, [tobias!, saoirse!], now);
  const quilts = await seedGuildQuilt(db, teacher!);
  return { designs, ...taught, quilts };
}
