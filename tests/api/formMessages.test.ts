// Issue 14 item 6 through the API: bad values answer 400 with a plain message naming the field (from
// shared/forms/plainMessages.ts, never zod's "Too small: expected number to be >0"), the batting spacing limit is
// capped (12 in, from memory, see BATTING_SPACING_MAX), a quilting line outside the block is refused on save, and the
// route check of a draft with a line running past the edge counts only the part inside the block.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';

// zod's own English wording, which must never reach a person.
const ZOD_WORDING = /Too (small|big)|expected|Invalid (input|option)|[<>]=?\s*\d|received/;

let ann: TestAccount;
let teacher: TestAccount;
beforeAll(async () => {
  ann = await createAccount({ displayName: 'Ann' });
  teacher = await createAccount({ role: 'teacher', displayName: 'Tess' });
});
afterAll(closeTestDb);

const plain = (lines: number[][][] = [[[1, 1], [5, 1]]], extra: Record<string, unknown> = {}) => ({
  version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true, lines, ...extra,
});

type Problem = { error: { code: string; message: string; fields: Record<string, string> } };

function expectPlain(body: Problem): void {
  expect(body.error.code).toBe('invalid_input');
  for (const m of [body.error.message, ...Object.values(body.error.fields)]) expect(m).not.toMatch(ZOD_WORDING);
}

describe('form messages through the API', () => {
  it('answers 400 naming the field for thread settings out of range, a batting spacing of 99,999 in among them', async () => {
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [{ battingSpacing: 99_999 }, 'design.thread.battingSpacing', /^Batting spacing limit can be at most 12 in/],
      [{ battingSpacing: 0 }, 'design.thread.battingSpacing', /^Batting spacing limit must be more than 0\.$/],
      [{ spi: 0 }, 'design.thread.spi', /^Stitches per inch must be at least 4\.$/],
      [{ bobbinCapacity: -1 }, 'design.thread.bobbinCapacity', /^Bobbin capacity must be more than 0\.$/],
    ];
    for (const [thread, field, message] of cases) {
      const res = await ann.client.post<Problem>('/api/designs', { title: 'Ranges', design: plain(undefined, { thread }) });
      expect(res.status, JSON.stringify(thread)).toBe(400);
      expectPlain(res.body);
      expect(res.body.error.fields[field]).toMatch(message);
      // One field: the answer's own message is that field's, so a save indicator names it too.
      expect(res.body.error.message).toBe(res.body.error.fields[field]);
    }
    const ok = await ann.client.post('/api/designs', { title: 'Ranges', design: plain(undefined, { thread: { battingSpacing: 10 } }) });
    expect(ok.status, ok.text).toBe(201);
  });

  it('words a missing title, a negative width and text for a number plainly', async () => {
    const res = await ann.client.post<Problem>('/api/designs', { design: plain(undefined, { width: -3, height: 'twelve' }) });
    expect(res.status).toBe(400);
    expectPlain(res.body);
    expect(res.body.error.fields).toMatchObject({ title: 'Title is missing.', 'design.width': 'Width must be more than 0.', 'design.height': 'Height must be a number.' });
  });

  it('refuses a quilting line outside the block on create and save, and the route check counts only the part inside', async () => {
    const past = [[[6, 6], [14, 6]]];
    const created = await ann.client.post<Problem>('/api/designs', { title: 'Over the edge', design: plain(past) });
    expect(created.status).toBe(400);
    expect(created.body.error.fields['design.lines.0']).toBe('Quilting line 1 runs outside the block; quilting lines stay inside the 12 × 12 in block.');
    const good = await ann.client.post<{ design: { id: string } }>('/api/designs', { title: 'Inside', design: plain([[[6, 6], [12, 6]]]) });
    expect(good.status, good.text).toBe(201);
    const id = good.body.design.id;
    const saved = await ann.client.put<Problem>(`/api/designs/${id}`, { baseVersion: 1, design: plain(past) });
    expect(saved.status).toBe(400);
    expect(saved.body.error.fields['design.lines.0']).toMatch(/runs outside the block/);

    // A draft check (what the workbench sends before a save) is planned clipped: the same figures as the line cut at x = 12.
    type Check = { check: { stitchLength: number; oddPoints: { count: number; points: number[][] } } };
    const outside = await ann.client.post<Check>(`/api/designs/${id}/check`, { design: plain(past) });
    const inside = await ann.client.post<Check>(`/api/designs/${id}/check`, { design: plain([[[6, 6], [12, 6]]]) });
    expect(outside.status, outside.text).toBe(200);
    expect(outside.body.check.stitchLength).toBeCloseTo(6, 9);
    expect(outside.body.check).toEqual(inside.body.check);
  });

  it('words teaching form refusals naming the field (a class with a bad price, an empty title, a day that does not exist)', async () => {
    const res = await teacher.client.post<Problem>('/api/classes', { title: ' ', startsOn: '2027-02-30', priceCents: -5 });
    expect(res.status).toBe(400);
    expectPlain(res.body);
    expect(res.body.error.fields).toMatchObject({
      title: 'Title cannot be empty.',
      startsOn: 'Start date must be a real day (February has no 30th) in a year from 1900 to 9999.',
      priceCents: 'Price must be at least 0.',
    });
    expect(res.body.error.message).toBe('Title cannot be empty. 2 other fields need attention too.');
  });
});
