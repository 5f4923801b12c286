// The limits on account endpoints (counts before RATE_LIMIT_SCALE). Addresses come from clientIp() (the socket,
// or what a trusted proxy reports; an IPv6 client counts by its /64). Only failed sign-ins count: a success gives
// its attempt back. Reset and sign-up requests always count, since each one sends an e-mail.
import type { Gate, GateRule } from './attemptGate.ts';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;

/** Failed sign-ins from one address, whatever the account: 100 per 15 minutes (stops spraying many accounts). */
export const SIGN_IN_ADDRESS: GateRule = { limit: 100, windowMs: 15 * MINUTE };
/**
 * Failed sign-ins to one account from devices that have not signed in to it before, from every address together:
 * 10 free, then each further attempt waits twice as long as the last (30 s, 1 min, 2 min … at most 15 min);
 * the count restarts a day after the first failure or at a successful sign-in.
 */
export const SIGN_IN_ACCOUNT: GateRule = { limit: 200, windowMs: 24 * HOUR, slowDown: { after: 10, firstMs: 30_000, maxMs: 15 * MINUTE } };
/** Failed sign-ins from one known device (see knownDevice.ts): 10 per 15 minutes. */
export const SIGN_IN_DEVICE: GateRule = { limit: 10, windowMs: 15 * MINUTE };

/** Reset e-mails: 5 an hour per account (from any address), 20 an hour per address (for any accounts). */
export const RESET_ACCOUNT: GateRule = { limit: 5, windowMs: HOUR };
export const RESET_ADDRESS: GateRule = { limit: 20, windowMs: HOUR };

/** Sign-up requests (each sends an e-mail): 3 an hour per e-mail address, 20 an hour per client address. */
export const SIGN_UP_EMAIL: GateRule = { limit: 3, windowMs: HOUR };
export const SIGN_UP_ADDRESS: GateRule = { limit: 20, windowMs: HOUR };

export const signInAddressGate = (address: string): Gate => ({ key: `sign-in:ip:${address}`, rule: SIGN_IN_ADDRESS });
export const signInAccountGate = (email: string): Gate => ({ key: `sign-in:account:${email.toLowerCase()}`, rule: SIGN_IN_ACCOUNT });
export const signInDeviceGate = (deviceId: string): Gate => ({ key: `sign-in:device:${deviceId}`, rule: SIGN_IN_DEVICE });
export const resetGates = (address: string, email: string): Gate[] => [
  { key: `reset:ip:${address}`, rule: RESET_ADDRESS },
  { key: `reset:account:${email.toLowerCase()}`, rule: RESET_ACCOUNT },
];
export const signUpGates = (address: string, email: string): Gate[] => [
  { key: `sign-up:ip:${address}`, rule: SIGN_UP_ADDRESS },
  { key: `sign-up:email:${email.toLowerCase()}`, rule: SIGN_UP_EMAIL },
];
