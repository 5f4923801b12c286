// Outgoing e-mail. Every message is first written to `email_message` (the outbox and the log), then
// handed to the SMTP server; the row records the outcome: pending → sent, or failed with the error and
// the attempt count. Messages that must go out once only carry a `dedupeKey`. (Retrying failed rows
// is not automated yet; `attempts` and `last_error` keep what a retry job needs.)
import nodemailer from 'nodemailer';
import { MAIL_FROM, SMTP_HOST, SMTP_PORT } from 'astro:env/server';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { findEmailMessage, insertEmailMessage, recordDeliveryAttempt } from './emailMessage.repository.ts';

export interface OutgoingEmail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** What the message is about, for the log: 'password-reset', 'email-changed', 'lesson-release', … */
  kind: string;
  /** Same key twice → the second message is not queued again. */
  dedupeKey?: string;
}

export type SendOutcome = { status: 'sent'; id: string } | { status: 'failed'; id: string; error: string } | { status: 'duplicate' };

const transport = nodemailer.createTransport({
  host: SMTP_HOST,
  port: SMTP_PORT,
  secure: false,
  ignoreTLS: true,
  connectionTimeout: 10_000,
  greetingTimeout: 10_000,
  socketTimeout: 20_000,
});

/** Queues the message in the outbox and delivers it now. Failures are recorded, not thrown. */
export async function sendEmail(db: Kysely<Database>, mail: OutgoingEmail): Promise<SendOutcome> {
  const id = await insertEmailMessage(db, { to: mail.to, subject: mail.subject, text: mail.text, html: mail.html ?? null, kind: mail.kind, dedupeKey: mail.dedupeKey ?? null });
  if (id === undefined) return { status: 'duplicate' };
  return deliver(db, id);
}

async function deliver(db: Kysely<Database>, id: string): Promise<SendOutcome> {
  const msg = await findEmailMessage(db, id);
  try {
    await transport.sendMail({
      from: MAIL_FROM,
      to: msg.to_address,
      subject: msg.subject,
      text: msg.body_text,
      ...(msg.body_html !== null && { html: msg.body_html }),
    });
    await recordDeliveryAttempt(db, id, { sentAt: new Date() });
    return { status: 'sent', id };
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    console.error(`[mail] message ${id} (${msg.kind}) to ${msg.to_address} failed: ${message}`);
    await recordDeliveryAttempt(db, id, { error: message.slice(0, 1000) });
    return { status: 'failed', id, error: message };
  }
}
