// With DEV_TOOLS=false (a production start), the dev mail page must not exist. Starts a second
// instance of the built server on a free port against the same database.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startExtraServer, type ExtraServer } from '../helpers/extraServer.ts';

let server: ExtraServer | undefined;
let url = '';

beforeAll(async () => {
  server = await startExtraServer({ DEV_TOOLS: 'false' });
  url = server.url;
});
afterAll(() => server?.stop());

describe('DEV_TOOLS=false', () => {
  it('answers 404 for /dev/mail, and serves everything else', async () => {
    const res = await fetch(`${url}/dev/mail`);
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('We could not find that page');
    expect((await fetch(`${url}/`)).status).toBe(200);
    expect((await fetch(`${url}/api/session`)).status).toBe(401);
  });
});
