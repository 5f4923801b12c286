// Who sees which payments: only the class's teacher and admins see its payments (and refund them); a student sees
// only their own receipts. Two paid classes by two teachers, a buyer in each.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeTestDb } from '../helpers/db.ts';
import { payOnCheckoutPage } from '../helpers/payments.ts';
import { buildPaidClassWorld, checkout, type PaidClassWorld } from './paidClassWorld.ts';
import { expectStatus } from './teachingWorld.ts';

let a: PaidClassWorld;
let b: PaidClassWorld;
let paymentA: string;
let paymentB: string;
beforeAll(async () => {
  [a, b] = await Promise.all([buildPaidClassWorld('Access class Saffron'), buildPaidClassWorld('Access class Teal')]);
  const ca = await checkout(a, a.student);
  const cb = await checkout(b, b.student);
  await payOnCheckoutPage(ca.checkoutUrl);
  await payOnCheckoutPage(cb.checkoutUrl);
  paymentA = ca.paymentId;
  paymentB = cb.paymentId;
});
afterAll(closeTestDb);

const ids = (body: { payments: { id: string }[] }) => body.payments.map((p) => p.id);

describe('payments access', () => {
  it('a teacher sees their classes’ payments and totals only; an admin sees both', async () => {
    const teacherA = await expectStatus(a.teacher.client.get('/api/payments'), 200);
    expect(ids(teacherA)).toEqual([paymentA]);
    expect(teacherA.totals).toEqual([
      { classId: a.classId, classTitle: 'Access class Saffron', currency: 'EUR', paidCount: 1, paidAmount: 4500, refundedCount: 0, refundedAmount: 0 },
    ]);
    expect(ids(await expectStatus(b.teacher.client.get('/api/payments'), 200))).toEqual([paymentB]);
    expect(ids(await expectStatus(a.otherTeacher.client.get('/api/payments'), 200))).toEqual([]);
    const admin = await expectStatus(a.admin.client.get('/api/payments'), 200);
    expect(ids(admin)).toEqual(expect.arrayContaining([paymentA, paymentB]));
    const totals = admin.totals.filter((t: { classId: string }) => t.classId === a.classId || t.classId === b.classId);
    expect(totals).toHaveLength(2);
  });

  it('a student is refused the payments table (404) and sees only their own receipts', async () => {
    expect((await a.student.client.get('/api/payments')).status).toBe(404);
    const mine = await expectStatus(a.student.client.get('/api/payments/receipts'), 200);
    expect(mine.receipts.map((r: { id: string }) => r.id)).toEqual([paymentA]);
    expect(mine.receipts[0]).toMatchObject({ classTitle: 'Access class Saffron', amount: 4500, currency: 'EUR', state: 'paid' });
    expect(JSON.stringify(mine)).not.toContain(b.student.email);
    expect((await expectStatus(a.otherStudent.client.get('/api/payments/receipts'), 200)).receipts).toEqual([]);
    const page = await a.student.client.get('/payments');
    expect(page.text).toContain('Access class Saffron');
    expect(page.text).not.toContain('Access class Teal');
    expect(page.text).not.toContain('data-payments');
  });

  it('only the class’s teacher or an admin may refund; anyone else gets 404 and nothing changes', async () => {
    for (const who of [b.teacher, a.otherTeacher, a.student, b.student]) expect((await who.client.post(`/api/payments/${paymentA}/refund`)).status).toBe(404);
    expect((await a.teacher.client.post('/api/payments/not-a-uuid/refund')).status).toBe(404);
    expect((await expectStatus(a.teacher.client.get('/api/payments'), 200)).payments[0].state).toBe('paid');
  });

  it('the teacher’s page lists the payment with its amount in the viewer’s locale, and the class page shows the price', async () => {
    const page = await a.teacher.client.get('/payments', { headers: { 'accept-language': 'fr-FR' } });
    expect(page.text).toContain('data-payment-row');
    expect(page.text).toContain('45,00\u00a0€');
    const cls = await a.teacher.client.get(`/classes/${a.classId}`, { headers: { 'accept-language': 'en-GB' } });
    expect(cls.text).toContain('price €45.00');
  });
});
