// The API's one error shape: { error: { code, message, fields? } }. `code` comes from this closed list so clients
// and tests branch on it; `fields` maps an input path ("email", "design.lines.3") to a message a person can act on.
import { z } from 'zod';
import type { Wire } from './wire.ts';

export const ERROR_CODES = [
  'invalid_input',
  'invalid_json',
  'unsupported_media_type',
  'payload_too_large',
  'unauthenticated',
  'not_found',
  'forbidden_origin',
  'method_not_allowed',
  'conflict',
  'needs_confirmation',
  'wrong_account',
  'invalid_credentials',
  'invalid_token',
  'rate_limited',
  'last_admin',
  'engine_timeout',
  'engine_busy',
  'database_unavailable',
  'invalid_signature',
  'payments_unavailable',
  'internal',
] as const;
export const errorCodeSchema = z.enum(ERROR_CODES);
export type ErrorCode = z.infer<typeof errorCodeSchema>;

export const problemDetailSchema = z.object({
  code: errorCodeSchema,
  message: z.string(),
  fields: z.record(z.string(), z.string()).optional(),
});
export type ProblemDetail = Wire<z.infer<typeof problemDetailSchema>>;

/** Every error answer's body. */
export const problemSchema = z.object({ error: problemDetailSchema });
export type ProblemBody = Wire<z.infer<typeof problemSchema>>;
