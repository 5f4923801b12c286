// The teacher's roster: per enrolled student, lessons finished, where they are now (the lesson they touched
// last, its step and total), when they were last active, and how many photos they uploaded. Plus CSV export.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';

export interface RosterEntry {
  studentId: string;
  displayName: string;
  email: string;
  joinedAt: string;
  joinedVia: 'invitation' | 'join-code';
  lessonsFinished: number;
  lessonCount: number;
  current: { lessonId: string; lessonTitle: string; stepIndex: number; totalSteps: number; finished: boolean } | null;
  lastActiveAt: string | null;
  photos: number;
}

export async function readRoster(db: Kysely<Database>, classId: string): Promise<RosterEntry[]> {
  const lessonCount = await db.selectFrom('lesson').select((eb) => eb.fn.countAll<number>().as('n')).where('class_id', '=', classId).executeTakeFirstOrThrow();
  const rows = await db
    .selectFrom('enrollment as e')
    .innerJoin('account as a', 'a.id', 'e.student_id')
    .select(['a.id', 'a.display_name', 'a.email', 'e.joined_at', 'e.joined_via'])
    .select((eb) => [
      eb
        .selectFrom('lesson_progress as p')
        .innerJoin('lesson as l', 'l.id', 'p.lesson_id')
        .select(eb.fn.countAll<number>().as('n'))
        .whereRef('p.student_id', '=', 'a.id')
        .where('l.class_id', '=', classId)
        .where('p.finished_at', 'is not', null)
        .as('finished'),
      eb
        .selectFrom('lesson_photo as ph')
        .innerJoin('lesson as l', 'l.id', 'ph.lesson_id')
        .select(eb.fn.countAll<number>().as('n'))
        .whereRef('ph.student_id', '=', 'a.id')
        .where('l.class_id', '=', classId)
        .as('photos'),
    ])
    .where('e.class_id', '=', classId)
    .orderBy('a.display_name')
    .execute();
  const latest = await db
    .selectFrom('lesson_progress as p')
    .innerJoin('lesson as l', 'l.id', 'p.lesson_id')
    .distinctOn('p.student_id')
    .select(['p.student_id', 'p.lesson_id', 'l.title', 'p.step_index', 'p.total_steps', 'p.finished_at', 'p.last_active_at'])
    .where('l.class_id', '=', classId)
    .orderBy('p.student_id')
    .orderBy('p.last_active_at', 'desc')
    .execute();
  const byStudent = new Map(latest.map((p) => [p.student_id, p]));
  return rows.map((r) => {
    const p = byStudent.get(r.id);
    return {
      studentId: r.id,
      displayName: r.display_name,
      email: r.email,
      joinedAt: r.joined_at.toISOString(),
      joinedVia: r.joined_via,
      lessonsFinished: Number(r.finished ?? 0),
      lessonCount: Number(lessonCount.n),
      current: p ? { lessonId: p.lesson_id, lessonTitle: p.title, stepIndex: p.step_index, totalSteps: p.total_steps, finished: p.finished_at !== null } : null,
      lastActiveAt: p ? p.last_active_at.toISOString() : null,
      photos: Number(r.photos ?? 0),
    };
  });
}

/** RFC 4180 CSV (CRLF line ends, fields quoted when needed). Cells that a spreadsheet would run as a formula
 *  (starting with = + - @) get a leading apostrophe (OWASP "CSV injection" advice). */
export function rosterToCsv(entries: readonly RosterEntry[]): string {
  const header = ['student', 'email', 'joined', 'joined via', 'lessons finished', 'lessons', 'current lesson', 'current step', 'total steps', 'last active', 'photos'];
  const lines = entries.map((e) => [
    e.displayName,
    e.email,
    e.joinedAt,
    e.joinedVia,
    String(e.lessonsFinished),
    String(e.lessonCount),
    e.current?.lessonTitle ?? '',
    e.current ? String(displayStep(e.current)) : '',
    e.current ? String(e.current.totalSteps) : '',
    e.lastActiveAt ?? '',
    String(e.photos),
  ]);
  return [header, ...lines].map((cells) => cells.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

function csvCell(value: string): string {
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** The step a person reads: progress stores a 0-based index, screens and the CSV count from 1. */
export function displayStep(p: { stepIndex: number; totalSteps: number }): number {
  return Math.min(p.stepIndex + 1, Math.max(p.totalSteps, 1));
}
