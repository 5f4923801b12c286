// Queries on `email_message`, the outbox and log of every e-mail (see mailer.ts for the delivery rules).
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

/** Queues a message (status pending); undefined when a message with the same dedupe key is already there. */
export async function insertEmailMessage(
  db: Db,
  m: { to: string; subject: string; text: string; html: string | null; kind: string; dedupeKey: string | null },
): Promise<string | undefined> {
  const row = await db
    .insertInto('email_message')
    .values({ to_address: m.to, subject: m.subject, body_text: m.text, body_html: m.html, kind: m.kind, dedupe_key: m.dedupeKey, last_error: null, sent_at: null })
    .onConflict((oc) => oc.column('dedupe_key').doNothing())
    .returning('id')
    .executeTakeFirst();
  return row?.id;
}

export async function findEmailMessage(db: Db, id: string) {
  return db.selectFrom('email_message').selectAll().where('id', '=', id).executeTakeFirstOrThrow();
}

/** Records one delivery attempt: sent (clearing any earlier error) or failed with its error text. */
export async function recordDeliveryAttempt(db: Db, id: string, outcome: { sentAt: Date } | { error: string }): Promise<void> {
  await db
    .updateTable('email_message')
    .set((eb) =>
      'sentAt' in outcome
        ? { status: 'sent', attempts: eb('attempts', '+', 1), sent_at: outcome.sentAt, last_error: null }
        : { status: 'failed', attempts: eb('attempts', '+', 1), last_error: outcome.error },
    )
    .where('id', '=', id)
    .execute();
}
