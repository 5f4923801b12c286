// Known devices: after a successful sign-in (or a password reset) the browser gets a signed `tw_device` cookie
// naming the account. A sign-in that brings a valid one is limited per device instead of per account, so a
// stranger's burst of wrong passwords against the account (which slows down every unfamiliar device) does not
// lock the owner out of a browser they have used before. The cookie is not a credential: the password is still
// checked. Each entry is "<account id>.<device id>.<mac>", mac = HMAC-SHA256(key, account, device, password hash
// digest), so a changed password retires every earlier device. Pure, apart from the random device id.
import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { encodeBase32LowerCaseNoPadding } from '@oslojs/encoding';

export const DEVICE_COOKIE = 'tw_device';
export const DEVICE_DAYS = 365;
/** Accounts remembered per browser (a shared family computer); the oldest drops out. */
const MAX_ACCOUNTS = 4;
const ENTRY = /^([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})\.([a-z2-7]{32})\.([a-z2-7]{52})$/;

export interface DeviceAccount {
  readonly id: string;
  readonly passwordHash: string;
}

export function newDeviceId(): string {
  return encodeBase32LowerCaseNoPadding(randomBytes(20));
}

function mac(key: Uint8Array, account: DeviceAccount, deviceId: string): string {
  const credential = createHash('sha256').update(account.passwordHash).digest('hex');
  return encodeBase32LowerCaseNoPadding(createHmac('sha256', key).update(`device|${account.id}|${deviceId}|${credential}`).digest());
}

function entries(cookie: string | undefined): string[] {
  return (cookie ?? '').split('~').filter((e) => e.length > 0).slice(0, MAX_ACCOUNTS);
}

/** The device id this cookie holds for the account, when its signature is good; null otherwise. */
export function findDevice(key: Uint8Array, cookie: string | undefined, account: DeviceAccount): string | null {
  for (const entry of entries(cookie)) {
    const m = ENTRY.exec(entry);
    if (!m || m[1] !== account.id) continue;
    const given = Buffer.from(m[3]!);
    const expected = Buffer.from(mac(key, account, m[2]!));
    if (given.length === expected.length && timingSafeEqual(given, expected)) return m[2]!;
  }
  return null;
}

/** The cookie value with this account's entry (re)signed and first; other accounts' entries are kept. */
export function rememberDevice(key: Uint8Array, cookie: string | undefined, account: DeviceAccount, deviceId: string): string {
  const others = entries(cookie).filter((e) => ENTRY.test(e) && !e.startsWith(`${account.id}.`));
  return [`${account.id}.${deviceId}.${mac(key, account, deviceId)}`, ...others].slice(0, MAX_ACCOUNTS).join('~');
}
