// The deletion sentences: counts and plurals as a teacher reads them (our own wording).
import { describe, expect, it } from 'vitest';
import { describeClassDeletion, describeLessonDeletion } from './deletionImpact.ts';

describe('what a deletion takes from students', () => {
  it('a class: students, lessons, progress and photos, with plurals', () => {
    expect(describeClassDeletion({ students: 3, lessons: 2, studentsWithProgress: 2, photos: 5 })).toBe(
      '3 students lose access to 2 lessons. Also deleted: the progress of 2 students and 5 photos. This cannot be undone.',
    );
    expect(describeClassDeletion({ students: 1, lessons: 1, studentsWithProgress: 0, photos: 1 })).toBe('1 student loses access to 1 lesson. Also deleted: 1 photo. This cannot be undone.');
    expect(describeClassDeletion({ students: 0, lessons: 4, studentsWithProgress: 0, photos: 0 })).toBe('No students are enrolled, so nobody loses access. This cannot be undone.');
  });

  it('a lesson: released or not yet', () => {
    expect(describeLessonDeletion({ students: 3, studentsWithProgress: 1, photos: 0 }, true)).toBe('3 students lose access to this lesson. Also deleted: the progress of 1 student. This cannot be undone.');
    expect(describeLessonDeletion({ students: 2, studentsWithProgress: 0, photos: 0 }, false)).toBe('It is not released yet, so no student has seen it. This cannot be undone.');
  });
});
