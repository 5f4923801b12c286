import { describe, expect, it } from 'vitest';
import { databaseUnavailableResponse, isDatabaseUnavailable } from './dbOutage.ts';

// Error shapes as pg and node:net produce them (pg/lib/client.js, pg-pool/index.js; SQLSTATEs from the
// PostgreSQL docs, Appendix A).
const pgError = (code: string, message = 'x') => Object.assign(new Error(message), { code, severity: 'FATAL' });

describe('isDatabaseUnavailable', () => {
  it('knows the ways a database outage shows up', () => {
    expect(isDatabaseUnavailable(pgError('57P01', 'terminating connection due to administrator command'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('57P03', 'the database system is starting up'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('08006'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('53300', 'sorry, too many clients already'))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' }))).toBe(true);
    expect(isDatabaseUnavailable(new Error('Connection terminated unexpectedly'))).toBe(true);
    expect(isDatabaseUnavailable(new Error('timeout exceeded when trying to connect'))).toBe(true);
    const aggregate = new AggregateError([Object.assign(new Error('refused'), { code: 'ECONNREFUSED' })], 'connect failed');
    expect(isDatabaseUnavailable(aggregate)).toBe(true);
    expect(isDatabaseUnavailable(new Error('wrapped', { cause: pgError('57P01') }))).toBe(true);
  });

  it('leaves bugs and bad queries alone (they stay 500s)', () => {
    expect(isDatabaseUnavailable(pgError('23505', 'duplicate key value violates unique constraint'))).toBe(false);
    expect(isDatabaseUnavailable(pgError('42P01', 'relation "nope" does not exist'))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError('Cannot read properties of undefined'))).toBe(false);
    expect(isDatabaseUnavailable('Connection terminated')).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
    // A client that hangs up while its body is read (node:http) is not a database outage.
    expect(isDatabaseUnavailable(Object.assign(new Error('aborted'), { code: 'ECONNRESET' }))).toBe(false);
  });
});

describe('databaseUnavailableResponse', () => {
  it('answers API clients with the JSON problem shape and pages with plain HTML, both 503 with Retry-After', async () => {
    const api = databaseUnavailableResponse(true);
    expect(api.status).toBe(503);
    expect(api.headers.get('retry-after')).toBe('5');
    expect((await api.json()).error.code).toBe('database_unavailable');
    const page = databaseUnavailableResponse(false);
    expect(page.status).toBe(503);
    expect(page.headers.get('retry-after')).toBe('5');
    expect(page.headers.get('content-type')).toMatch(/^text\/html/);
    expect(await page.text()).toContain('Threadway will be back shortly');
  });
});
