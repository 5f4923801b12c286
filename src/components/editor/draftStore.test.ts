import { describe, expect, it } from 'vitest';
import { clearDraft, draftKey, loadDraft, saveDraft, type KeyValueStore } from './draftStore.ts';

function memoryStore(): KeyValueStore & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return { map, getItem: (k) => map.get(k) ?? null, setItem: (k, v) => void map.set(k, v), removeItem: (k) => void map.delete(k) };
}

const design = { version: 1 as const, units: 'in' as const, width: 12, height: 12, seams: [], lines: [[[1, 1], [11, 11]] as const], edgeTravel: true };

describe('local drafts', () => {
  it('round-trips a draft', () => {
    const s = memoryStore();
    expect(saveDraft(s, 'd1', { baseVersion: 3, title: 'Star', design, writtenAt: 5 })).toBe(true);
    expect(loadDraft(s, 'd1')).toEqual({ baseVersion: 3, title: 'Star', design, writtenAt: 5 });
    clearDraft(s, 'd1');
    expect(loadDraft(s, 'd1')).toBeNull();
  });

  it('drops a draft that is not JSON or not a valid design', () => {
    const s = memoryStore();
    s.setItem(draftKey('d1'), '{not json');
    expect(loadDraft(s, 'd1')).toBeNull();
    expect(s.map.has(draftKey('d1'))).toBe(false);
    s.setItem(draftKey('d2'), JSON.stringify({ baseVersion: 1, title: 'x', writtenAt: 1, design: { ...design, lines: [[[1, 1]]] } }));
    expect(loadDraft(s, 'd2')).toBeNull();
  });

  it('reports a store that refuses writes', () => {
    const s: KeyValueStore = { getItem: () => null, setItem: () => { throw new Error('QuotaExceededError'); }, removeItem: () => {} };
    expect(saveDraft(s, 'd1', { baseVersion: 0, title: '', design, writtenAt: 0 })).toBe(false);
  });
});
