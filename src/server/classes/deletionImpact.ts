// The sentence a teacher reads before deleting a class or a lesson: what the students lose, in counts from the
// data (deletionImpact.repository.ts). Pure.
import type { ClassDeletionCounts, LessonDeletionCounts } from './deletionImpact.repository.ts';

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function progressAndPhotos(studentsWithProgress: number, photos: number): string {
  const parts = [
    ...(studentsWithProgress > 0 ? [`the progress of ${count(studentsWithProgress, 'student', 'students')}`] : []),
    ...(photos > 0 ? [count(photos, 'photo', 'photos')] : []),
  ];
  return parts.length > 0 ? ` Also deleted: ${parts.join(' and ')}.` : '';
}

export function describeClassDeletion(c: ClassDeletionCounts): string {
  const who = c.students === 0 ? 'No students are enrolled, so nobody loses access.' : `${count(c.students, 'student loses', 'students lose')} access to ${count(c.lessons, 'lesson', 'lessons')}.`;
  return `${who}${progressAndPhotos(c.studentsWithProgress, c.photos)} This cannot be undone.`;
}

export function describeLessonDeletion(c: LessonDeletionCounts, released: boolean): string {
  const who =
    c.students === 0
      ? 'No students are enrolled, so nobody loses access.'
      : released
        ? `${count(c.students, 'student loses', 'students lose')} access to this lesson.`
        : 'It is not released yet, so no student has seen it.';
  return `${who}${progressAndPhotos(c.studentsWithProgress, c.photos)} This cannot be undone.`;
}
