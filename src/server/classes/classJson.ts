// How classes and lessons appear in API responses. Managers (the teacher, admins) also see the join code
// and the Markdown source of the notes; students see the rendered notes only.
import type { ClassListRow, LessonListRow } from './class.repository.ts';
import { renderNotes } from './markdown.ts';

export interface ClassJson {
  id: string;
  title: string;
  description: string;
  startsOn: string;
  priceCents: number | null;
  currency: string | null;
  teacher: { id: string; displayName: string };
  lessonCount: number;
  studentCount: number;
  joinCode?: string;
  createdAt: string;
}

export function toClassJson(row: ClassListRow, asManager: boolean): ClassJson {
  return {
    id: row.id,
    title: row.title,
    description: row.description,
    startsOn: row.starts_on_text,
    priceCents: row.price_cents,
    currency: row.currency,
    teacher: { id: row.teacher_id, displayName: row.teacher_name },
    lessonCount: Number(row.lesson_count ?? 0),
    studentCount: Number(row.student_count ?? 0),
    ...(asManager && { joinCode: row.join_code }),
    createdAt: row.created_at.toISOString(),
  };
}

export interface LessonJson {
  id: string;
  classId: string;
  title: string;
  releaseAt: string;
  released: boolean;
  notesHtml: string;
  notes?: string;
  template: { id: string; versionId: string; version: number; title: string };
}

export function toLessonJson(row: LessonListRow, asManager: boolean): LessonJson {
  return {
    id: row.id,
    classId: row.class_id,
    title: row.title,
    releaseAt: row.release_at.toISOString(),
    released: Boolean(row.released),
    notesHtml: renderNotes(row.notes_md),
    ...(asManager && { notes: row.notes_md }),
    template: { id: row.template_id, versionId: row.template_version_id, version: row.template_version, title: row.template_title },
  };
}
