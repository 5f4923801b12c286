// Paid classes end to end through the local payments fake, and the webhook's rules with events signed by the
// service's own SDK (tests/helpers/payments.ts): a bad signature or an old timestamp is 400 and changes nothing; the
// same event twice changes nothing the second time; events out of order end in the right state; a refund after a
// lesson was released keeps that lesson open and closes later ones.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { readCapturedMail, waitForMail } from '../helpers/mail.ts';
import { completedEvent, expiredEvent, payOnCheckoutPage, paymentsEnv, refundedEvent, sendWebhook, signatureFor, testId } from '../helpers/payments.ts';
import { buildPaidClassWorld, checkout, paymentFacts, type PaidClassWorld } from './paidClassWorld.ts';
import { createAccount } from '../helpers/accounts.ts';
import { expectStatus } from './teachingWorld.ts';

let w: PaidClassWorld;
beforeAll(async () => {
  w = await buildPaidClassWorld();
});
afterAll(closeTestDb);

const now = () => Math.floor(Date.now() / 1000);
const receiptsTo = (email: string) => readCapturedMail().filter((m) => m.to.includes(email) && m.subject.startsWith('Receipt'));

async function waitForState(paymentId: string, state: string) {
  for (let i = 0; i < 100; i += 1) {
    const f = await paymentFacts(paymentId);
    if (f.state === state) return f;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`payment ${paymentId} never became ${state}`);
}

describe('buying a paid class through the fake checkout', () => {
  it('a join code starts a checkout; the class stays closed until the signed completion; paying opens it once, with a receipt in the student’s locale', async () => {
    const { paymentId, checkoutUrl } = await checkout(w, w.student, 'de-DE,de;q=0.9');
    expect(checkoutUrl.startsWith(paymentsEnv.apiUrl)).toBe(true);
    expect((await paymentFacts(paymentId)).state).toBe('pending');
    expect((await w.student.client.get(`/api/classes/${w.classId}`)).status).toBe(404);
    expect((await w.student.client.get(`/api/lessons/${w.releasedLessonId}`)).status).toBe(404);

    const declined = await payOnCheckoutPage(checkoutUrl, '4000 0000 0000 0002');
    expect(declined.status).toBe(402);
    expect((await paymentFacts(paymentId)).state).toBe('pending');

    const paid = await payOnCheckoutPage(checkoutUrl);
    expect(paid.status).toBe(303);
    expect(paid.location).toMatch(/\/payments\/return\?session_id=cs_test_/);
    const facts = await paymentFacts(paymentId);
    expect(facts).toMatchObject({ state: 'paid', enrollment: { joined_via: 'payment', access_until: null } });
    expect(facts.events).toHaveLength(1);
    expect((await w.student.client.get(`/api/lessons/${w.releasedLessonId}`)).status).toBe(200);
    expect((await w.student.client.get(`/api/lessons/${w.futureLessonId}`)).status).toBe(404);

    // 45.00 EUR in German (CLDR via Intl): "45,00 €" with a no-break space.
    const receipt = await waitForMail(w.student.email, { subject: 'Receipt' });
    expect(receipt.text).toContain('45,00\u00a0€');
    expect(receipt.text).toContain(paymentId);
    const back = await w.student.client.get(new URL(paid.location!).pathname + new URL(paid.location!).search);
    expect(back.text).toContain('data-payment-state="paid"');

    // Joining again with the code goes straight to the class: no second checkout.
    const again = await expectStatus(w.student.client.post('/api/classes/join', { code: w.joinCode }), 200);
    expect(again).toMatchObject({ classId: w.classId, next: `/classes/${w.classId}` });
    expect(again.checkoutUrl).toBeUndefined();
  });

  it('cancelling on the checkout page comes back to the Classes page, which says nothing was charged', async () => {
    const buyer = await createAccount({ displayName: 'Perrin Welt' });
    const { paymentId, checkoutUrl } = await checkout(w, buyer);
    const res = await fetch(checkoutUrl, { method: 'POST', body: new URLSearchParams({ action: 'cancel' }), redirect: 'manual' });
    expect(res.status).toBe(303);
    const back = new URL(res.headers.get('location')!);
    expect(back.pathname + back.search).toBe('/classes?checkout=cancelled');
    expect((await buyer.client.get('/classes?checkout=cancelled')).text).toContain('nothing was charged');
    expect(await paymentFacts(paymentId)).toMatchObject({ state: 'pending', enrollment: null });
  });

  it('free classes still join at once, as before', async () => {
    const free = await expectStatus(w.teacher.client.post('/api/classes', { title: 'Free sampler', startsOn: new Date(Date.now() + 9 * 86_400_000).toISOString().slice(0, 10) }), 201);
    const joined = await expectStatus(w.otherStudent.client.post('/api/classes/join', { code: free.class.joinCode }), 200);
    expect(joined).toMatchObject({ classId: free.class.id, newlyJoined: true, next: `/classes/${free.class.id}` });
  });
});

describe('the webhook’s signature and replay window', () => {
  it('refuses a wrong secret, a missing signature, a changed body and a timestamp older than 5 minutes (400) and changes nothing', async () => {
    const buyer = await createAccount({ displayName: 'Idris Loom' });
    const { paymentId } = await checkout(w, buyer);
    const event = completedEvent(paymentId, testId('pi'));
    const cases = [
      await sendWebhook(event, { secret: 'whsec_not_ours' }),
      await sendWebhook(event, { signature: null }),
      await sendWebhook(event, { timestamp: now() - 600 }),
      await sendWebhook(event, { signature: 't=1,v1=00' }),
      // A signature made for other bytes (here: the same event with another amount).
      await sendWebhook(event, { signature: signatureFor(JSON.stringify({ ...event, data: { object: { ...event.data.object, amount_total: 1 } } })) }),
    ];
    for (const res of cases) expect(res).toMatchObject({ status: 400, body: { error: { code: 'invalid_signature' } } });
    const facts = await paymentFacts(paymentId);
    expect(facts).toMatchObject({ state: 'pending', events: [], enrollment: null });
    expect((await testDb().selectFrom('payment_event').select('event_id').where('event_id', '=', event.id).execute()).length).toBe(0);
    expect(receiptsTo(buyer.email)).toEqual([]);
    // Within the window it is taken (4 minutes old).
    expect((await sendWebhook(event, { timestamp: now() - 240 })).status).toBe(200);
    expect((await paymentFacts(paymentId)).state).toBe('paid');
  });
});

describe('exactly once, in any order', () => {
  it('the same event twice changes nothing the second time (one event row, one receipt)', async () => {
    const buyer = await createAccount({ displayName: 'Sorrel Quire' });
    const { paymentId } = await checkout(w, buyer);
    const event = completedEvent(paymentId, testId('pi'));
    expect((await sendWebhook(event)).body).toMatchObject({ outcome: 'applied' });
    await waitForMail(buyer.email, { subject: 'Receipt' });
    const first = await paymentFacts(paymentId);
    expect((await sendWebhook(event)).body).toMatchObject({ outcome: 'duplicate' });
    expect(await paymentFacts(paymentId)).toEqual(first);
    // A second completion with its own id (the service redelivering a copy) opens nothing twice either.
    expect((await sendWebhook(completedEvent(paymentId, first.paymentIntentId!))).body).toMatchObject({ outcome: 'applied' });
    const after = await paymentFacts(paymentId);
    expect(after.state).toBe('paid');
    expect(after.paidAt).toEqual(first.paidAt);
    await new Promise((r) => setTimeout(r, 300));
    expect(receiptsTo(buyer.email)).toHaveLength(1);
  });

  it('a refund that arrives before its completion is held, then applied: refunded, with only lessons released before the refund', async () => {
    const buyer = await createAccount({ displayName: 'Linnet Hale' });
    const { paymentId } = await checkout(w, buyer);
    const pi = testId('pi');
    const refundFirst = await sendWebhook(refundedEvent(pi, now()));
    expect(refundFirst.body).toMatchObject({ outcome: 'waiting' });
    expect((await paymentFacts(paymentId)).state).toBe('pending');
    expect((await sendWebhook(completedEvent(paymentId, pi, now() - 60))).body).toMatchObject({ outcome: 'applied' });
    const facts = await paymentFacts(paymentId);
    expect(facts.state).toBe('refunded');
    expect(facts.events.map((e) => e.applied)).toEqual([true, true]);
    expect(facts.enrollment?.access_until).not.toBeNull();
    expect((await buyer.client.get(`/api/lessons/${w.releasedLessonId}`)).status).toBe(200);
  });

  it('a stale expiry after payment keeps it paid; a completion after an expiry still opens the class', async () => {
    const a = await createAccount({ displayName: 'Hollis Bias' });
    const paidFirst = await checkout(w, a);
    await sendWebhook(completedEvent(paidFirst.paymentId, testId('pi'), now() - 30));
    await sendWebhook(expiredEvent(paidFirst.paymentId, now()));
    expect(await paymentFacts(paidFirst.paymentId)).toMatchObject({ state: 'paid', enrollment: { access_until: null } });

    const b = await createAccount({ displayName: 'Wynn Gusset' });
    const expiredFirst = await checkout(w, b);
    await sendWebhook(expiredEvent(expiredFirst.paymentId, now()));
    expect((await paymentFacts(expiredFirst.paymentId)).state).toBe('expired');
    await sendWebhook(completedEvent(expiredFirst.paymentId, testId('pi'), now() - 30));
    expect(await paymentFacts(expiredFirst.paymentId)).toMatchObject({ state: 'paid', enrollment: { joined_via: 'payment' } });
  });

  it('an event for no payment of ours, and event types we do not use, are taken (200) and change nothing', async () => {
    const stranger = completedEvent('00000000-0000-4000-8000-000000000000', testId('pi'));
    expect((await sendWebhook(stranger)).body).toMatchObject({ outcome: 'ignored' });
    expect((await sendWebhook({ ...stranger, id: testId('evt'), type: 'customer.created', data: { object: {} } })).body).toMatchObject({ outcome: 'ignored' });
  });
});

describe('refunds by the teacher', () => {
  it('a refund after a lesson was released keeps that lesson, closes later ones, says so on screen and by e-mail; a second refund is 409', async () => {
    const buyer = await createAccount({ displayName: 'Marigold Thimble' });
    const { paymentId, checkoutUrl } = await checkout(w, buyer);
    await payOnCheckoutPage(checkoutUrl);
    expect((await paymentFacts(paymentId)).state).toBe('paid');

    expect(await expectStatus(w.teacher.client.post(`/api/payments/${paymentId}/refund`), 202)).toEqual({ state: 'refund-requested' });
    const facts = await waitForState(paymentId, 'refunded');
    expect(facts.enrollment?.access_until).toEqual(facts.refundedAt);
    await waitForMail(buyer.email, { subject: 'Refund' });

    // The future lesson comes out now, after the refund: closed to the refunded student, open to a paying one.
    await testDb().updateTable('lesson').set({ release_at: new Date(Date.now() + 1500) }).where('id', '=', w.futureLessonId).execute();
    await new Promise((r) => setTimeout(r, 1600));
    expect((await buyer.client.get(`/api/lessons/${w.releasedLessonId}`)).status).toBe(200);
    expect((await buyer.client.get(`/api/lessons/${w.futureLessonId}`)).status).toBe(404);
    expect((await w.student.client.get(`/api/lessons/${w.futureLessonId}`)).status).toBe(200);
    const list = await expectStatus(buyer.client.get(`/api/classes/${w.classId}/lessons`), 200);
    expect(list.lessons.map((l: { id: string }) => l.id)).toEqual([w.releasedLessonId]);
    // The release e-mail goes to the paying student only.
    await expectStatus(w.admin.client.post('/api/lessons/release-sweep'), 200);
    await waitForMail(w.student.email, { subject: 'Evening lesson 2' });
    expect(readCapturedMail().filter((m) => m.to.includes(buyer.email) && m.subject.includes('Evening lesson 2'))).toEqual([]);
    const dashboard = await buyer.client.get('/dashboard');
    expect(dashboard.text).not.toContain('Evening lesson 2');
    const page = await buyer.client.get(`/classes/${w.classId}`);
    expect(page.text).toContain('data-refund-notice');
    expect(page.text).toContain('You keep the lessons');

    expect((await w.teacher.client.post(`/api/payments/${paymentId}/refund`)).status).toBe(409);
    // Buying it again opens the class again.
    const again = await checkout(w, buyer);
    await payOnCheckoutPage(again.checkoutUrl);
    expect(await paymentFacts(again.paymentId)).toMatchObject({ state: 'paid', enrollment: { access_until: null } });
    expect((await buyer.client.get(`/api/lessons/${w.futureLessonId}`)).status).toBe(200);
    // … and the lesson's release e-mail now goes to them too (sent here, not by the server's own sweep during a
    // later test file, which counts e-mails).
    await expectStatus(w.admin.client.post('/api/lessons/release-sweep'), 200);
    await waitForMail(buyer.email, { subject: 'Evening lesson 2' });
  });
});
