// Issue 10, defect 11: the cap on wrong join codes (20 an hour per account) and the 12-photo cap per student and
// lesson hold when the requests arrive all at once.
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount } from '../helpers/accounts.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { buildWorld, sendBytes, type World } from './teachingWorld.ts';

let w: World;
beforeAll(async () => {
  w = await buildWorld();
});
afterAll(closeTestDb);

describe('caps under parallel requests', () => {
  it('checks at most 20 of 40 simultaneous wrong join codes; the rest get 429', async () => {
    const guesser = await createAccount();
    // Codes use an alphabet without 0/O/1/I/L (joinCode.ts), so these can never be real.
    const burst = await Promise.all(Array.from({ length: 40 }, (_, i) => guesser.client.post('/api/classes/join', { code: `ZZZZ${String(i).padStart(4, '0')}` })));
    const wrong = burst.filter((r) => r.status === 400).length;
    const limited = burst.filter((r) => r.status === 429).length;
    expect(wrong + limited).toBe(40);
    expect(wrong).toBeLessThanOrEqual(20);
    expect(limited).toBeGreaterThanOrEqual(20);
  });

  it('a right join code is not counted against the cap', async () => {
    const student = await createAccount();
    for (let i = 0; i < 25; i += 1) expect((await student.client.post('/api/classes/join', { code: w.joinCode })).status).toBe(200);
    const row = await testDb().selectFrom('rate_limit').select('hits').where('key', '=', `join-code:${student.id}`).executeTakeFirst();
    expect(row?.hits ?? 0).toBe(0);
  });

  it('stores at most 12 photos per student and lesson when 16 arrive at once', async () => {
    const jpeg = async (i: number) =>
      new Uint8Array(await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 200, g: 180 + (i % 50), b: 150 } } }).jpeg().toBuffer());
    const photos = await Promise.all(Array.from({ length: 16 }, (_, i) => jpeg(i)));
    const url = `/api/lessons/${w.releasedLessonId}/photos?side=front`;
    const burst = await Promise.all(photos.map((p) => sendBytes(w.student.client, url, p, 'image/jpeg')));
    const stored = await testDb().selectFrom('lesson_photo').select('id').where('lesson_id', '=', w.releasedLessonId).where('student_id', '=', w.student.id).execute();
    expect(stored.length).toBe(12);
    expect(burst.filter((r) => r.status === 201)).toHaveLength(12);
    const refused = burst.filter((r) => r.status !== 201);
    expect(refused.map((r) => r.status)).toEqual([409, 409, 409, 409]);
    expect(refused[0]!.body.error.message).toMatch(/12 photos/);
  });
});
