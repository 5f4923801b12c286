// Every test request comes from 127.0.0.1, so the per-address limits (src/server/auth/authLimits.ts) are shared by
// all test files of a run. Files that spend them, or count on them, reset the loopback counters before and after.
import { testDb } from './db.ts';

const LOOPBACK_KEYS = ['sign-in:ip:127.0.0.1', 'reset:ip:127.0.0.1', 'sign-up:ip:127.0.0.1'];

export async function forgetLoopbackLimits(): Promise<void> {
  await testDb().deleteFrom('rate_limit').where('key', 'in', LOOPBACK_KEYS).execute();
}
