import { describe, expect, it } from 'vitest';
import { findUnstorableText, isStorableText } from './storableText.ts';

describe('isStorableText', () => {
  it('accepts any text made of whole characters, including astral ones (a surrogate pair)', () => {
    for (const s of ['', 'Heron Bend', 'Zoé', '🧵 thread', 'a\u200Bb', '\uFFFD']) expect(isStorableText(s)).toBe(true);
  });
  it('refuses NUL and unpaired surrogates (high alone, low alone, reversed pair)', () => {
    for (const s of ['a\u0000b', '\uD800', 'x\uD83Dy', '\uDC00', '\uDE00\uD83D']) expect(isStorableText(s)).toBe(false);
  });
});

describe('findUnstorableText', () => {
  it('names the first bad string or key by its path', () => {
    expect(findUnstorableText({ title: 'ok', items: [{ name: 'fine' }, { name: 'bad\u0000' }] })).toBe('items.1.name');
    expect(findUnstorableText({ ['key\uD800']: 1 })).toBe('key\uD800');
    expect(findUnstorableText('\uDFFF')).toBe('body');
    expect(findUnstorableText({ n: 1, b: true, z: null, list: [1, 2, 'ok'] })).toBeNull();
  });
  it('walks very deep values without overflowing the stack', () => {
    let deep: unknown = 'x\u0000';
    for (let i = 0; i < 100_000; i += 1) deep = [deep];
    expect(findUnstorableText(deep)).toBe(Array(100_000).fill('0').join('.'));
  });
});
