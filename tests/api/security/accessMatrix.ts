// Who may do what, one row per route (method + file-system pattern), six visitors per row, as DEVELOPERS.md
// "Who may see what" says: anonymous → 401 on the API (pages: 302 to sign-in); signed in without the role, or asking
// for another owner's thing → 404; a teacher check passes for admins, an owner check (designs) only for the owner.
// A 400/409 in a column means the visitor got past every guard and only the (deliberately harmless) body was refused.
// routeInventory.ts lists the routes from src/pages; the test fails for a route without a row here.
import { TestClient } from '../../helpers/client.ts';
import { sendBytes } from '../teachingWorld.ts';
import { ACTORS, type Actor, type SecurityWorld } from './securityWorld.ts';

type Status = number;
export interface Answer {
  status: number;
  text: string;
  headers?: Headers;
}

export interface MatrixRow {
  /** "METHOD /pattern" exactly as routeInventory.ts names it. */
  route: string;
  /** The concrete path the row asks for. */
  path: (w: SecurityWorld) => string;
  body?: unknown;
  /** For rows that need more than one request or a thing of their own per visitor. */
  send?: (w: SecurityWorld, a: Actor, allowed: boolean) => Promise<Answer>;
  expect: Record<Actor, Status>;
  note?: string;
}

/** Outcomes in ACTORS order: anonymous, quilter, teacher, admin, otherQuilter, otherTeacher. */
const s = (...codes: Status[]): Record<Actor, Status> => Object.fromEntries(ACTORS.map((a, i) => [a, codes[i]!])) as Record<Actor, Status>;
const all = (code: Status) => s(code, code, code, code, code, code);
const signedIn = (code: Status) => s(401, code, code, code, code, code);
const page = (code: Status) => s(302, code, code, code, code, code);
/** The thing's owner, teacher or admin may: a fresh thing for them, the shared one for the refused. */
const fresh = (make: (w: SecurityWorld) => Promise<string>, shared: (w: SecurityWorld) => string, request: (w: SecurityWorld, id: string) => string, method = 'DELETE') =>
  async (w: SecurityWorld, a: Actor, allowed: boolean): Promise<Answer> => w.client(a).request(method, request(w, allowed ? await make(w) : shared(w)));
/** A session of its own, so signing out does not end the visitor's main one. */
async function throwawaySession(w: SecurityWorld, a: Actor): Promise<TestClient> {
  if (a === 'anonymous') return new TestClient();
  const { email, password } = w.accounts[a];
  const c = new TestClient();
  const res = await c.post('/api/session', { email, password });
  if (res.status !== 200) throw new Error(`tests/api/security/accessMatrix: sign-in as ${a} failed: ${res.text}`);
  return c;
}

/** A new quilt of the quilter's holding one new design (never planned, so nothing is cached for it). */
async function quiltOfFreshDesign(w: SecurityWorld): Promise<string> {
  const designId = await w.fresh.design();
  const res = await w.client('quilter').post('/api/quilts', { title: 'Fresh quilt', quilt: { version: 1, units: 'in', rows: 1, columns: 1, block: { width: 12, height: 12 }, placements: [[{ designId }]] } });
  if (res.status !== 201) throw new Error(`tests/api/security/accessMatrix: quilt not made: ${res.text}`);
  return res.body.quilt.id as string;
}
/** One plan job of the quilter's, made once and asked for by every visitor. */
let planJob: Promise<{ quiltId: string; jobId: string }> | undefined;
function quilterPlanJob(w: SecurityWorld): Promise<{ quiltId: string; jobId: string }> {
  planJob ??= (async () => {
    const quiltId = await quiltOfFreshDesign(w);
    const res = await w.client('quilter').post(`/api/quilts/${quiltId}/plan`);
    if (res.status !== 202) throw new Error(`tests/api/security/accessMatrix: plan job not made: ${res.text}`);
    return { quiltId, jobId: res.body.job.id as string };
  })();
  return planJob;
}

export const matrixRows: MatrixRow[] = [
  // Accounts and sessions
  { route: 'POST /api/accounts', path: () => '/api/accounts', body: {}, expect: all(400) },
  { route: 'POST /api/accounts/confirm', path: () => '/api/accounts/confirm', body: {}, expect: all(400), note: 'the e-mailed token is the key; flows in tests/api/signUp*.test.ts' },
  { route: 'GET /api/session', path: () => '/api/session', expect: signedIn(200) },
  { route: 'POST /api/session', path: () => '/api/session', body: {}, expect: all(400) },
  { route: 'DELETE /api/session', path: () => '/api/session', send: async (w, a) => (await throwawaySession(w, a)).delete('/api/session'), expect: all(204) },
  { route: 'POST /sign-out', path: () => '/sign-out', send: async (w, a) => (await throwawaySession(w, a)).post('/sign-out'), expect: all(303) },
  { route: 'POST /api/password-resets', path: () => '/api/password-resets', body: {}, expect: all(400) },
  { route: 'POST /api/password-resets/confirm', path: () => '/api/password-resets/confirm', body: {}, expect: all(400) },
  { route: 'GET /api/account', path: () => '/api/account', expect: signedIn(200) },
  { route: 'PATCH /api/account', path: () => '/api/account', body: { units: 'in' }, expect: signedIn(200) },
  { route: 'PUT /api/account/password', path: () => '/api/account/password', body: {}, expect: signedIn(400) },
  { route: 'PUT /api/account/email', path: () => '/api/account/email', body: {}, expect: signedIn(400) },
  { route: 'GET /api/admin/accounts', path: () => '/api/admin/accounts', expect: s(401, 404, 404, 200, 404, 404) },
  { route: 'PATCH /api/admin/accounts/[id]', path: (w) => `/api/admin/accounts/${w.accounts.otherQuilter.id}`, body: {}, expect: s(401, 404, 404, 400, 404, 404) },
  { route: 'POST /api/admin/storage-sweep', path: () => '/api/admin/storage-sweep', expect: s(401, 404, 404, 200, 404, 404) },

  // Quilts: the owner only, like designs
  { route: 'GET /api/quilts', path: () => '/api/quilts', expect: signedIn(200) },
  { route: 'POST /api/quilts', path: () => '/api/quilts', body: {}, expect: signedIn(400) },
  { route: 'GET /api/quilts/[id]', path: (w) => `/api/quilts/${w.quiltId}`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'PUT /api/quilts/[id]', path: (w) => `/api/quilts/${w.quiltId}`, body: { baseVersion: 999, title: 'taken over' }, expect: s(401, 409, 404, 404, 404, 404), note: 'stale baseVersion: the owner gets 409 and nothing changes' },
  {
    route: 'POST /api/quilts/[id]/plan',
    path: (w) => `/api/quilts/${w.quiltId}/plan`,
    send: async (w, a, allowed) => w.client(a).post(`/api/quilts/${allowed ? await quiltOfFreshDesign(w) : w.quiltId}/plan`),
    expect: s(401, 202, 404, 404, 404, 404),
    note: 'the owner asks for a quilt of a design never planned: 202 and a job (200 comes from the cache)',
  },
  {
    route: 'GET /api/quilts/[id]/plan-jobs/[jobId]',
    path: () => '/api/quilts/…/plan-jobs/…',
    send: async (w, a) => {
      const { quiltId, jobId } = await quilterPlanJob(w);
      return w.client(a).get(`/api/quilts/${quiltId}/plan-jobs/${jobId}`);
    },
    expect: s(401, 200, 404, 404, 404, 404),
  },
  { route: 'GET /api/quilts/[id]/plan.pdf', path: (w) => `/api/quilts/${w.quiltId}/plan.pdf`, expect: s(401, 200, 404, 404, 404, 404), note: 'the printed plan: owner only, as the quilt' },
  { route: 'GET /api/quilts/[id]/schedule', path: (w) => `/api/quilts/${w.quiltId}/schedule`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'PUT /api/quilts/[id]/schedule', path: (w) => `/api/quilts/${w.quiltId}/schedule`, body: { classId: null, start: '2027-02-30' }, expect: s(401, 400, 404, 404, 404, 404), note: 'a day that does not exist: the owner gets 400 and nothing changes' },
  { route: 'DELETE /api/quilts/[id]', path: (w) => `/api/quilts/${w.quiltId}`, send: fresh((w) => w.fresh.quiltId(), (w) => w.quiltId, (_, id) => `/api/quilts/${id}`), expect: s(401, 200, 404, 404, 404, 404) },

  // Designs: the owner only (admins included in "not the owner")
  { route: 'GET /api/designs', path: () => '/api/designs', expect: signedIn(200) },
  { route: 'POST /api/designs', path: () => '/api/designs', body: {}, expect: signedIn(400) },
  { route: 'GET /api/designs/[id]', path: (w) => `/api/designs/${w.designId}`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'PUT /api/designs/[id]', path: (w) => `/api/designs/${w.designId}`, body: { baseVersion: 999, title: 'taken over' }, expect: s(401, 409, 404, 404, 404, 404), note: 'stale baseVersion: the owner gets 409 and nothing changes' },
  { route: 'DELETE /api/designs/[id]', path: (w) => `/api/designs/${w.designId}`, send: fresh((w) => w.fresh.design(), (w) => w.designId, (_, id) => `/api/designs/${id}`), expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'POST /api/designs/[id]/check', path: (w) => `/api/designs/${w.designId}/check`, body: {}, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'POST /api/designs/[id]/plan', path: (w) => `/api/designs/${w.designId}/plan`, body: {}, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'POST /api/designs/[id]/duplicate', path: (w) => `/api/designs/${w.designId}/duplicate`, expect: s(401, 201, 404, 404, 404, 404) },
  { route: 'POST /api/designs/[id]/restore', path: (w) => `/api/designs/${w.designId}/restore`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'GET /api/designs/[id]/export.svg', path: (w) => `/api/designs/${w.designId}/export.svg`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'GET /api/designs/[id]/plan.pdf', path: (w) => `/api/designs/${w.designId}/plan.pdf`, expect: s(401, 200, 404, 404, 404, 404), note: 'the printed plan: owner only, as the design' },
  { route: 'GET /api/designs/[id]/route', path: (w) => `/api/designs/${w.designId}/route`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'PUT /api/designs/[id]/route', path: (w) => `/api/designs/${w.designId}/route`, body: { kind: 'planned', designVersion: 999 }, expect: s(401, 409, 404, 404, 404, 404) },
  { route: 'GET /api/designs/[id]/versions', path: (w) => `/api/designs/${w.designId}/versions`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'GET /api/designs/[id]/versions/[version]', path: (w) => `/api/designs/${w.designId}/versions/1`, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'POST /api/designs/[id]/versions/[version]/restore', path: (w) => `/api/designs/${w.designId}/versions/1/restore`, body: { baseVersion: 999 }, expect: s(401, 409, 404, 404, 404, 404) },

  // Templates: visibility rules (templateAccess.ts); the class-only template is open to the class's students
  { route: 'GET /api/templates', path: () => '/api/templates', expect: all(200) },
  { route: 'POST /api/templates', path: () => '/api/templates', body: {}, expect: s(401, 404, 400, 400, 404, 400) },
  { route: 'GET /api/templates/mine', path: () => '/api/templates/mine', expect: s(401, 404, 200, 200, 404, 200) },
  { route: 'GET /api/templates/[id]', path: (w) => `/api/templates/${w.classTemplateId}`, expect: s(404, 200, 200, 200, 404, 404), note: 'a read anyone may make for a public template: anonymous gets 404, not 401' },
  { route: 'PUT /api/templates/[id]', path: (w) => `/api/templates/${w.classTemplateId}`, body: {}, expect: s(401, 404, 200, 200, 404, 404) },
  { route: 'POST /api/templates/[id]/copy', path: (w) => `/api/templates/${w.classTemplateId}/copy`, body: {}, expect: s(401, 201, 201, 201, 404, 404) },
  { route: 'GET /api/templates/[id]/versions/[version]', path: (w) => `/api/templates/${w.classTemplateId}/versions/1`, expect: s(404, 200, 200, 200, 404, 404) },
  { route: 'GET /api/templates/link/[token]', path: (w) => `/api/templates/link/${w.unlistedToken}`, expect: all(200), note: 'the link is the key' },

  // Classes: the teacher and admins manage; enrolled students read
  { route: 'GET /api/classes', path: () => '/api/classes', expect: signedIn(200) },
  { route: 'POST /api/classes', path: () => '/api/classes', body: {}, expect: s(401, 404, 400, 400, 404, 400) },
  { route: 'POST /api/classes/join', path: () => '/api/classes/join', body: {}, expect: signedIn(400) },
  { route: 'GET /api/classes/[id]', path: (w) => `/api/classes/${w.classId}`, expect: s(401, 200, 200, 200, 404, 404) },
  { route: 'PATCH /api/classes/[id]', path: (w) => `/api/classes/${w.classId}`, body: {}, expect: s(401, 404, 200, 200, 404, 404) },
  { route: 'DELETE /api/classes/[id]', path: (w) => `/api/classes/${w.classId}`, send: fresh((w) => w.fresh.classId(), (w) => w.classId, (_, id) => `/api/classes/${id}`), expect: s(401, 404, 204, 204, 404, 404) },
  { route: 'GET /api/classes/[id]/lessons', path: (w) => `/api/classes/${w.classId}/lessons`, expect: s(401, 200, 200, 200, 404, 404) },
  { route: 'POST /api/classes/[id]/lessons', path: (w) => `/api/classes/${w.classId}/lessons`, body: {}, expect: s(401, 404, 400, 400, 404, 404) },
  { route: 'POST /api/classes/[id]/join-code', path: (w) => `/api/classes/${w.classId}/join-code`, expect: s(401, 404, 200, 200, 404, 404) },
  { route: 'GET /api/classes/[id]/invitations', path: (w) => `/api/classes/${w.classId}/invitations`, expect: s(401, 404, 200, 200, 404, 404) },
  { route: 'POST /api/classes/[id]/invitations', path: (w) => `/api/classes/${w.classId}/invitations`, body: {}, expect: s(401, 404, 400, 400, 404, 404) },
  {
    route: 'DELETE /api/classes/[id]/invitations/[invitationId]',
    path: (w) => `/api/classes/${w.classId}/invitations/00000000-0000-4000-8000-000000000000`,
    send: async (w, a) => w.client(a).delete(`/api/classes/${w.classId}/invitations/${await w.fresh.invitationId()}`),
    expect: s(401, 404, 204, 204, 404, 404),
  },
  { route: 'GET /api/classes/[id]/roster', path: (w) => `/api/classes/${w.classId}/roster`, expect: s(401, 404, 200, 200, 404, 404) },
  { route: 'GET /api/classes/[id]/roster.csv', path: (w) => `/api/classes/${w.classId}/roster.csv`, expect: s(401, 404, 200, 200, 404, 404) },
  { route: 'GET /api/classes/[id]/photos', path: (w) => `/api/classes/${w.classId}/photos`, expect: s(401, 200, 200, 200, 404, 404) },
  { route: 'GET /api/invitations/[token]', path: (w) => `/api/invitations/${w.invitationToken}`, expect: all(200), note: 'the signed link is the key' },
  { route: 'POST /api/invitations/[token]/sign-up', path: (w) => `/api/invitations/${w.invitationToken}/sign-up`, body: {}, expect: all(400), note: 'only the invited address may sign up through it' },
  { route: 'POST /api/invitations/[token]/accept', path: () => '/api/invitations/not.a.token/accept', expect: signedIn(400), note: 'accepting a real link: tests/api/teaching.flows.test.ts' },

  // Payments: the class's teacher and admins see and refund its payments; everyone sees only their own receipts
  { route: 'GET /api/payments', path: () => '/api/payments', expect: s(401, 404, 200, 200, 404, 200), note: 'another teacher gets 200 with only their own classes’ payments (tests/api/payments.access.test.ts)' },
  { route: 'GET /api/payments/receipts', path: () => '/api/payments/receipts', expect: signedIn(200) },
  { route: 'POST /api/payments/[id]/refund', path: (w) => `/api/payments/${w.paymentId}/refund`, expect: s(401, 404, 409, 409, 404, 404), note: 'an expired checkout: the teacher and admins reach the 409, nothing is refunded' },
  { route: 'POST /api/payments/webhook', path: () => '/api/payments/webhook', body: {}, expect: all(400), note: 'no signature: the payments service’s signature is the only key (tests/api/payments.webhook.test.ts)' },

  // Lessons, progress, photos
  { route: 'GET /api/lessons/[id]', path: (w) => `/api/lessons/${w.lessonId}`, expect: s(401, 200, 200, 200, 404, 404) },
  { route: 'GET /api/lessons/[id]/plan.pdf', path: (w) => `/api/lessons/${w.lessonId}/plan.pdf`, expect: s(401, 200, 200, 200, 404, 404), note: 'the printed plan: whoever may read the lesson' },
  { route: 'PATCH /api/lessons/[id]', path: (w) => `/api/lessons/${w.lessonId}`, body: {}, expect: s(401, 404, 200, 200, 404, 404) },
  { route: 'DELETE /api/lessons/[id]', path: (w) => `/api/lessons/${w.lessonId}`, send: fresh((w) => w.fresh.lessonId(), (w) => w.lessonId, (_, id) => `/api/lessons/${id}`), expect: s(401, 404, 204, 204, 404, 404) },
  { route: 'GET /api/lessons/[id]/progress', path: (w) => `/api/lessons/${w.lessonId}/progress`, expect: s(401, 200, 404, 404, 404, 404), note: 'only students have progress' },
  { route: 'PUT /api/lessons/[id]/progress', path: (w) => `/api/lessons/${w.lessonId}/progress`, body: { stepIndex: 0, totalSteps: 3 }, expect: s(401, 200, 404, 404, 404, 404) },
  { route: 'GET /api/lessons/[id]/photos', path: (w) => `/api/lessons/${w.lessonId}/photos`, expect: s(401, 200, 200, 200, 404, 404) },
  {
    route: 'POST /api/lessons/[id]/photos',
    path: (w) => `/api/lessons/${w.lessonId}/photos?side=back`,
    send: (w, a) => sendBytes(a === 'anonymous' ? null : w.client(a), `/api/lessons/${w.lessonId}/photos?side=back`, w.png, 'image/png'),
    expect: s(401, 201, 404, 404, 404, 404),
    note: 'only an enrolled student uploads',
  },
  { route: 'POST /api/lessons/release-sweep', path: () => '/api/lessons/release-sweep', expect: s(401, 404, 404, 200, 404, 404) },
  { route: 'GET /api/photos/[id]', path: (w) => `/api/photos/${w.photoId}`, expect: s(401, 200, 200, 200, 404, 404) },
  { route: 'DELETE /api/photos/[id]', path: (w) => `/api/photos/${w.photoId}`, send: fresh((w) => w.fresh.photoId(), (w) => w.photoId, (_, id) => `/api/photos/${id}`), expect: s(401, 204, 204, 204, 404, 404) },

  // Pages
  { route: 'GET /', path: () => '/', expect: all(200) },
  { route: 'GET /sign-in', path: () => '/sign-in', expect: s(200, 302, 302, 302, 302, 302), note: 'signed in: on to the dashboard' },
  { route: 'GET /sign-up', path: () => '/sign-up', expect: s(200, 302, 302, 302, 302, 302) },
  { route: 'GET /sign-up/confirm', path: () => '/sign-up/confirm', expect: s(200, 302, 302, 302, 302, 302) },
  { route: 'GET /forgot-password', path: () => '/forgot-password', expect: all(200) },
  { route: 'GET /reset-password', path: () => '/reset-password', expect: all(200) },
  { route: 'GET /dashboard', path: () => '/dashboard', expect: page(200) },
  { route: 'GET /account', path: () => '/account', expect: page(200) },
  { route: 'GET /admin/accounts', path: () => '/admin/accounts', expect: s(302, 404, 404, 200, 404, 404) },
  { route: 'GET /designs', path: () => '/designs', expect: page(200) },
  { route: 'GET /quilts', path: () => '/quilts', expect: page(200) },
  { route: 'GET /quilts/[id]', path: (w) => `/quilts/${w.quiltId}`, expect: s(302, 200, 404, 404, 404, 404), note: 'the quilt map opens only on the owner’s quilt' },
  { route: 'GET /designs/new', path: () => '/designs/new', expect: page(200) },
  { route: 'GET /designs/[id]', path: (w) => `/designs/${w.designId}`, expect: s(302, 200, 404, 404, 404, 404), note: 'the workbench opens only on the owner’s design' },
  { route: 'GET /templates', path: () => '/templates', expect: all(200) },
  { route: 'GET /templates/[id]', path: (w) => `/templates/${w.classTemplateId}`, expect: s(404, 200, 200, 200, 404, 404) },
  { route: 'GET /templates/link/[token]', path: (w) => `/templates/link/${w.unlistedToken}`, expect: all(200) },
  { route: 'GET /walkthrough/[templateId]', path: (w) => `/walkthrough/${w.classTemplateId}`, expect: s(404, 200, 200, 200, 404, 404) },
  { route: 'GET /classes', path: () => '/classes', expect: page(200) },
  { route: 'GET /payments', path: () => '/payments', expect: page(200) },
  { route: 'GET /payments/return', path: () => '/payments/return?session_id=cs_test_unknown', expect: page(200), note: 'only the visitor’s own checkout is found' },
  { route: 'GET /classes/new', path: () => '/classes/new', expect: s(302, 404, 200, 200, 404, 200) },
  { route: 'GET /classes/[id]', path: (w) => `/classes/${w.classId}`, expect: s(302, 200, 200, 200, 404, 404) },
  { route: 'GET /classes/[id]/lessons/[lessonId]', path: (w) => `/classes/${w.classId}/lessons/${w.lessonId}`, expect: s(302, 200, 200, 200, 404, 404) },
  { route: 'GET /invitations/[token]', path: (w) => `/invitations/${w.invitationToken}`, expect: all(200) },
  { route: 'GET /dev/mail', path: () => '/dev/mail', expect: s(302, 404, 404, 200, 404, 404), note: 'DEV_TOOLS is on under npm test; off, the page does not exist (tests/api/devToolsOff.test.ts)' },
];

/** Routes deliberately outside the matrix, each with where it is checked instead. */
export const matrixExemptions: Record<string, string> = {};
