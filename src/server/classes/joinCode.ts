// Class join codes: 8 characters from an alphabet without look-alikes (no 0/O, 1/I/L), so a code read
// aloud in a guild meeting or copied from a handout is typed right. 31^8 ≈ 8.5e11 codes.
import { randomInt } from 'node:crypto';

const ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export const JOIN_CODE_LENGTH = 8;

export function generateJoinCode(): string {
  let code = '';
  for (let i = 0; i < JOIN_CODE_LENGTH; i += 1) code += ALPHABET[randomInt(ALPHABET.length)];
  return code;
}

/** What a person typed, as stored: upper case, spaces and dashes dropped. */
export function normalizeJoinCode(typed: string): string {
  return typed.toUpperCase().replace(/[\s-]/g, '');
}
