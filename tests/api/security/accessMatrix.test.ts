// The access matrix: every route of the app (read from src/pages by routeInventory.ts) against six visitors, as
// accessMatrix.ts expects. A route with no row fails the first test, so a new endpoint cannot skip the matrix;
// tests/helpers/guardedRoutes.ts (the role-guard list) must agree with the rows. Refusals never carry the thing's
// data, and nothing answers 500.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@db/schema.ts';
import { closeTestDb } from '../../helpers/db.ts';
import { guardedRoutes } from '../../helpers/guardedRoutes.ts';
import { matrixExemptions, matrixRows, type Answer } from './accessMatrix.ts';
import { listRoutes, matchesPattern, routeKey } from './routeInventory.ts';
import { ACTORS, buildSecurityWorld, SECRET_WORDS, type Actor, type SecurityWorld } from './securityWorld.ts';

let w: SecurityWorld;
beforeAll(async () => {
  w = await buildSecurityWorld();
});
afterAll(closeTestDb);

const isOk = (status: number) => status >= 200 && status < 400 && status !== 302;

describe('the route list', () => {
  const routes = listRoutes();
  const rowKeys = new Set(matrixRows.map((r) => r.route));

  it('finds the app’s routes on disk (a sanity check of the inventory itself)', () => {
    expect(routes.length).toBeGreaterThan(70);
    expect(routes.map(routeKey)).toContain('GET /api/designs/[id]/versions/[version]');
    expect(routes.map(routeKey)).toContain('POST /sign-out');
  });

  it('has a matrix row (or a stated exemption) for every route, and no row for a route that does not exist', () => {
    const missing = routes.map(routeKey).filter((k) => !rowKeys.has(k) && !(k in matrixExemptions));
    expect(missing, 'add these routes to tests/api/security/accessMatrix.ts').toEqual([]);
    const known = new Set(routes.map(routeKey));
    expect([...rowKeys, ...Object.keys(matrixExemptions)].filter((k) => !known.has(k)), 'rows for routes that are gone').toEqual([]);
    expect(new Set(matrixRows.map((r) => r.route)).size, 'one row per route').toBe(matrixRows.length);
  });

  it('agrees with tests/helpers/guardedRoutes.ts (anonymous refused, lower roles 404, allowed roles let through)', () => {
    const rank: Record<Role, number> = { quilter: 0, teacher: 1, admin: 2 };
    const roleOf: Record<Exclude<Actor, 'anonymous'>, Role> = { quilter: 'quilter', teacher: 'teacher', admin: 'admin', otherQuilter: 'quilter', otherTeacher: 'teacher' };
    for (const g of guardedRoutes) {
      const row = matrixRows.find((r) => r.route.startsWith(`${g.method} `) && matchesPattern(r.route.slice(g.method.length + 1), g.path));
      expect(row, `${g.method} ${g.path} has a matrix row`).toBeDefined();
      expect(row!.expect.anonymous, `${g.method} ${g.path} anonymous`).toBe(g.kind === 'api' ? 401 : 302);
      for (const [actor, role] of Object.entries(roleOf) as [Exclude<Actor, 'anonymous'>, Role][]) {
        const code = row!.expect[actor];
        if (rank[role] < rank[g.minRole]) expect(code, `${g.method} ${g.path} ${actor}`).toBe(404);
        else expect([401, 404], `${g.method} ${g.path} ${actor}`).not.toContain(code);
      }
    }
  });
});

describe('access matrix', () => {
  for (const row of matrixRows) {
    it(`${row.route}${row.note ? ` (${row.note})` : ''}`, async () => {
      const got: Partial<Record<Actor, number>> = {};
      for (const a of ACTORS) {
        const allowed = isOk(row.expect[a]);
        const res: Answer = row.send ? await row.send(w, a, allowed) : await w.client(a).request(row.route.split(' ')[0]!, row.path(w), row.body === undefined ? {} : { body: row.body });
        got[a] = res.status;
        if (res.status === 401 || res.status === 404) for (const word of SECRET_WORDS) expect(res.text, `${row.route} as ${a} leaks "${word}"`).not.toContain(word);
        if (res.status === 302 && row.expect[a] === 302 && a === 'anonymous' && row.route.startsWith('GET /') && !row.route.startsWith('GET /sign')) {
          expect(res.headers?.get('location'), `${row.route}: anonymous goes to sign-in and back`).toBe(`/sign-in?next=${encodeURIComponent(row.path(w))}`);
        }
      }
      expect(got).toEqual(row.expect);
    });
  }
});
