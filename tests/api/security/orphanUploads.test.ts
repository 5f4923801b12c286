// Issue 10, defect 14 (orphan objects): an upload writes its objects before its lesson_photo row, so a crash in
// between leaves objects no row names. The sweep (at start, hourly, or POST /api/admin/storage-sweep) removes
// such objects once they are 15 minutes old, and never touches a kept photo or an upload still in progress.
// The crash is reproduced by what it leaves behind: the two objects of an upload, written through the S3 API
// exactly as the app writes them, with no row; their age is set on the S3 fake's files (mtime = LastModified).
import { randomUUID } from 'node:crypto';
import { utimesSync } from 'node:fs';
import path from 'node:path';
import { ListObjectsV2Command, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TestClient } from '../../helpers/client.ts';
import { closeTestDb } from '../../helpers/db.ts';
import { buildWorld, sendBytes, type World } from '../teachingWorld.ts';

const bucket = process.env['S3_BUCKET'] ?? 'uploads';
const s3 = new S3Client({
  endpoint: process.env['S3_ENDPOINT']!,
  region: process.env['S3_REGION'] ?? 'us-east-1',
  forcePathStyle: true,
  credentials: { accessKeyId: process.env['S3_ACCESS_KEY']!, secretAccessKey: process.env['S3_SECRET_KEY']! },
});

let w: World;
let jpeg: Uint8Array;
beforeAll(async () => {
  w = await buildWorld();
  jpeg = new Uint8Array(await sharp({ create: { width: 64, height: 48, channels: 3, background: '#8a6d1f' } }).jpeg().toBuffer());
});
afterAll(closeTestDb);

async function putUploadObjects(id: string, minutesAgo: number): Promise<string[]> {
  const keys = [`photos/${id}/full.jpg`, `photos/${id}/thumb.jpg`];
  for (const key of keys) {
    await s3.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: jpeg, ContentType: 'image/jpeg' }));
    const when = new Date(Date.now() - minutesAgo * 60_000);
    const dir = process.env['S3_FAKE_DIR'];
    if (!dir) throw new Error('S3_FAKE_DIR is not set; run through npm test');
    utimesSync(path.join(dir, bucket, `${key}._S3rver_object`), when, when);
  }
  return keys;
}

async function photoKeys(): Promise<Set<string>> {
  const out = await s3.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: 'photos/' }));
  return new Set((out.Contents ?? []).map((o) => o.Key!));
}

describe('orphaned upload objects', () => {
  it('are removed by the sweep once old enough; kept photos and uploads in progress stay', async () => {
    const kept = await sendBytes(w.student.client, `/api/lessons/${w.releasedLessonId}/photos?side=front`, jpeg, 'image/jpeg');
    expect(kept.status, kept.text).toBe(201);
    const crashed = await putUploadObjects(randomUUID(), 60);
    const inProgress = await putUploadObjects(randomUUID(), 1);
    const before = await photoKeys();
    for (const k of [...crashed, ...inProgress]) expect(before.has(k)).toBe(true);

    const swept = await w.admin.client.post('/api/admin/storage-sweep');
    expect(swept.status, swept.text).toBe(200);
    expect(swept.body.removed).toBeGreaterThanOrEqual(2);
    expect(swept.body.failed).toBe(0);

    const after = await photoKeys();
    for (const k of crashed) expect(after.has(k), k).toBe(false);
    for (const k of inProgress) expect(after.has(k), k).toBe(true);
    const photo = await w.student.client.get(kept.body.photo.url);
    expect(photo.status).toBe(200);
    expect((await w.student.client.get(kept.body.photo.thumbUrl)).status).toBe(200);
  });

  it('the sweep endpoint is for admins only', async () => {
    expect((await new TestClient().post('/api/admin/storage-sweep')).status).toBe(401);
    for (const who of [w.student, w.teacher]) expect((await who.client.post('/api/admin/storage-sweep')).status).toBe(404);
  });
});
