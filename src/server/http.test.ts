import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { problem, readJson } from './http.ts';

const schema = z.strictObject({ name: z.string().max(5), count: z.number().int() });

function post(body: BodyInit | null, headers: Record<string, string> = { 'content-type': 'application/json' }) {
  return new Request('http://app.test/api/x', { method: 'POST', body, headers });
}

async function failure(r: Awaited<ReturnType<typeof readJson>>) {
  if (r.ok) throw new Error('expected a failure');
  return { status: r.error.status, body: (await r.error.json()) as { error: { code: string; message: string; fields?: Record<string, string> } } };
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
  it('400 for bytes that are not UTF-8 (never stored as U+FFFD): a lone continuation byte, an overlong form, a truncated sequence, an encoded surrogate', async () => {
    // RFC 3629 §3: 0x80 cannot start a character, C0 AF is an overlong "/", E2 82 stops short of "€", ED A0 80 is U+D800.
    for (const bad of [[0x80], [0xc0, 0xaf], [0xe2, 0x82], [0xed, 0xa0, 0x80]]) {
      const bytes = new Uint8Array([...new TextEncoder().encode('{"name":"a'), ...bad, ...new TextEncoder().encode('","count":1}')]);
      const f = await failure(await readJson(post(bytes), schema));
      expect(f.status).toBe(400);
      expect(f.body.error.code).toBe('invalid_json');
      expect(f.body.error.fields?.['body']).toMatch(/UTF-8/);
    }
  });
  it('400 naming the field for text PostgreSQL cannot store: NUL, or half a surrogate pair written as a JSON escape', async () => {
    for (const text of ['{"name":"a\\u0000","count":1}', '{"name":"\\ud800","count":1}']) {
      const f = await failure(await readJson(post(text), schema));
      expect(f.status).toBe(400);
      expect(Object.keys(f.body.error.fields!)).toEqual(['name']);
    }
  });
  it('413 says the limit in words, and what it protects when the endpoint says so', async () => {
    const big = JSON.stringify({ name: 'a', count: 1, pad: 'x'.repeat(3000) });
    const plain = await failure(await readJson(post(big), schema, 2048));
    expect(plain.body.error.message).toBe('The request body is larger than 2 KB, the most this request may carry.');
    const hinted = await failure(await readJson(post(big), schema, { bytes: 2048, hint: 'A note may have at most 2,000 characters.' }));
    expect(hinted.body.error.message).toMatch(/2 KB.*A note may have at most 2,000 characters\.$/);
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
