import { describe, expect, it } from 'vitest';
import { findWalkthroughAction, WALKTHROUGH_KEYS } from './walkthroughKeys.ts';

const key = (k: string, mods: Partial<{ ctrlKey: boolean; altKey: boolean; metaKey: boolean }> = {}) => ({ key: k, ctrlKey: false, altKey: false, metaKey: false, ...mods });

describe('walkthrough keys', () => {
  it('maps every listed key to its action', () => {
    expect(findWalkthroughAction(key(' '), false)).toBe('play-pause');
    expect(findWalkthroughAction(key('ArrowRight'), false)).toBe('next-step');
    expect(findWalkthroughAction(key('n'), false)).toBe('next-step');
    expect(findWalkthroughAction(key('ArrowLeft'), false)).toBe('previous-step');
    expect(findWalkthroughAction(key('Home'), false)).toBe('first-step');
    expect(findWalkthroughAction(key('End'), false)).toBe('last-step');
    expect(findWalkthroughAction(key('r'), false)).toBe('replay-step');
    expect(findWalkthroughAction(key('e'), false)).toBe('step-end');
    expect(findWalkthroughAction(key('+'), false)).toBe('faster');
    expect(findWalkthroughAction(key('-'), false)).toBe('slower');
    const listed = new Set(WALKTHROUGH_KEYS.map((k) => k.action));
    expect(listed.size).toBe(WALKTHROUGH_KEYS.length);
  });

  it('leaves modified keys and typing in fields alone', () => {
    expect(findWalkthroughAction(key('r', { ctrlKey: true }), false)).toBeNull();
    expect(findWalkthroughAction(key('ArrowRight'), true)).toBeNull();
    expect(findWalkthroughAction(key('x'), false)).toBeNull();
  });
});
