import { describe, expect, it } from 'vitest';

const APP_URL = process.env['APP_URL']!;

describe('the app under test', () => {
  it('serves the home page', async () => {
    const res = await fetch(APP_URL);
    expect(res.status).toBe(200);
    expect(await res.text()).toContain('Threadway');
  });
});
