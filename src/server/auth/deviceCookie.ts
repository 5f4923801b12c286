// The known-device cookie (see knownDevice.ts): HttpOnly, SameSite=Lax, Secure over https, a year, and sent only
// to the API (sign-in reads it; sign-in, password reset and password change write it).
import type { AstroCookies } from 'astro';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { DEVICE_COOKIE, DEVICE_DAYS, newDeviceId, rememberDevice, type DeviceAccount } from './knownDevice.ts';
import { deviceKey } from './signInAttempt.ts';

export function setDeviceCookie(cookies: AstroCookies, url: URL, value: string): void {
  cookies.set(DEVICE_COOKIE, value, { httpOnly: true, sameSite: 'lax', secure: url.protocol === 'https:', path: '/api/', maxAge: DEVICE_DAYS * 24 * 60 * 60 });
}

/** Marks this browser as a known device of the account (after it proved the password or the mailbox). */
export async function rememberThisDevice(db: Kysely<Database>, cookies: AstroCookies, url: URL, account: DeviceAccount): Promise<void> {
  const key = await deviceKey(db);
  setDeviceCookie(cookies, url, rememberDevice(key, cookies.get(DEVICE_COOKIE)?.value, account, newDeviceId()));
}
