// Account settings: profile, password and e-mail changes.
import { afterAll, describe, expect, it } from 'vitest';
import { createAccount, signIn, uniqueEmail } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb } from '../helpers/db.ts';
import { waitForMail } from '../helpers/mail.ts';

afterAll(closeTestDb);

describe('account settings', () => {
  it('changes display name and units', async () => {
    const a = await createAccount();
    const res = await a.client.patch('/api/account', { displayName: '  Wren   of the  Bend ', units: 'cm' });
    expect(res.status).toBe(200);
    expect(res.body.account).toMatchObject({ displayName: 'Wren of the Bend', units: 'cm' });
    expect((await a.client.get('/api/account')).body.account.units).toBe('cm');
  });

  it('changes the password only with the current one, and signs out other sessions', async () => {
    const a = await createAccount();
    const other = await signIn(a.email, a.password);
    const wrong = await a.client.put('/api/account/password', { currentPassword: 'not-my-password', newPassword: 'new-password-123' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.currentPassword).toBeTruthy();
    const ok = await a.client.put('/api/account/password', { currentPassword: a.password, newPassword: 'new-password-123' });
    expect(ok.status).toBe(200);
    expect((await a.client.get('/api/session')).status).toBe(200);
    expect((await other.get('/api/session')).status).toBe(401);
    await signIn(a.email, 'new-password-123');
  });

  it('changes the e-mail with the current password, refuses a taken one and tells the old address', async () => {
    const a = await createAccount();
    const b = await createAccount();
    const taken = await a.client.put('/api/account/email', { email: b.email.toUpperCase(), currentPassword: a.password });
    expect(taken.status).toBe(409);
    expect(taken.body.error.fields.email).toBeTruthy();
    const wrong = await a.client.put('/api/account/email', { email: uniqueEmail(), currentPassword: 'nope-nope-nope' });
    expect(wrong.status).toBe(400);
    const fresh = uniqueEmail('moved');
    const since = new Date();
    const ok = await a.client.put('/api/account/email', { email: fresh, currentPassword: a.password });
    expect(ok.status).toBe(200);
    expect(ok.body.account.email).toBe(fresh);
    const notice = await waitForMail(a.email, { subject: 'e-mail address was changed', since });
    expect(notice.text).toContain(fresh);
    await signIn(fresh, a.password);
    expect((await new TestClient().post('/api/session', { email: a.email, password: a.password })).status).toBe(401);
  });
});
