// PUT /api/account/password — change the password (current one required); every reset link and every other
// session end, and this browser stays a known device (see src/server/auth/knownDevice.ts).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { passwordChangeSchema } from '@server/accounts/account.schema.ts';
import { changePassword } from '@server/accounts/account.service.ts';
import { requireUser } from '@server/auth/guards.ts';
import { rememberThisDevice } from '@server/auth/deviceCookie.ts';

export const PUT = (async ({ locals, request, cookies, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, passwordChangeSchema);
  if (!body.ok) return body.error;
  const result = await changePassword(db, signedIn.value.user.id, signedIn.value.session.id, body.value);
  if (!result.ok) return problem(400, 'invalid_credentials', 'The current password is not right.', { currentPassword: 'The current password is not right.' });
  await rememberThisDevice(db, cookies, url, { id: signedIn.value.user.id, passwordHash: result.value.passwordHash });
  return json({ message: 'Password changed. Other devices have been signed out.' });
}) satisfies APIRoute;
