// Admin accounts API: search with paging, role changes, and the last admin rule.
import { afterAll, describe, expect, it } from 'vitest';
import { createAccount } from '../helpers/accounts.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';

afterAll(closeTestDb);

describe('admin accounts', () => {
  it('searches by e-mail or display name, case-insensitively, with paging', async () => {
    const admin = await createAccount({ role: 'admin' });
    const tag = `Pinwheel${Date.now()}`;
    for (let i = 0; i < 3; i += 1) await createAccount({ displayName: `${tag} Member ${i}` });
    const page1 = await admin.client.get(`/api/admin/accounts?q=${tag.toLowerCase()}&pageSize=2`);
    expect(page1.status).toBe(200);
    expect(page1.body.total).toBe(3);
    expect(page1.body.accounts).toHaveLength(2);
    const page2 = await admin.client.get(`/api/admin/accounts?q=${tag}&pageSize=2&page=2`);
    expect(page2.body.accounts).toHaveLength(1);
    const ids = [...page1.body.accounts, ...page2.body.accounts].map((a: { id: string }) => a.id);
    expect(new Set(ids).size).toBe(3);
    const byEmail = await admin.client.get(`/api/admin/accounts?q=${encodeURIComponent(admin.email.toUpperCase())}`);
    expect(byEmail.body.accounts.map((a: { id: string }) => a.id)).toEqual([admin.id]);
  });

  it('treats % and _ in the search as plain characters', async () => {
    const admin = await createAccount({ role: 'admin' });
    const res = await admin.client.get('/api/admin/accounts?q=%25');
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(0);
  });

  it('changes a role', async () => {
    const admin = await createAccount({ role: 'admin' });
    const q = await createAccount();
    const res = await admin.client.patch(`/api/admin/accounts/${q.id}`, { role: 'teacher' });
    expect(res.status).toBe(200);
    expect(res.body.account.role).toBe('teacher');
    expect((await q.client.get('/api/account')).body.account.role).toBe('teacher');
  });

  it('answers 404 for an unknown account id', async () => {
    const admin = await createAccount({ role: 'admin' });
    const res = await admin.client.patch('/api/admin/accounts/00000000-0000-4000-8000-000000000000', { role: 'teacher' });
    expect(res.status).toBe(404);
    expect((await admin.client.patch('/api/admin/accounts/not-a-uuid', { role: 'teacher' })).status).toBe(404);
  });

  it('never demotes the last admin', async () => {
    const db = testDb();
    const admin = await createAccount({ role: 'admin' });
    // Make this the only admin for the duration of the test, then restore the others.
    const others = await db.selectFrom('account').select('id').where('role', '=', 'admin').where('id', '!=', admin.id).execute();
    const otherIds = others.map((o) => o.id);
    try {
      if (otherIds.length) await db.updateTable('account').set({ role: 'teacher' }).where('id', 'in', otherIds).execute();
      const res = await admin.client.patch(`/api/admin/accounts/${admin.id}`, { role: 'quilter' });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('last_admin');
      expect((await db.selectFrom('account').select('role').where('id', '=', admin.id).executeTakeFirstOrThrow()).role).toBe('admin');

      const second = await createAccount({ role: 'admin' });
      const ok = await second.client.patch(`/api/admin/accounts/${admin.id}`, { role: 'quilter' });
      expect(ok.status).toBe(200);
      // Now `second` is the last one.
      expect((await second.client.patch(`/api/admin/accounts/${second.id}`, { role: 'teacher' })).status).toBe(409);
      await db.updateTable('account').set({ role: 'quilter' }).where('id', '=', second.id).execute();
    } finally {
      if (otherIds.length) await db.updateTable('account').set({ role: 'admin' }).where('id', 'in', otherIds).execute();
    }
  });

  it('two admins demoting each other at the same moment: one wins, one is refused, an admin remains (the server decides under a lock)', async () => {
    const db = testDb();
    const others = (await db.selectFrom('account').select('id').where('role', '=', 'admin').execute()).map((o) => o.id);
    try {
      if (others.length) await db.updateTable('account').set({ role: 'teacher' }).where('id', 'in', others).execute();
      for (let round = 0; round < 5; round += 1) {
        const [a, b] = await Promise.all([createAccount({ role: 'admin' }), createAccount({ role: 'admin' })]);
        const [ra, rb] = await Promise.all([a.client.patch(`/api/admin/accounts/${b.id}`, { role: 'quilter' }), b.client.patch(`/api/admin/accounts/${a.id}`, { role: 'quilter' })]);
        // The loser is refused as the last admin (409), or, when the winner's change landed before the loser's
        // request was even read, as no longer an admin (404: roles take effect on the next request).
        const refused = ra.status === 200 ? rb : ra;
        expect([ra.status, rb.status]).toContain(200);
        expect([404, 409]).toContain(refused.status);
        if (refused.status === 409) {
          expect(refused.body.error.code).toBe('last_admin');
          expect(refused.body.error.message).toMatch(/^This is the only admin account, and there must always be one admin so that someone can change roles\./);
        }
        const left = await db.selectFrom('account').select('id').where('role', '=', 'admin').execute();
        expect(left).toHaveLength(1);
        await db.updateTable('account').set({ role: 'quilter' }).where('id', 'in', [a.id, b.id]).execute();
      }
    } finally {
      if (others.length) await db.updateTable('account').set({ role: 'admin' }).where('id', 'in', others).execute();
    }
  });
});
