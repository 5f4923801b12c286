// A small teaching world for the API tests: two teachers with a class each, a student in each class, an admin,
// a teacher's design with a saved route (written straight into the workbench tables, as a save would leave it),
// a class-only template from it, a released and a future lesson, and helpers to send raw bytes.
import type { SavedRouteSummary } from '@shared/contract/figures.ts';
import type { StrokePath } from '@shared/contract/strokes.ts';
import { threadSummaryOf } from '@shared/route/routeAnswers.ts';
import { computeThreadBudget } from '@shared/route/threadBudget.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import type { TestClient } from '../helpers/client.ts';
import { testDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';


/** A 12 in block with one seam and one straight quilting line at height `lineY`, plus its saved route: one pass
 *  stitching the line, length exactly 12 in (analytic), passes 1, stops 0 (stops = passes − 1, glossary). */
export async function insertDesignWithRoute(owner: TestAccount, lineY: number): Promise<string> {
  const design = { version: 1, units: 'in', width: 12, height: 12, seams: [[[6, 0], [6, 12]]], lines: [[[0, lineY], [12, lineY]]], edgeTravel: true };
  const db = testDb();
  const row = await db
    .insertInto('design')
    .values({ owner_id: owner.id, title: `Block at y=${lineY}`, data: JSON.stringify(design), thumbnail_svg: '<svg xmlns="http://www.w3.org/2000/svg"/>', summary: null })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db.insertInto('design_version').values({ design_id: row.id, version: 1, title: `Block at y=${lineY}`, notes: '', data: JSON.stringify(design) }).execute();
  await saveRoute(row.id, 1, lineY);
  return row.id;
}

export async function saveRoute(designId: string, designVersion: number, lineY: number): Promise<void> {
  // The route contract's shapes (shared/contract), as savePlannedRoute writes them: passes count from 1.
  const strokes: StrokePath[] = [{ pass: 1, kind: 'stitch', points: [[0, lineY], [12, lineY]], length: 12 }];
  const summary: SavedRouteSummary = {
    passes: 1, stops: 0, pieces: 1, oddPoints: 2, stitchLength: 12, retraceLength: 0, ditchLength: 0, edgeLength: 0, travelLength: 0,
    travelLowerBound: 0, optimal: true, units: 'in', thread: threadSummaryOf(computeThreadBudget(12, 1, 'in')),
  };
  await testDb()
    .insertInto('design_route')
    .values({ design_id: designId, kind: 'planned', strokes: JSON.stringify(strokes), summary: JSON.stringify(summary), design_version: designVersion })
    .onConflict((oc) => oc.column('design_id').doUpdateSet({ strokes: JSON.stringify(strokes), summary: JSON.stringify(summary), design_version: designVersion }))
    .execute();
}

export const DAY = 24 * 60 * 60 * 1000;
export const iso = (offsetMs: number) => new Date(Date.now() + offsetMs).toISOString();
/** A class start date `days` from today ("YYYY-MM-DD"): fixed dates would turn into past dates, which the API asks
 *  about (409) and, a year on, refuses (src/server/classes/teachingDates.ts). */
export const daysAhead = (days: number) => iso(days * DAY).slice(0, 10);

export interface World {
  teacher: TestAccount;
  otherTeacher: TestAccount;
  student: TestAccount;
  otherStudent: TestAccount;
  admin: TestAccount;
  classId: string;
  otherClassId: string;
  joinCode: string;
  templateId: string;
  versionId: string;
  releasedLessonId: string;
  futureLessonId: string;
}

export async function buildWorld(): Promise<World> {
  const [teacher, otherTeacher, student, otherStudent, admin] = await Promise.all([
    createAccount({ role: 'teacher', displayName: 'Wren Halloway' }),
    createAccount({ role: 'teacher', displayName: 'Odile Marsh' }),
    createAccount({ displayName: 'Pim Arkwright' }),
    createAccount({ displayName: 'Juno Fairweather' }),
    createAccount({ role: 'admin', displayName: 'Guild Admin' }),
  ]);
  const designId = await insertDesignWithRoute(teacher, 3);
  const published = await expectStatus(
    teacher.client.post('/api/templates', { designId, title: 'Heron ribbon block', description: 'One line across', difficulty: 'beginner', motifs: ['straight lines'], visibility: 'class' }),
    201,
  );
  const cls = await expectStatus(teacher.client.post('/api/classes', { title: 'Tuesday quilt-along', description: 'Monthly blocks', startsOn: daysAhead(31) }), 201);
  const other = await expectStatus(otherTeacher.client.post('/api/classes', { title: 'Secret winter class', startsOn: daysAhead(58) }), 201);
  // confirmed: the released lesson is in the past and both open before the class's start date (teachingDates.ts).
  const lesson = (title: string, at: string) => ({ title, releaseAt: at, notes: '**Start** at the *left* edge.', templateVersionId: published.version.id, confirmed: true });
  const released = await expectStatus(teacher.client.post(`/api/classes/${cls.class.id}/lessons`, lesson('Lesson 1: the first line', iso(-DAY))), 201);
  const future = await expectStatus(teacher.client.post(`/api/classes/${cls.class.id}/lessons`, lesson('Lesson 2: not yet', iso(30 * DAY))), 201);
  await expectStatus(student.client.post('/api/classes/join', { code: cls.class.joinCode }), 200);
  await expectStatus(otherStudent.client.post('/api/classes/join', { code: other.class.joinCode }), 200);
  return {
    teacher,
    otherTeacher,
    student,
    otherStudent,
    admin,
    classId: cls.class.id,
    otherClassId: other.class.id,
    joinCode: cls.class.joinCode,
    templateId: published.template.id,
    versionId: published.version.id,
    releasedLessonId: released.lesson.id,
    futureLessonId: future.lesson.id,
  };
}

export async function expectStatus(p: Promise<{ status: number; body: any; text: string }>, status: number): Promise<any> {
  const res = await p;
  if (res.status !== status) throw new Error(`expected ${status}, got ${res.status}: ${res.text}`);
  return res.body;
}

/** Sends raw bytes (e.g. an upload) as the client, with its cookies and the app's Origin. */
export async function sendBytes(client: TestClient | null, path: string, bytes: Uint8Array, contentType = 'application/octet-stream') {
  const headers = new Headers({ 'content-type': contentType, origin: new URL(testEnv.appUrl).origin });
  if (client?.cookies.size) headers.set('cookie', [...client.cookies].map(([k, v]) => `${k}=${v}`).join('; '));
  const res = await fetch(new URL(path, testEnv.appUrl), { method: 'POST', headers, body: bytes as Uint8Array<ArrayBuffer> });
  const text = await res.text();
  return { status: res.status, body: res.headers.get('content-type')?.includes('json') ? JSON.parse(text) : null, text };
}
