// Server-rendered pages: what anonymous and signed-in visitors get, and the dev-only mail page.
import { afterAll, describe, expect, it } from 'vitest';
import { createAccount } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb } from '../helpers/db.ts';

afterAll(closeTestDb);

describe('pages', () => {
  it('home page says what Threadway does and offers sign-up to anonymous visitors', async () => {
    const res = await new TestClient().get('/');
    expect(res.status).toBe(200);
    for (const words of ['continuous', 'binding', 'batting', 'bobbin', 'walkthrough', 'href="/sign-up"']) expect(res.text).toContain(words);
  });

  for (const path of ['/sign-in', '/sign-up', '/forgot-password', '/reset-password']) {
    it(`${path} renders for anonymous visitors`, async () => {
      const res = await new TestClient().get(path);
      expect(res.status).toBe(200);
      expect(res.text).toContain('<h1');
    });
  }

  it('serves island forms with the submit button disabled until they hydrate (no native submit of a password)', async () => {
    const res = await new TestClient().get('/sign-in');
    const form = /<form[^>]*aria-label="Sign in"[^>]*>/.exec(res.text)?.[0] ?? '';
    expect(form).toContain('method="post"');
    expect(res.text).toMatch(/<button type="submit" disabled=""/);
  });

  it('sends a signed-in visitor from /sign-in to the requested local page, never to another site', async () => {
    const a = await createAccount();
    expect((await a.client.get('/sign-in?next=/account')).headers.get('location')).toBe('/account');
    expect((await a.client.get('/sign-in?next=//evil.example/x')).headers.get('location')).toBe('/dashboard');
    expect((await a.client.get('/sign-in?next=https://evil.example')).headers.get('location')).toBe('/dashboard');
  });

  it('shows the signed-in header: Account, Sign out, and Admin only for admins', async () => {
    const q = await createAccount();
    const dash = await q.client.get('/dashboard');
    expect(dash.text).toContain('My latest designs');
    expect(dash.text).toContain('href="/designs"');
    expect(dash.text).toContain('action="/sign-out"');
    expect(dash.text).not.toContain('href="/admin/accounts"');
    const admin = await createAccount({ role: 'admin' });
    expect((await admin.client.get('/dashboard')).text).toContain('href="/admin/accounts"');
  });

  it('renders the 404 page for unknown pages', async () => {
    const res = await new TestClient().get('/no-such-page');
    expect(res.status).toBe(404);
    expect(res.text).toContain('We could not find that page');
  });

  it('lists captured mail with clickable links on /dev/mail for an admin (DEV_TOOLS is on under npm test)', async () => {
    const a = await createAccount();
    const admin = await createAccount({ role: 'admin' });
    await new TestClient().post('/api/password-resets', { email: a.email });
    let html = '';
    for (let i = 0; i < 50 && !html.includes(a.email); i += 1) {
      html = (await admin.client.get('/dev/mail')).text;
      if (!html.includes(a.email)) await new Promise((r) => setTimeout(r, 100));
    }
    expect(html).toContain(a.email);
    expect(html).toMatch(/<a href="http:\/\/[^"]+\/reset-password\?token=[a-z2-7]{32}"/);
  });
});
