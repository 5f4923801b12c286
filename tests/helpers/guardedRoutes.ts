// Every route that needs a signed-in user or a role. tests/api/roleGuards.test.ts checks each one for
// anonymous, quilter, teacher and admin visitors. Add your routes here when you add guarded ones:
//   api  — anonymous → 401 JSON `unauthenticated`; role too low → 404 JSON `not_found`.
//   page — anonymous → 302 to /sign-in?next=<path>; role too low → 404 page.
// `request` must be harmless for a visitor who is allowed (e.g. an empty body that fails validation);
// an allowed visitor must get neither 401, nor 404, nor a redirect to sign-in.
import type { Role } from '@db/schema.ts';

export interface GuardedRoute {
  kind: 'api' | 'page';
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  path: string;
  /** The lowest role allowed (roles rank quilter < teacher < admin). */
  minRole: Role;
  body?: unknown;
}

const SOME_UUID = '00000000-0000-4000-8000-000000000000';

export const guardedRoutes: GuardedRoute[] = [
  { kind: 'api', method: 'GET', path: '/api/session', minRole: 'quilter' },
  { kind: 'api', method: 'GET', path: '/api/account', minRole: 'quilter' },
  { kind: 'api', method: 'PATCH', path: '/api/account', minRole: 'quilter', body: {} },
  { kind: 'api', method: 'PUT', path: '/api/account/password', minRole: 'quilter', body: {} },
  { kind: 'api', method: 'PUT', path: '/api/account/email', minRole: 'quilter', body: {} },
  { kind: 'api', method: 'GET', path: '/api/admin/accounts', minRole: 'admin' },
  // Designs: only the collection routes fit here; every /api/designs/:id route answers 404 to anyone but the
  // design's owner, which tests/api/designsAccess.test.ts checks endpoint by endpoint (401 anonymous too).
  { kind: 'api', method: 'GET', path: '/api/designs', minRole: 'quilter' },
  { kind: 'api', method: 'POST', path: '/api/designs', minRole: 'quilter', body: {} },
  { kind: 'api', method: 'PATCH', path: `/api/admin/accounts/${SOME_UUID}`, minRole: 'admin', body: {} },
  { kind: 'api', method: 'POST', path: '/api/admin/storage-sweep', minRole: 'admin' },
  { kind: 'api', method: 'GET', path: '/api/payments', minRole: 'teacher' },
  { kind: 'api', method: 'GET', path: '/api/payments/receipts', minRole: 'quilter' },
  { kind: 'page', method: 'GET', path: '/dashboard', minRole: 'quilter' },
  { kind: 'page', method: 'GET', path: '/account', minRole: 'quilter' },
  { kind: 'page', method: 'GET', path: '/payments', minRole: 'quilter' },
  { kind: 'page', method: 'GET', path: '/admin/accounts', minRole: 'admin' },
  // Exists only with DEV_TOOLS (true under npm test); it shows reset links, so admins only.
  { kind: 'page', method: 'GET', path: '/dev/mail', minRole: 'admin' },
];
