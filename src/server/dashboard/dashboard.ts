// What the dashboard shows a signed-in person: their latest designs with the figures a quilter looks for first
// (passes and stops), the next lesson in each class they joined, and for teachers what their students did this
// week. The choice of "next lesson" is a pure function (nextLessons) with its tests beside it.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { currentSummaryOf } from '../designs/designRecord.ts';
import { listEnrolledLessonsWithProgress, listRecentDesigns, listTeachingActivitySince } from './dashboard.repository.ts';

const RECENT_DESIGNS = 4;
const NEXT_LESSONS = 3;
const WEEK_MS = 7 * 24 * 60 * 60 * 1000;

export interface RecentDesign {
  id: string;
  title: string;
  updatedAt: string;
  thumbnailSvg: string | null;
  /** Null while the figures for the latest save are still being computed (`pending`) or when there are none. */
  passes: number | null;
  stops: number | null;
  pending: boolean;
}

export interface LessonWithProgress {
  classId: string;
  classTitle: string;
  lessonId: string;
  lessonTitle: string;
  releaseAt: Date;
  released: boolean;
  stepIndex: number | null;
  totalSteps: number | null;
  finished: boolean;
}

/** start: released, not opened yet; continue: opened, not finished; coming: the next lesson still to be released. */
export type NextLesson = LessonWithProgress & { kind: 'start' | 'continue' | 'coming' };

export interface ClassActivity {
  classId: string;
  title: string;
  students: number;
  activeStudents: number;
  lessonsFinished: number;
  photos: number;
}

/**
 * One entry per class: the first released lesson the student has not finished (start or continue), or when every
 * released lesson is finished, the next one to be released; a class with nothing left gives nothing. Lessons to
 * work on come before lessons still to come; `rows` arrive by release date.
 */
export function nextLessons(rows: readonly LessonWithProgress[], limit: number): NextLesson[] {
  const byClass = new Map<string, LessonWithProgress[]>();
  for (const r of rows) byClass.set(r.classId, [...(byClass.get(r.classId) ?? []), r]);
  const toWork: NextLesson[] = [];
  const coming: NextLesson[] = [];
  for (const lessons of byClass.values()) {
    const open = lessons.find((l) => l.released && !l.finished);
    if (open) {
      toWork.push({ ...open, kind: open.stepIndex !== null && open.stepIndex > 0 ? 'continue' : 'start' });
      continue;
    }
    const next = lessons.find((l) => !l.released);
    if (next) coming.push({ ...next, kind: 'coming' });
  }
  const byRelease = (a: NextLesson, b: NextLesson) => a.releaseAt.getTime() - b.releaseAt.getTime();
  return [...toWork.sort(byRelease), ...coming.sort(byRelease)].slice(0, limit);
}

export interface Dashboard {
  recentDesigns: RecentDesign[];
  nextLessons: NextLesson[];
  /** Only for teachers (and admins who teach): one row per class taught. */
  teaching: ClassActivity[];
}

export async function loadDashboard(db: Kysely<Database>, user: { id: string; role: string }, now: Date): Promise<Dashboard> {
  const [designs, lessons, activity] = await Promise.all([
    listRecentDesigns(db, user.id, RECENT_DESIGNS),
    listEnrolledLessonsWithProgress(db, user.id),
    user.role === 'quilter' ? Promise.resolve([]) : listTeachingActivitySince(db, user.id, new Date(now.getTime() - WEEK_MS)),
  ]);
  return {
    recentDesigns: designs.map((d) => {
      const summary = currentSummaryOf(d);
      return { id: d.id, title: d.title, updatedAt: d.updated_at.toISOString(), thumbnailSvg: d.thumbnail_svg || null, passes: summary?.passes ?? null, stops: summary?.stops ?? null, pending: d.summary_version !== d.version };
    }),
    nextLessons: nextLessons(
      lessons.map((l) => ({
        classId: l.class_id,
        classTitle: l.class_title,
        lessonId: l.lesson_id,
        lessonTitle: l.lesson_title,
        releaseAt: l.release_at,
        released: Boolean(l.released),
        stepIndex: l.step_index,
        totalSteps: l.total_steps,
        finished: l.finished_at !== null,
      })),
      NEXT_LESSONS,
    ),
    teaching: activity.map((a) => ({
      classId: a.id,
      title: a.title,
      students: Number(a.students ?? 0),
      activeStudents: Number(a.active_students ?? 0),
      lessonsFinished: Number(a.lessons_finished ?? 0),
      photos: Number(a.photos ?? 0),
    })),
  };
}
