import { describe, expect, it } from 'vitest';
import { displayNameSchema, emailSchema, newPasswordSchema, signUpSchema } from './account.schema.ts';

describe('account input rules', () => {
  it('trims e-mail and refuses what is not an address', () => {
    expect(emailSchema.parse('  Ann@Guild.test ')).toBe('Ann@Guild.test');
    for (const bad of ['ann', 'ann@', "' OR 1=1 --@x", 'a\u0000@b.test', `${'a'.repeat(250)}@b.test`]) expect(emailSchema.safeParse(bad).success).toBe(false);
  });
  it('normalises names to NFC, folds runs of spaces, refuses controls and invisible marks', () => {
    expect(displayNameSchema.parse('  Zoe\u0301   Wren ')).toBe('Zoé Wren');
    for (const bad of ['', '   ', 'A\u0000', 'A\u202Eb', '\u200B', 'x'.repeat(81)]) expect(displayNameSchema.safeParse(bad).success).toBe(false);
    expect(displayNameSchema.parse(`O'Brien; DROP TABLE account`)).toBe(`O'Brien; DROP TABLE account`);
  });
  it('counts password length in characters (code points), not UTF-16 units', () => {
    expect(newPasswordSchema.safeParse('🧵'.repeat(9)).success).toBe(false); // 18 UTF-16 units, 9 characters
    expect(newPasswordSchema.safeParse('🧵'.repeat(10)).success).toBe(true);
    expect(newPasswordSchema.safeParse('\uD800abcdefghijk').success).toBe(false);
  });
  it('defaults units to inches and refuses unknown fields', () => {
    expect(signUpSchema.parse({ email: 'a@b.test', displayName: 'A', password: 'long-enough-1' }).units).toBe('in');
    expect(signUpSchema.safeParse({ email: 'a@b.test', displayName: 'A', password: 'long-enough-1', role: 'admin' }).success).toBe(false);
  });
});
