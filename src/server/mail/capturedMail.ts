// Dev tools only: the messages the local fake SMTP server captured (scripts/lib/mailSink.mjs writes
// one <id>.json per message into MAIL_CAPTURE_DIR).
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';

const capturedSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
});
export type CapturedMail = z.infer<typeof capturedSchema>;

/** Newest first, at most `limit`; unreadable files are skipped. */
export function listCapturedMail(dir: string, limit = 100): CapturedMail[] {
  let files: string[];
  try {
    files = readdirSync(dir).filter((f) => f.endsWith('.json'));
  } catch {
    return [];
  }
  return files
    .sort()
    .reverse()
    .slice(0, limit)
    .flatMap((f) => {
      try {
        const parsed = capturedSchema.safeParse(JSON.parse(readFileSync(path.join(dir, f), 'utf8')));
        return parsed.success ? [parsed.data] : [];
      } catch {
        return [];
      }
    });
}

export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; href: string };

/** Splits plain text into text and http(s) links, so a page can render the links as anchors. */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let at = 0;
  for (const m of text.matchAll(/https?:\/\/[^\s<>"]+/g)) {
    if (m.index > at) parts.push({ kind: 'text', text: text.slice(at, m.index) });
    parts.push({ kind: 'link', href: m[0] });
    at = m.index + m[0].length;
  }
  if (at < text.length) parts.push({ kind: 'text', text: text.slice(at) });
  return parts;
}
