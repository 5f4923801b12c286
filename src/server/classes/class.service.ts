// Rules for classes and lessons: creating them, which template versions a lesson may use, and joining by code.
import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { problem } from '../http.ts';
import type { SessionUser } from '../auth/session.ts';
import type { createClassSchema, createLessonSchema, updateClassSchema, updateLessonSchema } from './class.schema.ts';
import { findVersionAccess } from '../templates/template.repository.ts';
import { enrollStudent, findClassByJoinCode, findClassRow, insertClass, insertLesson, updateClassRow, updateLessonRow } from './class.repository.ts';
import { generateJoinCode, normalizeJoinCode } from './joinCode.ts';
import { findEnrollment } from '../payments/payment.repository.ts';
import type { PaidClass } from '../payments/payment.service.ts';
import { checkClassStart, checkLessonRelease, type DateProblem } from './teachingDates.ts';

const UNIQUE_VIOLATION = '23505';
const isUniqueViolation = (e: unknown) => typeof e === 'object' && e !== null && (e as { code?: unknown }).code === UNIQUE_VIOLATION;

/** Creates a class with a fresh join code (a collision, ~1 in 10^11, just draws again). */
export async function createClass(db: Kysely<Database>, teacherId: string, input: Omit<z.output<typeof createClassSchema>, 'confirmed'>): Promise<string> {
  for (let attempt = 0; ; attempt += 1) {
    try {
      return await insertClass(db, {
        teacherId,
        title: input.title,
        description: input.description,
        startsOn: input.startsOn,
        priceCents: input.priceCents,
        currency: input.currency,
        joinCode: generateJoinCode(),
      });
    } catch (e) {
      if (!isUniqueViolation(e) || attempt >= 4) throw e;
    }
  }
}

export async function updateClass(db: Kysely<Database>, classId: string, input: z.output<typeof updateClassSchema>): Promise<void> {
  await updateClassRow(db, classId, {
    ...(input.title !== undefined && { title: input.title }),
    ...(input.description !== undefined && { description: input.description }),
    ...(input.startsOn !== undefined && { startsOn: input.startsOn }),
    ...(input.priceCents !== undefined && { priceCents: input.priceCents }),
    ...(input.currency !== undefined && { currency: input.currency }),
  });
}

/** Smallest price a paid class may have, in minor units: the payments service refuses smaller charges (about 0.50 in its main currencies; from memory). */
export const MIN_PRICE_MINOR = 50;

/**
 * A price and its currency as they will be stored (the request's values, else the stored ones): null when fine,
 * else the field to fix and why. 0 or no amount is a free class, whatever the currency.
 */
export function checkClassPrice(priceCents: number | null, currency: string | null): { field: 'priceCents' | 'currency'; message: string } | null {
  if (priceCents === null || priceCents === 0) return null;
  if (priceCents < MIN_PRICE_MINOR) return { field: 'priceCents', message: 'Price must be at least 0.50, or empty for a free class.' };
  if (currency === null) return { field: 'currency', message: 'Currency is needed with a price.' };
  return null;
}

/** The problem answer for checkClassPrice's complaint. */
export function priceProblemResponse(p: { field: string; message: string }): Response {
  return problem(400, 'invalid_input', p.message, { [p.field]: p.message });
}

export async function regenerateJoinCode(db: Kysely<Database>, classId: string): Promise<string> {
  const code = generateJoinCode();
  await updateClassRow(db, classId, { joinCode: code });
  return code;
}

/**
 * A lesson may use a version of the teacher's own template or of a public one (admins: any). Anything else is
 * reported exactly like a version that does not exist.
 */
export async function canUseTemplateVersion(db: Kysely<Database>, teacherId: string, user: SessionUser, versionId: string): Promise<boolean> {
  const row = await findVersionAccess(db, versionId);
  if (!row) return false;
  return row.visibility === 'public' || row.owner_id === teacherId || row.owner_id === user.id || user.role === 'admin';
}

export async function createLesson(db: Kysely<Database>, classId: string, input: Omit<z.output<typeof createLessonSchema>, 'confirmed'>): Promise<string> {
  return insertLesson(db, { classId, title: input.title, releaseAt: new Date(input.releaseAt), notesMd: input.notes, templateVersionId: input.templateVersionId });
}

export async function updateLesson(db: Kysely<Database>, lessonId: string, input: z.output<typeof updateLessonSchema>): Promise<void> {
  await updateLessonRow(db, lessonId, {
    ...(input.title !== undefined && { title: input.title }),
    ...(input.releaseAt !== undefined && { releaseAt: new Date(input.releaseAt) }),
    ...(input.notes !== undefined && { notesMd: input.notes }),
    ...(input.templateVersionId !== undefined && { templateVersionId: input.templateVersionId }),
  });
}

/** The start date of a new class, or a changed one (`currentStartsOn`: the stored date; the same date asks nothing). */
export function checkClassDates(input: { startsOn?: string | undefined; confirmed: boolean }, currentStartsOn?: string, now = new Date()): Result<void, DateProblem> {
  if (input.startsOn === undefined || input.startsOn === currentStartsOn) return ok(undefined);
  return checkClassStart(input.startsOn, now, input.confirmed);
}

/** The release of a new lesson, or a changed one (`currentReleaseAt`: the stored instant), against its class's start. */
export async function checkLessonDates(
  db: Kysely<Database>,
  classId: string,
  input: { releaseAt?: string | undefined; confirmed: boolean },
  currentReleaseAt?: Date,
  now = new Date(),
): Promise<Result<void, DateProblem>> {
  if (input.releaseAt === undefined || Date.parse(input.releaseAt) === currentReleaseAt?.getTime()) return ok(undefined);
  const cls = await findClassRow(db, classId);
  if (!cls) throw new Error(`server/classes/class.service: class ${classId} vanished while its lesson was checked`);
  return checkLessonRelease(input.releaseAt, cls.starts_on_text, now, input.confirmed);
}

export type JoinError = { kind: 'unknown-code' } | { kind: 'own-class' } | { kind: 'payment-required'; cls: PaidClass };

/** The class's price when it has one: a price and a currency, more than 0. */
export function paidClassOf(cls: { id: string; title: string; teacher_id: string; price_cents: number | null; currency: string | null }): PaidClass | null {
  if (cls.price_cents === null || cls.price_cents <= 0 || cls.currency === null) return null;
  return { id: cls.id, title: cls.title, teacherId: cls.teacher_id, priceCents: cls.price_cents, currency: cls.currency };
}

/** Enrols the user in the class whose join code they typed. */
export async function joinByCode(db: Kysely<Database>, user: SessionUser, typed: string): Promise<Result<{ classId: string; newlyJoined: boolean }, JoinError>> {
  const cls = await findClassByJoinCode(db, normalizeJoinCode(typed));
  // A class whose teacher is no longer a teacher takes no new students (the code answers as unknown).
  if (!cls || cls.teacher_role === 'quilter') return err({ kind: 'unknown-code' });
  if (cls.teacher_id === user.id) return err({ kind: 'own-class' });
  // A paid class opens through checkout; a student already in it (paid, or invited) just goes to it. A refunded
  // student may buy it again.
  const paid = paidClassOf(cls);
  if (paid) {
    const enrollment = await findEnrollment(db, cls.id, user.id);
    if (enrollment && enrollment.access_until === null) return ok({ classId: cls.id, newlyJoined: false });
    return err({ kind: 'payment-required', cls: paid });
  }
  const newlyJoined = await enrollStudent(db, cls.id, user.id, 'join-code');
  return ok({ classId: cls.id, newlyJoined });
}
