// The teacher's roster: per enrolled student, released lessons finished (of those released), where they are now (the lesson they touched
// last, its step and total), when they were last active, and how many photos they uploaded. Plus CSV export.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { countReleasedLessons, listEnrolledStudents, listLatestProgress } from './roster.repository.ts';

export interface RosterEntry {
  studentId: string;
  displayName: string;
  email: string;
  joinedAt: string;
  joinedVia: 'invitation' | 'join-code' | 'payment';
  /** Released lessons finished, out of `lessonCount` released lessons (a lesson not out yet counts in neither). */
  lessonsFinished: number;
  lessonCount: number;
  current: { lessonId: string; lessonTitle: string; stepIndex: number; totalSteps: number; finished: boolean } | null;
  lastActiveAt: string | null;
  photos: number;
}

export async function readRoster(db: Kysely<Database>, classId: string): Promise<RosterEntry[]> {
  const lessonCount = await countReleasedLessons(db, classId);
  const rows = await listEnrolledStudents(db, classId);
  const latest = await listLatestProgress(db, classId);
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
      lessonCount,
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
