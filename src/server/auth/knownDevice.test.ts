import { describe, expect, it } from 'vitest';
import { findDevice, newDeviceId, rememberDevice } from './knownDevice.ts';

const key = new Uint8Array(32).fill(7);
const ann = { id: '0b6f4c3e-1d2a-4b5c-8d9e-0f1a2b3c4d5e', passwordHash: '$argon2id$v=19$m=19456,t=2,p=1$annsalt$annhash' };
const bo = { id: '9a8b7c6d-5e4f-4a3b-9c2d-1e0f9a8b7c6d', passwordHash: '$argon2id$v=19$m=19456,t=2,p=1$bosalt$bohash' };

describe('known-device cookie', () => {
  it('recognises the device it was issued to, for that account only', () => {
    const device = newDeviceId();
    const cookie = rememberDevice(key, undefined, ann, device);
    expect(findDevice(key, cookie, ann)).toBe(device);
    expect(findDevice(key, cookie, bo)).toBeNull();
  });

  it('refuses a changed signature, another key, an account id swapped in, and a changed password', () => {
    const device = newDeviceId();
    const cookie = rememberDevice(key, undefined, ann, device);
    const flipped = cookie.slice(0, -1) + (cookie.endsWith('a') ? 'b' : 'a');
    expect(findDevice(key, flipped, ann)).toBeNull();
    expect(findDevice(new Uint8Array(32).fill(8), cookie, ann)).toBeNull();
    expect(findDevice(key, cookie.replace(ann.id, bo.id), bo)).toBeNull();
    expect(findDevice(key, cookie, { ...ann, passwordHash: '$argon2id$v=19$m=19456,t=2,p=1$annsalt$newhash' })).toBeNull();
  });

  it('keeps up to four accounts per browser, newest first, and ignores junk', () => {
    let cookie: string | undefined = 'junk~more-junk';
    const ids: string[] = [];
    for (let i = 0; i < 5; i += 1) {
      const account = { id: `0b6f4c3e-1d2a-4b5c-8d9e-0f1a2b3c4d5${i}`, passwordHash: `hash-${i}` };
      ids.push(account.id);
      cookie = rememberDevice(key, cookie, account, newDeviceId());
    }
    const held = cookie!.split('~').map((e) => e.slice(0, 36));
    expect(held).toEqual([ids[4], ids[3], ids[2], ids[1]]);
    const again = rememberDevice(key, cookie, ann, newDeviceId());
    expect(again.split('~')).toHaveLength(4);
    expect(again.startsWith(`${ann.id}.`)).toBe(true);
  });
});
