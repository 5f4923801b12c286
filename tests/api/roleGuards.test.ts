// Every route in tests/helpers/guardedRoutes.ts, for anonymous, quilter, teacher and admin visitors.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@db/schema.ts';
import { createAccount } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb } from '../helpers/db.ts';
import { guardedRoutes, type GuardedRoute } from '../helpers/guardedRoutes.ts';

const RANK: Record<Role, number> = { quilter: 0, teacher: 1, admin: 2 };
const clients = new Map<Role | 'anonymous', TestClient>();

beforeAll(async () => {
  clients.set('anonymous', new TestClient());
  for (const role of ['quilter', 'teacher', 'admin'] as const) clients.set(role, (await createAccount({ role })).client);
});
afterAll(closeTestDb);

function send(client: TestClient, r: GuardedRoute) {
  return client.request(r.method, r.path, r.body === undefined ? {} : { body: r.body });
}

describe.each(guardedRoutes)('$method $path ($kind, $minRole and up)', (route) => {
  it('anonymous: 401 JSON (API) or a redirect to sign-in with a return path (page)', async () => {
    const res = await send(clients.get('anonymous')!, route);
    if (route.kind === 'api') {
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    } else {
      expect(res.status).toBe(302);
      expect(res.headers.get('location')).toBe(`/sign-in?next=${encodeURIComponent(route.path)}`);
    }
  });

  for (const role of ['quilter', 'teacher', 'admin'] as const) {
    const allowed = RANK[role] >= RANK[route.minRole];
    it(`${role}: ${allowed ? 'allowed' : '404, as if the route did not exist'}`, async () => {
      const res = await send(clients.get(role)!, route);
      if (allowed) {
        expect([401, 404]).not.toContain(res.status);
        expect(res.status).toBeLessThan(500);
        expect(res.headers.get('location') ?? '').not.toContain('/sign-in');
      } else {
        expect(res.status).toBe(404);
        if (route.kind === 'api') expect(res.body.error.code).toBe('not_found');
        else expect(res.text).toContain('We could not find that page');
      }
    });
  }
});
