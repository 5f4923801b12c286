// Photo uploads: refused files leave nothing behind (no row, no object); a good photo is re-encoded without
// its EXIF/GPS block, resized, and thumbnailed.
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { buildWorld, sendBytes, type World } from './teachingWorld.ts';

let w: World;
let url: string;
const s3 = new S3Client({
  endpoint: process.env['S3_ENDPOINT']!,
  region: process.env['S3_REGION'] ?? 'us-east-1',
  forcePathStyle: true,
  credentials: { accessKeyId: process.env['S3_ACCESS_KEY']!, secretAccessKey: process.env['S3_SECRET_KEY']! },
});

beforeAll(async () => {
  w = await buildWorld();
  url = `/api/lessons/${w.releasedLessonId}/photos?side=front`;
});
afterAll(closeTestDb);

async function stored(): Promise<{ rows: number; objects: number }> {
  const rows = await testDb().selectFrom('lesson_photo').select('id').where('student_id', '=', w.student.id).execute();
  const listed = await s3.send(new ListObjectsV2Command({ Bucket: process.env['S3_BUCKET'] ?? 'uploads', Prefix: 'photos/' }));
  return { rows: rows.length, objects: listed.KeyCount ?? 0 };
}

describe('photo uploads', () => {
  it('refuses oversized, non-image, renamed-executable and huge-dimension files with a clear 4xx, storing nothing', async () => {
    const before = await stored();
    // 16 MB starting with the JPEG magic number: over the stated 15 MB cap.
    const big = new Uint8Array(16 * 1024 * 1024);
    big.set([0xff, 0xd8, 0xff, 0xe0]);
    const tooBig = await sendBytes(w.student.client, url, big, 'image/jpeg');
    expect(tooBig.status).toBe(413);
    expect(tooBig.body.error.message).toMatch(/15 MB/);

    const text = await sendBytes(w.student.client, url, new TextEncoder().encode('just some notes about my block'), 'image/png');
    expect(text.status).toBe(415);
    expect(text.body.error.message).toMatch(/JPEG, PNG or WebP/);

    // An ELF executable header (0x7f 'E' 'L' 'F') sent as "photo.jpg".
    const elf = new Uint8Array(4096);
    elf.set([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01]);
    const exe = await sendBytes(w.student.client, url, elf, 'image/jpeg');
    expect(exe.status).toBe(415);

    // 10000 × 6000 = 60 megapixels (a small file: one flat colour) → over the 50 MP limit, refused from the header.
    const huge = new Uint8Array(await sharp({ create: { width: 10000, height: 6000, channels: 3, background: '#f4eee1' } }).png({ compressionLevel: 9 }).toBuffer());
    expect(huge.length).toBeLessThan(15 * 1024 * 1024);
    const wide = await sendBytes(w.student.client, url, huge, 'image/png');
    expect(wide.status).toBe(413);
    expect(wide.body.error.message).toMatch(/10000 × 6000/);

    expect(await stored()).toEqual(before);
  });

  it('stores a good photo stripped of EXIF and GPS, resized to 2400 px, with a 400 px thumbnail', async () => {
    const input = await sharp({ create: { width: 3000, height: 2000, channels: 3, background: '#b5473a' } })
      .jpeg()
      .withExif({ IFD0: { Make: 'GuildCam', Model: 'Heron 1' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '44/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '68/1 45/1 0/1' } })
      .toBuffer();
    const inMeta = await sharp(input).metadata();
    expect(inMeta.exif?.toString('latin1')).toContain('GuildCam'); // the test photo really carries EXIF
    const before = await stored();
    const up = await sendBytes(w.student.client, url, new Uint8Array(input), 'image/jpeg');
    expect(up.status).toBe(201);
    expect(up.body.photo).toMatchObject({ side: 'front', width: 2400, height: 1600 });
    expect(await stored()).toEqual({ rows: before.rows + 1, objects: before.objects + 2 });

    for (const [path, side] of [[up.body.photo.url, 2400], [up.body.photo.thumbUrl, 400]] as const) {
      const res = await w.teacher.client.get(path);
      expect(res.status).toBe(200);
      const bytes = Buffer.from(await (await fetch(new URL(path, process.env['APP_URL']), { headers: { cookie: `tw_session=${w.teacher.client.sessionToken}` } })).arrayBuffer());
      const meta = await sharp(bytes).metadata();
      expect(meta.format).toBe('jpeg');
      expect(Math.max(meta.width ?? 0, meta.height ?? 0)).toBe(side);
      expect(meta.exif).toBeUndefined();
      expect(bytes.toString('latin1')).not.toContain('GuildCam');
    }
    // The teacher's gallery per lesson and per student lists it.
    const perStudent = await w.teacher.client.get(`/api/classes/${w.classId}/photos?studentId=${w.student.id}`);
    expect(perStudent.body.photos.map((p: { id: string }) => p.id)).toContain(up.body.photo.id);
  });
});
