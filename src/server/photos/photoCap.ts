// The 12-photo cap is enforced by the database (trigger lesson_photo_cap, migration 2026_12_04_1710): the insert
// takes a per-(lesson, student) lock and counts, so parallel uploads cannot pass the count together. The count
// before reading an upload (countPhotos) only spares the work of a photo that would be refused anyway.
import { MAX_PHOTOS_PER_LESSON } from './photo.service.ts';
import { problem } from '../http.ts';

export function isPhotoCapViolation(error: unknown): boolean {
  return typeof error === 'object' && error !== null && (error as { constraint?: unknown }).constraint === 'lesson_photo_per_student_cap';
}

export function photoCapResponse(): Response {
  return problem(409, 'conflict', `You already have ${MAX_PHOTOS_PER_LESSON} photos for this lesson. Delete one to add another.`);
}
