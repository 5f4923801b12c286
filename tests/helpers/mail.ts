// Reading the e-mail the fake SMTP server captured (scripts/lib/mailSink.mjs writes <id>.json files).
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { testEnv } from './env.ts';

export interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

/** Every captured message, oldest first. */
export function readCapturedMail(): CapturedMail[] {
  return readdirSync(testEnv.mailDir)
    .filter((f) => f.endsWith('.json'))
    .sort()
    .map((f) => JSON.parse(readFileSync(path.join(testEnv.mailDir, f), 'utf8')) as CapturedMail);
}

/** Waits (polling) for a message to `to` (case-insensitive) whose subject contains `subject`; the newest wins. */
export async function waitForMail(to: string, opts: { subject?: string; since?: Date; timeoutMs?: number } = {}): Promise<CapturedMail> {
  const deadline = Date.now() + (opts.timeoutMs ?? 10_000);
  const want = to.toLowerCase();
  for (;;) {
    const found = readCapturedMail()
      .filter((m) => m.to.some((t) => t.toLowerCase() === want))
      .filter((m) => !opts.subject || m.subject.includes(opts.subject))
      .filter((m) => !opts.since || Date.parse(m.receivedAt) >= opts.since.getTime() - 1000)
      .at(-1);
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`tests/helpers/mail: no mail to ${to}${opts.subject ? ` about "${opts.subject}"` : ''} arrived`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Every http(s) URL in a text, in order. */
export function linksIn(text: string): string[] {
  return [...text.matchAll(/https?:\/\/[^\s<>"]+/g)].map((m) => m[0]);
}
