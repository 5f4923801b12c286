// A paid class for the payments tests: a teacher's class at 45.00 EUR with a released lesson and a future one, a
// student who has not joined, another teacher, another student, an admin. `checkout` starts a checkout through the
// join code, as the Classes page does; `pendingPayment` gives a fresh pending payment to drive by hand-made events.
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { testDb } from '../helpers/db.ts';
import { DAY, daysAhead, expectStatus, insertDesignWithRoute, iso } from './teachingWorld.ts';

export interface PaidClassWorld {
  teacher: TestAccount;
  otherTeacher: TestAccount;
  student: TestAccount;
  otherStudent: TestAccount;
  admin: TestAccount;
  classId: string;
  joinCode: string;
  releasedLessonId: string;
  futureLessonId: string;
}

export async function buildPaidClassWorld(title = 'Heron Bend evening class'): Promise<PaidClassWorld> {
  const [teacher, otherTeacher, student, otherStudent, admin] = await Promise.all([
    createAccount({ role: 'teacher', displayName: 'Tamsin Wick' }),
    createAccount({ role: 'teacher', displayName: 'Bram Selvedge' }),
    createAccount({ displayName: 'Ottilie Pennant' }),
    createAccount({ displayName: 'Fenn Marlowe' }),
    createAccount({ role: 'admin', displayName: 'Guild Treasurer' }),
  ]);
  const designId = await insertDesignWithRoute(teacher, 4);
  const published = await expectStatus(teacher.client.post('/api/templates', { designId, title: 'Evening line block', difficulty: 'beginner', visibility: 'class' }), 201);
  const cls = await expectStatus(teacher.client.post('/api/classes', { title, startsOn: daysAhead(20), priceCents: 4500, currency: 'EUR' }), 201);
  const lesson = (t: string, at: string) => ({ title: t, releaseAt: at, templateVersionId: published.version.id, confirmed: true });
  const released = await expectStatus(teacher.client.post(`/api/classes/${cls.class.id}/lessons`, lesson('Evening lesson 1', iso(-DAY))), 201);
  const future = await expectStatus(teacher.client.post(`/api/classes/${cls.class.id}/lessons`, lesson('Evening lesson 2', iso(30 * DAY))), 201);
  return { teacher, otherTeacher, student, otherStudent, admin, classId: cls.class.id, joinCode: cls.class.joinCode, releasedLessonId: released.lesson.id, futureLessonId: future.lesson.id };
}

/** Starts a checkout as `student` through the join code → the payment's id and the fake's checkout page. */
export async function checkout(w: PaidClassWorld, student: TestAccount, acceptLanguage = 'en-GB'): Promise<{ paymentId: string; checkoutUrl: string }> {
  const joined = await expectStatus(student.client.post('/api/classes/join', { code: w.joinCode }, { headers: { 'accept-language': acceptLanguage } }), 200);
  if (typeof joined.checkoutUrl !== 'string') throw new Error(`tests/api/paidClassWorld: no checkout for a paid class: ${JSON.stringify(joined)}`);
  const row = await testDb().selectFrom('class_payment').select('id').where('student_id', '=', student.id).where('class_id', '=', w.classId).orderBy('created_at', 'desc').executeTakeFirstOrThrow();
  return { paymentId: row.id, checkoutUrl: joined.checkoutUrl };
}

/** What the database holds for a payment: its state, its events, the student's enrolment. */
export async function paymentFacts(paymentId: string) {
  const db = testDb();
  const p = await db.selectFrom('class_payment').selectAll().where('id', '=', paymentId).executeTakeFirstOrThrow();
  const events = await db.selectFrom('payment_event').select(['event_id', 'type', 'applied']).where('payment_id', '=', paymentId).execute();
  const enrollment = p.class_id
    ? await db.selectFrom('enrollment').select(['joined_via', 'access_until']).where('class_id', '=', p.class_id).where('student_id', '=', p.student_id).executeTakeFirst()
    : undefined;
  return { state: p.state, paymentIntentId: p.payment_intent_id, paidAt: p.paid_at, refundedAt: p.refunded_at, events, enrollment: enrollment ?? null };
}
