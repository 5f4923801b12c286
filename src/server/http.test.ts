import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { problem, readJson } from './http.ts';

const schema = z.strictObject({ name: z.string().max(5), count: z.number().int() });

function post(body: BodyInit | null, headers: Record<string, string> = { 'content-type': 'application/json' }) {
  return new Request('http://app.test/api/x', { method: 'POST', body, headers });
}

async function failure(r: Awaited<ReturnType<typeof readJson>>) {
  if (r.ok) throw new Error('expected a failure');
  return { status: r.error.status, body: (await r.error.json()) as { error: { code: string; fields?: Record<string, string> } } };
}

describe('readJson', () => {
  it('returns the parsed value', async () => {
    const r = await readJson(post(JSON.stringify({ name: 'Ann', count: 2 })), schema);
    expect(r).toEqual({ ok: true, value: { name: 'Ann', count: 2 } });
  });
  it('accepts application/*+json and a charset', async () => {
    expect((await readJson(post('{"name":"a","count":1}', { 'content-type': 'application/merge-patch+json; charset=utf-8' }), schema)).ok).toBe(true);
  });
  it('415 for a body that is not declared as JSON', async () => {
    const f = await failure(await readJson(post('{}', { 'content-type': 'text/plain' }), schema));
    expect(f.status).toBe(415);
    expect(f.body.error.code).toBe('unsupported_media_type');
  });
  it('413 once the body passes the limit, whatever Content-Length says', async () => {
    const big = JSON.stringify({ name: 'a', count: 1, pad: 'x'.repeat(2000) });
    expect((await failure(await readJson(post(big), schema, 1000))).status).toBe(413);
    const stream = new ReadableStream<Uint8Array>({
      start(c) {
        for (let i = 0; i < 10; i += 1) c.enqueue(new TextEncoder().encode('x'.repeat(200)));
        c.close();
      },
    });
    const chunked = new Request('http://app.test/api/x', { method: 'POST', body: stream, headers: { 'content-type': 'application/json' }, duplex: 'half' } as RequestInit);
    expect((await failure(await readJson(chunked, schema, 1000))).status).toBe(413);
  });
  it('400 invalid_json for broken or empty JSON', async () => {
    expect((await failure(await readJson(post('{"name":'), schema))).body.error.code).toBe('invalid_json');
    expect((await failure(await readJson(post(null), schema))).body.error.code).toBe('invalid_json');
  });
  it('400 invalid_input naming each bad field, unknown keys and a non-object body', async () => {
    const f = await failure(await readJson(post(JSON.stringify({ name: 'toolong', count: 'x', extra: 1 })), schema));
    expect(f.status).toBe(400);
    expect(f.body.error.code).toBe('invalid_input');
    expect(Object.keys(f.body.error.fields!).sort()).toEqual(['count', 'extra', 'name']);
    expect(Object.keys((await failure(await readJson(post('[1]'), schema))).body.error.fields!)).toEqual(['body']);
  });
});

describe('problem', () => {
  it('has the one error shape, and fields only when given', async () => {
    expect(await problem(404, 'not_found', 'Not found.').json()).toEqual({ error: { code: 'not_found', message: 'Not found.' } });
    const withFields = problem(400, 'invalid_input', 'Check.', { email: 'Bad.' });
    expect(withFields.headers.get('content-type')).toContain('application/json');
    expect(await withFields.json()).toEqual({ error: { code: 'invalid_input', message: 'Check.', fields: { email: 'Bad.' } } });
  });
});
