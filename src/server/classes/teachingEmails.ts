// The teaching e-mails, as plain text (links on their own line so every mail client makes them clickable).
import type { OutgoingEmail } from '../mail/mailer.ts';

import { formatDate, WITHOUT_VIEWER } from '@shared/format/dates.ts';

const day = (d: Date) => formatDate(d, 'day', WITHOUT_VIEWER);

export function classInvitationEmail(to: string, classTitle: string, teacherName: string, link: string, expiresAt: Date): OutgoingEmail {
  return {
    to,
    kind: 'class-invitation',
    subject: `${teacherName} invites you to the class "${classTitle}"`,
    text: [
      'Hello,',
      '',
      `${teacherName} invites you to join "${classTitle}" on Threadway, where each lesson is one block and the route to quilt it, step by step.`,
      '',
      'Open this link to join (you can sign in or create an account on the way):',
      '',
      link,
      '',
      `The link works once and until ${day(expiresAt)}. If you were not expecting it, ignore this message.`,
      '',
      '— Threadway',
    ].join('\n'),
  };
}

export function lessonReleasedEmail(
  to: string,
  studentName: string,
  lesson: { id: string; title: string; classTitle: string },
  link: string,
  studentId: string,
): OutgoingEmail {
  return {
    to,
    kind: 'lesson-release',
    // Send once per lesson and student, however often the sweep runs or the server restarts.
    dedupeKey: `lesson-release:${lesson.id}:${studentId}`,
    subject: `New lesson in "${lesson.classTitle}": ${lesson.title}`,
    text: [
      `Hello ${studentName},`,
      '',
      `The lesson "${lesson.title}" of "${lesson.classTitle}" is open now. The route and the step-by-step walkthrough are waiting for you:`,
      '',
      link,
      '',
      'Happy quilting!',
      '',
      '— Threadway',
    ].join('\n'),
  };
}
