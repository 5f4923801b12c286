// Every query about class payments and payment webhook events. No rules here: payment.service.ts,
// paymentWebhook.service.ts and refund.service.ts decide; these read and write.
import { sql, type Kysely, type Selectable, type Transaction } from 'kysely';
import type { ClassPaymentTable, Database, PaymentStateColumn } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;
export type PaymentRow = Selectable<ClassPaymentTable>;

export interface NewPaymentValues {
  classId: string;
  teacherId: string;
  classTitle: string;
  studentId: string;
  amount: number;
  currency: string;
  locale: string | null;
}

export async function insertPayment(db: Db, v: NewPaymentValues): Promise<string> {
  const row = await db
    .insertInto('class_payment')
    .values({ class_id: v.classId, teacher_id: v.teacherId, class_title: v.classTitle, student_id: v.studentId, amount: v.amount, currency: v.currency, locale: v.locale })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function setCheckoutSession(db: Db, paymentId: string, sessionId: string): Promise<void> {
  await db.updateTable('class_payment').set({ checkout_session_id: sessionId, updated_at: new Date() }).where('id', '=', paymentId).execute();
}

export async function findPaymentById(db: Db, id: string): Promise<PaymentRow | undefined> {
  return db.selectFrom('class_payment').selectAll().where('id', '=', id).executeTakeFirst();
}

/** The student's own payment for a checkout session (the return page), or undefined. */
export async function findStudentPaymentBySession(db: Db, studentId: string, sessionId: string): Promise<PaymentRow | undefined> {
  return db.selectFrom('class_payment').selectAll().where('checkout_session_id', '=', sessionId).where('student_id', '=', studentId).executeTakeFirst();
}

/** The payment row locked for this transaction (webhook events for one payment are applied one at a time). */
export async function lockPayment(trx: Transaction<Database>, by: { id: string } | { paymentIntentId: string }): Promise<PaymentRow | undefined> {
  const q = trx.selectFrom('class_payment').selectAll();
  return ('id' in by ? q.where('id', '=', by.id) : q.where('payment_intent_id', '=', by.paymentIntentId)).forUpdate().executeTakeFirst();
}

export async function updatePaymentState(
  db: Db,
  id: string,
  changes: { state: PaymentStateColumn; paymentIntentId?: string | null; paidAt?: Date; refundedAt?: Date },
): Promise<void> {
  await db
    .updateTable('class_payment')
    .set({
      state: changes.state,
      ...(changes.paymentIntentId !== undefined && changes.paymentIntentId !== null && { payment_intent_id: changes.paymentIntentId }),
      ...(changes.paidAt !== undefined && { paid_at: changes.paidAt }),
      ...(changes.refundedAt !== undefined && { refunded_at: changes.refundedAt }),
      updated_at: new Date(),
    })
    .where('id', '=', id)
    .execute();
}

/**
 * Records a webhook event by its id. False when the id is already there: the event was delivered before and must
 * change nothing now.
 */
export async function recordPaymentEvent(
  db: Db,
  v: { eventId: string; type: string; paymentId: string | null; paymentIntentId: string | null; occurredAt: Date; applied: boolean },
): Promise<boolean> {
  const row = await db
    .insertInto('payment_event')
    .values({ event_id: v.eventId, type: v.type, payment_id: v.paymentId, payment_intent_id: v.paymentIntentId, occurred_at: v.occurredAt, applied: v.applied })
    .onConflict((oc) => oc.column('event_id').doNothing())
    .returning('event_id')
    .executeTakeFirst();
  return row !== undefined;
}

/** Refund events that arrived before the completion naming their payment intent, oldest first. */
export async function listWaitingEvents(db: Db, paymentIntentId: string) {
  return db.selectFrom('payment_event').select(['event_id', 'type', 'occurred_at']).where('payment_intent_id', '=', paymentIntentId).where('applied', '=', false).orderBy('occurred_at').execute();
}

export async function markEventsApplied(db: Db, eventIds: readonly string[], paymentId: string): Promise<void> {
  if (eventIds.length === 0) return;
  await db.updateTable('payment_event').set({ applied: true, payment_id: paymentId }).where('event_id', 'in', eventIds).execute();
}

/** Opens the class to a paying student: a new enrolment, or a refunded one opened again (access_until cleared). */
export async function enrollPaidStudent(db: Db, classId: string, studentId: string): Promise<void> {
  await db
    .insertInto('enrollment')
    .values({ class_id: classId, student_id: studentId, joined_via: 'payment' })
    .onConflict((oc) => oc.columns(['class_id', 'student_id']).doUpdateSet({ access_until: null }))
    .execute();
}

/** Closes lessons released after `until` to the student; what was released by then stays open. */
export async function endEnrollmentAccess(db: Db, classId: string, studentId: string, until: Date): Promise<void> {
  await db.updateTable('enrollment').set({ access_until: until }).where('class_id', '=', classId).where('student_id', '=', studentId).execute();
}

export interface PaymentListRow {
  id: string;
  class_id: string | null;
  class_title: string;
  student_name: string;
  student_email: string;
  amount: number;
  currency: string;
  state: PaymentStateColumn;
  created_at: Date;
  paid_at: Date | null;
  refunded_at: Date | null;
}

/** Payments for the teacher's classes (teacherId) or every class (null: admins), newest first, at most `limit`. */
export async function listPaymentsFor(db: Db, teacherId: string | null, limit: number): Promise<PaymentListRow[]> {
  let q = db
    .selectFrom('class_payment as p')
    .innerJoin('account as s', 's.id', 'p.student_id')
    .select(['p.id', 'p.class_id', 'p.class_title', 's.display_name as student_name', 's.email as student_email', 'p.amount', 'p.currency', 'p.state', 'p.created_at', 'p.paid_at', 'p.refunded_at']);
  if (teacherId !== null) q = q.where('p.teacher_id', '=', teacherId);
  return q.orderBy('p.created_at', 'desc').limit(limit).execute();
}

export interface PaymentTotalRow {
  class_id: string | null;
  class_title: string;
  currency: string;
  paid_count: number;
  paid_amount: number;
  refunded_count: number;
  refunded_amount: number;
}

/** Per class and currency: payments kept (paid) and refunded, counts and sums in minor units. */
export async function listPaymentTotals(db: Db, teacherId: string | null): Promise<PaymentTotalRow[]> {
  let q = db
    .selectFrom('class_payment')
    .select([
      'class_id',
      'class_title',
      'currency',
      sql<number>`count(*) filter (where state = 'paid')::int`.as('paid_count'),
      sql<number>`coalesce(sum(amount) filter (where state = 'paid'), 0)::int`.as('paid_amount'),
      sql<number>`count(*) filter (where state = 'refunded' and paid_at is not null)::int`.as('refunded_count'),
      sql<number>`coalesce(sum(amount) filter (where state = 'refunded' and paid_at is not null), 0)::int`.as('refunded_amount'),
    ])
    .where('state', 'in', ['paid', 'refunded']);
  if (teacherId !== null) q = q.where('teacher_id', '=', teacherId);
  return q.groupBy(['class_id', 'class_title', 'currency']).orderBy('class_title').orderBy('currency').execute();
}

/** The student's own payments (their receipts), newest first. */
export async function listStudentPayments(db: Db, studentId: string): Promise<PaymentRow[]> {
  return db.selectFrom('class_payment').selectAll().where('student_id', '=', studentId).where('state', 'in', ['paid', 'refunded']).orderBy('created_at', 'desc').limit(200).execute();
}

/** The student's enrolment in a class: whether they have one and, after a refund, until when it is open. */
export async function findEnrollment(db: Db, classId: string, studentId: string): Promise<{ access_until: Date | null } | undefined> {
  return db.selectFrom('enrollment').select('access_until').where('class_id', '=', classId).where('student_id', '=', studentId).executeTakeFirst();
}

export async function findAccountContact(db: Db, id: string): Promise<{ email: string; display_name: string } | undefined> {
  return db.selectFrom('account').select(['email', 'display_name']).where('id', '=', id).executeTakeFirst();
}

/**
 * Serialises, until the transaction ends, all work on one payment intent: a refund that arrives while its
 * completion is being applied waits, then finds the payment (or is parked and later applied by the completion).
 */
export async function lockPaymentIntent(trx: Transaction<Database>, paymentIntentId: string): Promise<void> {
  await sql`select pg_advisory_xact_lock(hashtextextended(${paymentIntentId}, 7))`.execute(trx);
}
