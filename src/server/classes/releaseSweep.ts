// Lesson-release e-mails. A lesson is released when its release_at has passed (the database clock decides).
// Each enrolled student gets one e-mail per lesson: the outbox row's dedupe_key `lesson-release:<lesson>:<student>`
// is unique, so a second sweep, a restart or two server processes racing cannot send it twice.
// Students who joined after a lesson came out are not told about it (they see it in the class anyway).
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { sendEmail } from '../mail/mailer.ts';
import { listUnannouncedReleases } from './lessonRelease.repository.ts';
import { lessonReleasedEmail } from './teachingEmails.ts';

export interface SweepReport {
  sent: number;
  failed: number;
  alreadySent: number;
}

/** Lessons released within this many days are still announced (older ones are not: no floods after downtime). */
export const ANNOUNCE_WINDOW_DAYS = 14;

export async function sweepLessonReleases(db: Kysely<Database>, origin: string): Promise<SweepReport> {
  const due = await listUnannouncedReleases(db, ANNOUNCE_WINDOW_DAYS, 500);
  const report: SweepReport = { sent: 0, failed: 0, alreadySent: 0 };
  for (const r of due) {
    const link = new URL(`/classes/${r.class_id}/lessons/${r.lesson_id}`, origin).href;
    const outcome = await sendEmail(db, lessonReleasedEmail(r.email, r.display_name, { id: r.lesson_id, title: r.title, classTitle: r.class_title }, link, r.student_id));
    if (outcome.status === 'sent') report.sent += 1;
    else if (outcome.status === 'failed') report.failed += 1;
    else report.alreadySent += 1;
  }
  return report;
}
