// The accounts and things the security suite asks about, built through the real API. Six visitors:
//   anonymous;
//   quilter       — owns a design (with a saved route and versions) and a photo; a student of the class;
//   teacher       — owns the class (released lesson), a class-only template, a public and an unlisted one;
//   admin;
//   otherQuilter  — another owner: has a design of their own, is in no class;
//   otherTeacher  — another owner: teaches a class of their own.
// `fresh` makes a new thing for calls that use it up (DELETE, revoke), so the shared ones stay as they are.
import sharp from 'sharp';
import { randomUUID } from 'node:crypto';
import { createAccount, type TestAccount } from '../../helpers/accounts.ts';
import { TestClient, type ApiResponse } from '../../helpers/client.ts';
import { linksIn, waitForMail } from '../../helpers/mail.ts';
import { block } from '../designFixtures.ts';
import { testDb } from '../../helpers/db.ts';
import { daysAhead, sendBytes } from '../teachingWorld.ts';

export type Actor = 'anonymous' | 'quilter' | 'teacher' | 'admin' | 'otherQuilter' | 'otherTeacher';
export const ACTORS: readonly Actor[] = ['anonymous', 'quilter', 'teacher', 'admin', 'otherQuilter', 'otherTeacher'];
export type SignedInActor = Exclude<Actor, 'anonymous'>;

/** Words that must never appear in a refusal (401/404): the titles of the world's things. */
export const SECRET_WORDS = ['Kestrel Tuesday circle', 'Kestrel lesson one', 'Kestrel class block', 'Kestrel private design', 'Kestrel rival class'];

export interface SecurityWorld {
  accounts: Record<SignedInActor, TestAccount>;
  client(a: Actor): TestClient;
  classId: string;
  joinCode: string;
  otherClassId: string;
  lessonId: string;
  classTemplateId: string;
  classVersionId: string;
  publicTemplateId: string;
  unlistedToken: string;
  designId: string;
  otherDesignId: string;
  /** The quilter's quilt (one block: designId), version 1. */
  quiltId: string;
  photoId: string;
  invitationToken: string;
  /** An expired (never paid) checkout by the quilter for the teacher's class: refund attempts reach only 409. */
  paymentId: string;
  png: Uint8Array;
  fresh: {
    design(owner?: TestAccount): Promise<string>;
    quiltId(): Promise<string>;
    classId(): Promise<string>;
    lessonId(): Promise<string>;
    invitationId(): Promise<string>;
    photoId(): Promise<string>;
  };
}

export async function expectOk<T = any>(p: Promise<ApiResponse<T>>, status: number): Promise<T> {
  const res = await p;
  if (res.status !== status) throw new Error(`tests/api/security/securityWorld: expected ${status}, got ${res.status}: ${res.text.slice(0, 300)}`);
  return res.body;
}

async function designWithRoute(owner: TestAccount, title: string): Promise<string> {
  const d = await expectOk(owner.client.post('/api/designs', { title, design: block() }), 201);
  await expectOk(owner.client.put(`/api/designs/${d.design.id}/route`, { kind: 'planned', designVersion: 1 }), 200);
  return d.design.id as string;
}

export async function buildSecurityWorld(): Promise<SecurityWorld> {
  const [quilter, teacher, admin, otherQuilter, otherTeacher] = await Promise.all([
    createAccount({ displayName: 'Mira Featherstitch' }),
    createAccount({ role: 'teacher', displayName: 'Colm Batting' }),
    createAccount({ role: 'admin', displayName: 'Guild Keeper' }),
    createAccount({ displayName: 'Nell Outsider' }),
    createAccount({ role: 'teacher', displayName: 'Rhys Rival' }),
  ]);
  const anonymous = new TestClient();
  const accounts = { quilter, teacher, admin, otherQuilter, otherTeacher };
  const client = (a: Actor) => (a === 'anonymous' ? anonymous : accounts[a].client);

  const teacherDesign = await designWithRoute(teacher, 'Kestrel class block source');
  const publish = (visibility: string, title: string) =>
    expectOk(teacher.client.post('/api/templates', { designId: teacherDesign, title, difficulty: 'beginner', visibility }), 201);
  const classTemplate = await publish('class', 'Kestrel class block');
  const publicTemplate = await publish('public', 'Kestrel open block');
  const unlisted = await publish('unlisted', 'Kestrel link block');

  const cls = await expectOk(teacher.client.post('/api/classes', { title: 'Kestrel Tuesday circle', startsOn: daysAhead(87) }), 201);
  const otherClass = (await expectOk(otherTeacher.client.post('/api/classes', { title: 'Kestrel rival class', startsOn: daysAhead(88) }), 201)).class;
  const lesson = await expectOk(
    teacher.client.post(`/api/classes/${cls.class.id}/lessons`, { title: 'Kestrel lesson one', releaseAt: new Date(Date.now() - 3_600_000).toISOString(), templateVersionId: classTemplate.version.id, confirmed: true }),
    201,
  );
  await expectOk(quilter.client.post('/api/classes/join', { code: cls.class.joinCode }), 200);

  const designId = await designWithRoute(quilter, 'Kestrel private design');
  await expectOk(quilter.client.put(`/api/designs/${designId}`, { baseVersion: 1, notes: 'second version' }), 200);
  const otherDesignId = await designWithRoute(otherQuilter, 'Kestrel neighbour design');
  const newQuilt = async () =>
    (await expectOk(quilter.client.post('/api/quilts', { title: 'Kestrel quilt', quilt: { version: 1, units: 'in', rows: 1, columns: 1, block: { width: 12, height: 12 }, placements: [[{ designId }]] } }), 201)).quilt.id as string;
  const quiltId = await newQuilt();

  const png = new Uint8Array(await sharp({ create: { width: 48, height: 32, channels: 3, background: '#5d7a8c' } }).png().toBuffer());
  const uploadPhoto = async () => {
    const up = await sendBytes(quilter.client, `/api/lessons/${lesson.lesson.id}/photos?side=front`, png, 'image/png');
    if (up.status !== 201) throw new Error(`tests/api/security/securityWorld: photo upload failed: ${up.text}`);
    return up.body.photo.id as string;
  };
  const photoId = await uploadPhoto();

  const invitee = `kestrel-invitee-${randomUUID()}@guild.test`;
  await expectOk(teacher.client.post(`/api/classes/${cls.class.id}/invitations`, { emails: [invitee] }), 201);
  const link = linksIn((await waitForMail(invitee, { subject: 'invites you' })).text).find((l) => l.includes('/invitations/'))!;
  const invitationToken = new URL(link).pathname.split('/').pop()!;

  // Written straight to the table: the security suite needs a payment row, not a checkout (payments.webhook.test.ts).
  const payment = await testDb()
    .insertInto('class_payment')
    .values({ class_id: cls.class.id, teacher_id: teacher.id, class_title: 'Kestrel Tuesday circle', student_id: quilter.id, amount: 1500, currency: 'GBP', state: 'expired', locale: 'en-GB' })
    .returning('id')
    .executeTakeFirstOrThrow();

  return {
    accounts,
    client,
    paymentId: payment.id,
    classId: cls.class.id,
    joinCode: cls.class.joinCode,
    otherClassId: otherClass.id,
    lessonId: lesson.lesson.id,
    classTemplateId: classTemplate.template.id,
    classVersionId: classTemplate.version.id,
    publicTemplateId: publicTemplate.template.id,
    unlistedToken: (unlisted.linkPath as string).split('/').pop()!,
    designId,
    otherDesignId,
    quiltId,
    photoId,
    invitationToken,
    png,
    fresh: {
      design: async (owner = quilter) => (await expectOk(owner.client.post('/api/designs', { title: 'Fresh design', design: block() }), 201)).design.id,
      quiltId: newQuilt,
      classId: async () => (await expectOk(teacher.client.post('/api/classes', { title: 'Fresh class', startsOn: daysAhead(117) }), 201)).class.id,
      lessonId: async () =>
        (await expectOk(teacher.client.post(`/api/classes/${cls.class.id}/lessons`, { title: 'Fresh lesson', releaseAt: new Date(Date.now() + 86_400_000).toISOString(), templateVersionId: classTemplate.version.id, confirmed: true }), 201))
          .lesson.id,
      invitationId: async () => {
        const sent = await expectOk(teacher.client.post(`/api/classes/${cls.class.id}/invitations`, { emails: [`fresh-${randomUUID()}@guild.test`] }), 201);
        return sent.invitations[0].id;
      },
      photoId: uploadPhoto,
    },
  };
}
