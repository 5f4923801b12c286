// Malformed requests for every endpoint that reads a JSON body, query or path parameters. Each case is sent by a
// visitor who may use the endpoint, with everything right except the one thing that is wrong, and must be answered
// 4xx, naming the field when there is one (never 500, never 2xx). Kinds of wrong: wrong types, huge and fractional
// numbers, numbers past PostgreSQL's integer range, dates that do not exist, malformed and unknown ids, broken JSON,
// a wrong content type, bodies over the cap, bytes that are not UTF-8, NUL and lone surrogates, unknown fields.
import { randomUUID } from 'node:crypto';
import type { TestAccount } from '../../helpers/accounts.ts';
import { uniqueEmail } from '../../helpers/accounts.ts';
import { block } from '../designFixtures.ts';
import type { Actor, SecurityWorld } from './securityWorld.ts';

export interface Case {
  label: string;
  actor: Actor | ((w: SecurityWorld) => TestAccount);
  method: string;
  path: string;
  /** Raw bytes (sent as they are) or a string (sent as is); the content type defaults to application/json. */
  body?: Uint8Array | string;
  contentType?: string | null;
  /** The field the answer must name (a key of error.fields, or a prefix "design" of "design.lines.0"). */
  field?: string;
  /** An exact status when it is not just "some 4xx". */
  status?: number;
}

type FieldKind =
  | { kind: 'title'; max: number }
  | { kind: 'text'; max: number }
  | { kind: 'email' }
  | { kind: 'name' }
  | { kind: 'password' }
  | { kind: 'newPassword' }
  | { kind: 'enum' }
  | { kind: 'uuid'; unknownNamed?: boolean }
  | { kind: 'int'; min: number; max: number; nullable?: boolean }
  | { kind: 'date' }
  | { kind: 'datetime' }
  | { kind: 'bool' }
  | { kind: 'currency' }
  | { kind: 'emails' }
  | { kind: 'motifs' }
  | { kind: 'design' }
  | { kind: 'route' }
  | { kind: 'discriminator' }
  | { kind: 'code' }
  | { kind: 'resetToken' };

const WRONG_TYPES: unknown[] = [42, true, [], {}];
const NUL = 'a\u0000b';
const LONE_SURROGATE = 'half \uD800 pair';

/** Values each kind must refuse (never a valid value of that kind). */
function badValues(f: FieldKind): unknown[] {
  switch (f.kind) {
    case 'title':
      return [...WRONG_TYPES, null, '', '   ', 'x'.repeat(f.max + 1), NUL, LONE_SURROGATE];
    case 'text':
      return [...WRONG_TYPES, null, 'x'.repeat(f.max + 1), NUL, LONE_SURROGATE];
    case 'email':
      return [...WRONG_TYPES, null, '', 'not-an-email', 'a@', '@guild.test', `${'x'.repeat(250)}@guild.test`, 'ann\u0000@guild.test', "' OR '1'='1"];
    case 'name':
      return [...WRONG_TYPES, null, '', 'x'.repeat(200), NUL, 'Ann\u202Edrawkcab', LONE_SURROGATE];
    case 'password':
      return [...WRONG_TYPES, null, '', 'x'.repeat(300), LONE_SURROGATE];
    case 'newPassword':
      return [...WRONG_TYPES, null, 'short', 'x'.repeat(300), LONE_SURROGATE];
    case 'enum':
      return [...WRONG_TYPES, null, '', 'IN', 'nope', 'in\u0000', 'ｉｎ'];
    case 'uuid':
      return [...WRONG_TYPES, null, '', 'not-a-uuid', "' OR '1'='1", 'x'.repeat(100), '00000000-0000-0000-0000-00000000000g', ...(f.unknownNamed ? [randomUUID()] : [])];
    case 'int':
      return ['1', 1.5, f.min - 1, f.max + 1, 2 ** 31, 1e308, 2 ** 53 + 2, true, [], {}, ...(f.nullable ? [] : [null])];
    case 'date':
      return ['2027-02-30', '2027-02-29', '2027-13-01', '2027-04-31', '2027-1-5', '27-01-05', '', 'tomorrow', 20270105, null, '2027-01-05T00:00:00Z', '0000-01-01'];
    case 'datetime':
      return ['2027-02-30T09:00:00Z', '2027-01-05T25:00:00Z', '2027-01-05', '2027-01-05T09:00:00', 'tomorrow', 1767600000000, null, '0000-01-01T00:00:00Z', ''];
    case 'bool':
      return ['true', 1, null, []];
    case 'currency':
      return ['usd', 'US', 'USDD', 42, '', 'U\u0000D'];
    case 'emails':
      return ['a@guild.test', [], [42], ['not-an-email'], Array.from({ length: 51 }, (_, i) => `many-${i}@guild.test`), null, [NUL]];
    case 'motifs':
      return ['ribbon candy', [42], ['<b>bold</b>'], ['x'.repeat(41)], Array.from({ length: 13 }, (_, i) => `motif ${i}`), null, ['a\u0000']];
    case 'design':
      return [
        42,
        'design',
        [],
        null,
        {},
        block({ width: -1 }),
        block({ width: 1e308 }),
        block({ units: 'mm' }),
        block({ lines: [[[0, 0]]] }),
        block({ lines: [[[0, 0], [9000, 0]]] }),
        block({ lines: 'lines' }),
        block({ seams: [[[0, 0], ['a', 1]]] }),
        block({ extra: true }),
      ];
    case 'route':
      return [42, 'route', [], null, [[[0, 0]]], [[[0, 3], [9000, 3]]], [['x']]];
    case 'discriminator':
      return ['planned2', 42, null, ''];
    case 'code':
      return [...WRONG_TYPES, null, '', 'abc', 'x'.repeat(33)];
    case 'resetToken':
      return [...WRONG_TYPES, null, 'short', 'A'.repeat(32), `${'a'.repeat(31)}!`];
    default:
      return [];
  }
}

interface BodyEndpoint {
  label: string;
  actor: Case['actor'];
  method: string;
  path: (w: SecurityWorld) => string;
  valid: (w: SecurityWorld) => Record<string, unknown>;
  fields: Record<string, FieldKind>;
  /** Fields that may be left out. */
  optional?: string[];
  /** Body cap in bytes (DEFAULT_BODY_LIMIT 64 KiB unless a design endpoint). */
  limit?: number;
  /** Sign-up, sign-in and reset may answer 429 once the address is throttled: still a refusal. */
  throttled?: boolean;
}

const DESIGN_LIMIT = 5 * 1024 * 1024;
const day = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString();

export function bodyEndpoints(victim: () => TestAccount): BodyEndpoint[] {
  return [
    { label: 'sign up', actor: 'anonymous', method: 'POST', path: () => '/api/accounts', valid: () => ({ email: uniqueEmail('malformed'), displayName: 'Valid Name', password: 'valid-password-1', units: 'in' }), fields: { email: { kind: 'email' }, displayName: { kind: 'name' }, password: { kind: 'newPassword' }, units: { kind: 'enum' } }, optional: ['units'], throttled: true },
    { label: 'sign in', actor: 'anonymous', method: 'POST', path: () => '/api/session', valid: () => ({ email: victim().email, password: victim().password }), fields: { email: { kind: 'email' }, password: { kind: 'password' } }, throttled: true },
    { label: 'reset request', actor: 'anonymous', method: 'POST', path: () => '/api/password-resets', valid: () => ({ email: victim().email }), fields: { email: { kind: 'email' } }, throttled: true },
    { label: 'reset confirm', actor: 'anonymous', method: 'POST', path: () => '/api/password-resets/confirm', valid: () => ({ token: 'a'.repeat(32), password: 'valid-password-1' }), fields: { token: { kind: 'resetToken' }, password: { kind: 'newPassword' } }, throttled: true },
    { label: 'profile', actor: () => victim(), method: 'PATCH', path: () => '/api/account', valid: () => ({ displayName: 'Valid Name', units: 'cm' }), fields: { displayName: { kind: 'name' }, units: { kind: 'enum' } }, optional: ['displayName', 'units'] },
    { label: 'password change', actor: () => victim(), method: 'PUT', path: () => '/api/account/password', valid: () => ({ currentPassword: victim().password, newPassword: 'valid-password-2' }), fields: { currentPassword: { kind: 'password' }, newPassword: { kind: 'newPassword' } } },
    { label: 'e-mail change', actor: () => victim(), method: 'PUT', path: () => '/api/account/email', valid: () => ({ currentPassword: victim().password, email: uniqueEmail('moved') }), fields: { currentPassword: { kind: 'password' }, email: { kind: 'email' } } },
    { label: 'role change', actor: 'admin', method: 'PATCH', path: () => `/api/admin/accounts/${victim().id}`, valid: () => ({ role: 'teacher' }), fields: { role: { kind: 'enum' } } },
    {
      label: 'new class',
      actor: 'teacher',
      method: 'POST',
      path: () => '/api/classes',
      valid: () => ({ title: 'Valid class', description: 'Monthly', startsOn: '2027-06-01', priceCents: 1500, currency: 'USD' }),
      fields: { title: { kind: 'title', max: 200 }, description: { kind: 'text', max: 5000 }, startsOn: { kind: 'date' }, priceCents: { kind: 'int', min: 0, max: 10_000_000, nullable: true }, currency: { kind: 'currency' }, confirmed: { kind: 'bool' } },
      optional: ['description', 'priceCents', 'currency', 'confirmed'],
    },
    {
      label: 'class change',
      actor: 'teacher',
      method: 'PATCH',
      path: (w) => `/api/classes/${w.classId}`,
      valid: () => ({ title: 'Kestrel Tuesday circle', startsOn: '2027-03-02' }),
      fields: { title: { kind: 'title', max: 200 }, description: { kind: 'text', max: 5000 }, startsOn: { kind: 'date' }, priceCents: { kind: 'int', min: 0, max: 10_000_000, nullable: true }, currency: { kind: 'currency' }, confirmed: { kind: 'bool' } },
      optional: ['title', 'description', 'startsOn', 'priceCents', 'currency', 'confirmed'],
    },
    { label: 'join', actor: 'otherQuilter', method: 'POST', path: () => '/api/classes/join', valid: () => ({ code: 'ZZZZ-2222' }), fields: { code: { kind: 'code' } } },
    { label: 'invite', actor: 'teacher', method: 'POST', path: (w) => `/api/classes/${w.classId}/invitations`, valid: () => ({ emails: ['valid@guild.test'] }), fields: { emails: { kind: 'emails' } } },
    {
      label: 'new lesson',
      actor: 'teacher',
      method: 'POST',
      path: (w) => `/api/classes/${w.classId}/lessons`,
      valid: (w) => ({ title: 'Valid lesson', releaseAt: day(10), notes: 'Start left', templateVersionId: w.classVersionId, confirmed: true }),
      fields: { title: { kind: 'title', max: 200 }, releaseAt: { kind: 'datetime' }, notes: { kind: 'text', max: 20_000 }, templateVersionId: { kind: 'uuid', unknownNamed: true }, confirmed: { kind: 'bool' } },
      optional: ['notes', 'confirmed'],
    },
    {
      label: 'lesson change',
      actor: 'teacher',
      method: 'PATCH',
      path: (w) => `/api/lessons/${w.lessonId}`,
      valid: (w) => ({ title: 'Kestrel lesson one', templateVersionId: w.classVersionId }),
      fields: { title: { kind: 'title', max: 200 }, releaseAt: { kind: 'datetime' }, notes: { kind: 'text', max: 20_000 }, templateVersionId: { kind: 'uuid', unknownNamed: true }, confirmed: { kind: 'bool' } },
      optional: ['title', 'releaseAt', 'notes', 'templateVersionId', 'confirmed'],
    },
    {
      label: 'progress',
      actor: 'quilter',
      method: 'PUT',
      path: (w) => `/api/lessons/${w.lessonId}/progress`,
      valid: () => ({ stepIndex: 0, totalSteps: 3, finished: false }),
      fields: { stepIndex: { kind: 'int', min: 0, max: 100_000 }, totalSteps: { kind: 'int', min: 0, max: 100_000 }, finished: { kind: 'bool' }, at: { kind: 'datetime' } },
      optional: ['finished', 'at'],
    },
    { label: 'new design', actor: 'quilter', method: 'POST', path: () => '/api/designs', valid: () => ({ title: 'Valid design', notes: '', design: block() }), fields: { title: { kind: 'title', max: 200 }, notes: { kind: 'text', max: 10_000 }, design: { kind: 'design' } }, optional: ['notes'], limit: DESIGN_LIMIT },
    {
      label: 'design save (stale base: an accidental pass would be 409, not 2xx)',
      actor: 'quilter',
      method: 'PUT',
      path: (w) => `/api/designs/${w.designId}`,
      valid: () => ({ baseVersion: 999, title: 'Valid', notes: '', design: block() }),
      fields: { baseVersion: { kind: 'int', min: 1, max: 2 ** 31 - 1 }, title: { kind: 'title', max: 200 }, notes: { kind: 'text', max: 10_000 }, design: { kind: 'design' } },
      optional: ['title', 'notes', 'design'],
      limit: DESIGN_LIMIT,
    },
    { label: 'route check of a draft', actor: 'quilter', method: 'POST', path: (w) => `/api/designs/${w.designId}/check`, valid: () => ({ design: block() }), fields: { design: { kind: 'design' } }, optional: ['design'], limit: DESIGN_LIMIT },
    { label: 'plan of a draft', actor: 'quilter', method: 'POST', path: (w) => `/api/designs/${w.designId}/plan`, valid: () => ({ design: block() }), fields: { design: { kind: 'design' } }, optional: ['design'], limit: DESIGN_LIMIT },
    {
      // The current version (2): strokes are checked against the design only once the version matches.
      label: 'keep an own route',
      actor: 'quilter',
      method: 'PUT',
      path: (w) => `/api/designs/${w.designId}/route`,
      valid: () => ({ kind: 'own', designVersion: 2, route: [[[0, 3], [12, 3]]] }),
      fields: { kind: { kind: 'discriminator' }, designVersion: { kind: 'int', min: 1, max: 2 ** 31 - 1 }, route: { kind: 'route' } },
      limit: DESIGN_LIMIT,
    },
    { label: 'restore a version (stale base)', actor: 'quilter', method: 'POST', path: (w) => `/api/designs/${w.designId}/versions/1/restore`, valid: () => ({ baseVersion: 999 }), fields: { baseVersion: { kind: 'int', min: 1, max: 2 ** 31 - 1 } } },
    {
      label: 'publish a template',
      actor: 'teacher',
      method: 'POST',
      path: () => '/api/templates',
      valid: () => ({ designId: randomUUID(), title: 'Valid template', description: '', difficulty: 'beginner', motifs: ['echo'], visibility: 'public' }),
      fields: { designId: { kind: 'uuid' }, title: { kind: 'title', max: 200 }, description: { kind: 'text', max: 5000 }, difficulty: { kind: 'enum' }, motifs: { kind: 'motifs' }, visibility: { kind: 'enum' } },
      optional: ['description', 'motifs'],
    },
    {
      label: 'new template version',
      actor: 'teacher',
      method: 'PUT',
      path: (w) => `/api/templates/${w.classTemplateId}`,
      valid: () => ({ title: 'Kestrel class block' }),
      fields: { designId: { kind: 'uuid', unknownNamed: true }, title: { kind: 'title', max: 200 }, description: { kind: 'text', max: 5000 }, difficulty: { kind: 'enum' }, motifs: { kind: 'motifs' }, visibility: { kind: 'enum' } },
      optional: ['designId', 'title', 'description', 'difficulty', 'motifs', 'visibility'],
    },
    { label: 'copy a template', actor: 'quilter', method: 'POST', path: (w) => `/api/templates/${w.classTemplateId}/copy`, valid: () => ({ version: 1 }), fields: { version: { kind: 'int', min: 1, max: 2 ** 31 - 1 } }, optional: ['version'] },
  ];
}

const enc = new TextEncoder();

/** Every body case of one endpoint. */
export function bodyCases(e: BodyEndpoint, w: SecurityWorld): Case[] {
  const base = { actor: e.actor, method: e.method, path: e.path(w) };
  const valid = e.valid(w);
  const json = (v: unknown) => JSON.stringify(v);
  const cases: Case[] = [
    { ...base, label: `${e.label}: declared as text/plain`, body: json(valid), contentType: 'text/plain', status: 415 },
    { ...base, label: `${e.label}: declared as a form`, body: 'title=x', contentType: 'application/x-www-form-urlencoded' },
    { ...base, label: `${e.label}: no content type`, body: json(valid), contentType: null, status: 415 },
    { ...base, label: `${e.label}: cut-off JSON`, body: json(valid).slice(0, -3), field: 'body', status: 400 },
    { ...base, label: `${e.label}: single quotes`, body: "{'a': 1}", field: 'body', status: 400 },
    { ...base, label: `${e.label}: empty body`, body: '', field: 'body', status: 400 },
    { ...base, label: `${e.label}: a JSON array`, body: '[1,2,3]', field: 'body', status: 400 },
    { ...base, label: `${e.label}: a JSON string`, body: '"hello"', field: 'body', status: 400 },
    { ...base, label: `${e.label}: JSON null`, body: 'null', field: 'body', status: 400 },
    { ...base, label: `${e.label}: an unknown field`, body: json({ ...valid, isAdmin: true }), field: 'isAdmin', status: 400 },
    { ...base, label: `${e.label}: a __proto__ field`, body: `{"__proto__":{"role":"admin"},${json(valid).slice(1)}`, field: '__proto__', status: 400 },
    { ...base, label: `${e.label}: invalid UTF-8 (0xFF)`, body: new Uint8Array([...enc.encode(json(valid).slice(0, -1)), ...enc.encode(',"x":"'), 0xff, ...enc.encode('"}')]), field: 'body', status: 400 },
    { ...base, label: `${e.label}: invalid UTF-8 (overlong)`, body: new Uint8Array([...enc.encode('{"x":"'), 0xc0, 0xaf, ...enc.encode('"}')]), field: 'body', status: 400 },
    { ...base, label: `${e.label}: over the body cap`, body: json({ ...valid, padding: 'q'.repeat((e.limit ?? 64 * 1024) + 1) }), field: 'body', status: 413 },
    // 20,000 levels: deep enough to break a recursive walker, small enough (40 KB) to pass the 64 KB cap.
    { ...base, label: `${e.label}: 20,000 levels deep`, body: `${'['.repeat(20_000)}${']'.repeat(20_000)}`, field: 'body', status: 400 },
  ];
  for (const [name, kind] of Object.entries(e.fields)) {
    if (!e.optional?.includes(name)) {
      const { [name]: _left, ...rest } = valid;
      cases.push({ ...base, label: `${e.label}: ${name} missing`, body: json(rest), field: name, status: 400 });
    }
    for (const bad of badValues(kind)) {
      cases.push({ ...base, label: `${e.label}: ${name} = ${JSON.stringify(bad)?.slice(0, 50)}`, body: json({ ...valid, [name]: bad }), field: name, status: 400 });
    }
    if (kind.kind === 'design') {
      // Infinity has no JSON spelling, but 1e400 parses to it.
      cases.push({ ...base, label: `${e.label}: ${name} width 1e400`, body: json({ ...valid, [name]: block() }).replace('"width":12', '"width":1e400'), field: name, status: 400 });
    }
  }
  return cases;
}

/** Query strings that must be refused, naming the parameter. */
export function queryCases(w: SecurityWorld): Case[] {
  const q = (actor: Actor, path: string, query: string, field: string): Case => ({ label: `GET ${path}?${query.slice(0, 40)}`, actor, method: 'GET', path: `${path}?${query}`, field, status: 400 });
  const designs: [string, string][] = [
    ['page=abc', 'page'], ['page=0', 'page'], ['page=-1', 'page'], ['page=1.5', 'page'], ['page=99999999999', 'page'], ['page=1e400', 'page'],
    ['pageSize=0', 'pageSize'], ['pageSize=101', 'pageSize'], ['pageSize=abc', 'pageSize'], ['sort=email', 'sort'], ['sort=', 'sort'], ['dir=up', 'dir'],
    ['q=%00', 'q'], [`q=${'x'.repeat(201)}`, 'q'], ['bogus=1', 'bogus'], ["sort=title%27%3B%20DROP%20TABLE%20design%3B--", 'sort'],
  ];
  const gallery: [string, string][] = [
    ['page=abc', 'page'], ['page=0', 'page'], ['page=1001', 'page'], ['page=99999999999', 'page'], ['difficulty=expert', 'difficulty'], ['size=huge', 'size'],
    ['motif=%3Cb%3E', 'motif'], [`motif=${'x'.repeat(41)}`, 'motif'], ['q=%00', 'q'], [`q=${'x'.repeat(101)}`, 'q'],
  ];
  const accounts: [string, string][] = [['page=abc', 'page'], ['pageSize=1000', 'pageSize'], ['q=%00', 'q'], ['sort=email', 'sort'], ['page=99999999999', 'page']];
  return [
    ...designs.map(([query, field]) => q('quilter', '/api/designs', query, field)),
    ...gallery.map(([query, field]) => q('anonymous', '/api/templates', query, field)),
    ...accounts.map(([query, field]) => q('admin', '/api/admin/accounts', query, field)),
    q('teacher', `/api/classes/${w.classId}/photos`, 'lessonId=not-an-id', 'lessonId'),
    q('teacher', `/api/classes/${w.classId}/photos`, 'studentId=1', 'studentId'),
    q('teacher', `/api/classes/${w.classId}/photos`, 'lessonId=%00', 'lessonId'),
    { label: 'photo upload ?side=top', actor: 'quilter', method: 'POST', path: `/api/lessons/${w.lessonId}/photos?side=top`, body: w.png, contentType: 'image/png', field: 'side', status: 400 },
    { label: 'photo upload ?side=%00', actor: 'quilter', method: 'POST', path: `/api/lessons/${w.lessonId}/photos?side=%00`, body: w.png, contentType: 'image/png', field: 'side', status: 400 },
  ];
}

/** Values that cannot name anything, for every path parameter ([id], [version], [token] …). */
export const BAD_PATH_VALUES = ['not-a-uuid', '%00', '99999999999', "'%20OR%20'1'%3D'1", 'x'.repeat(300), '..%2F..%2Fetc%2Fpasswd', '00000000-0000-0000-0000-000000000000', '-1', '1.5', '%F0%9F%A7%B5', '%C0%AF'];
