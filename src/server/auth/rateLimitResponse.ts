import { problem } from '../http.ts';

/** 429 with Retry-After (seconds) and a message that says when to try again, and what else may help (`hint`). */
export function rateLimitedResponse(what: string, retryAt: Date, now = new Date(), hint?: string): Response {
  const seconds = Math.max(1, Math.ceil((retryAt.getTime() - now.getTime()) / 1000));
  const minutes = Math.ceil(seconds / 60);
  const wait = seconds < 60 ? `${seconds} seconds` : minutes <= 1 ? 'a minute' : `${minutes} minutes`;
  const at = retryAt.toISOString().slice(11, 16);
  const message = `Too many ${what}. Please wait ${wait} (until ${at} UTC) and try again.${hint ? ` ${hint}` : ''}`;
  return problem(429, 'rate_limited', message, undefined, { 'retry-after': String(seconds) });
}
