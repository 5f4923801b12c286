import { describe, expect, it } from 'vitest';
import { matchShortcut, SHORTCUTS, type KeyPress } from './shortcuts.ts';

const press = (key: string, mods: Partial<KeyPress> = {}): KeyPress => ({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });

describe('keyboard shortcuts', () => {
  it('maps undo/redo with Ctrl or Cmd, and tool letters in either case', () => {
    expect(matchShortcut(press('z', { ctrlKey: true }))).toBe('undo');
    expect(matchShortcut(press('Z', { metaKey: true, shiftKey: true }))).toBe('redo');
    expect(matchShortcut(press('y', { ctrlKey: true }))).toBe('redo');
    expect(matchShortcut(press('R'))).toBe('tool-ruler');
    expect(matchShortcut(press('s', { ctrlKey: true }))).toBeNull();
    expect(matchShortcut(press('r', { altKey: true }))).toBeNull();
  });

  it('maps view keys', () => {
    expect(matchShortcut(press('+', { shiftKey: true }))).toBe('zoom-in');
    expect(matchShortcut(press('-'))).toBe('zoom-out');
    expect(matchShortcut(press('0'))).toBe('zoom-fit');
    expect(matchShortcut(press('ArrowLeft'))).toBe('pan-left');
    expect(matchShortcut(press('?', { shiftKey: true }))).toBe('show-keys');
  });

  it('lists every action exactly once', () => {
    const actions = SHORTCUTS.map((s) => s.action);
    expect(new Set(actions).size).toBe(actions.length);
  });
});
