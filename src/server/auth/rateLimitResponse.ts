import { problem } from '../http.ts';

/** 429 with Retry-After (seconds) and a message that says when to try again. */
export function rateLimitedResponse(what: string, retryAt: Date, now = new Date()): Response {
  const seconds = Math.max(1, Math.ceil((retryAt.getTime() - now.getTime()) / 1000));
  const minutes = Math.ceil(seconds / 60);
  const wait = minutes <= 1 ? 'a minute' : `${minutes} minutes`;
  const at = retryAt.toISOString().slice(11, 16);
  return problem(429, 'rate_limited', `Too many ${what}. Please wait ${wait} (until ${at} UTC) and try again.`, undefined, {
    'retry-after': String(seconds),
  });
}
