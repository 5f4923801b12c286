import { describe, expect, it } from 'vitest';
import { TOOLS } from './Toolbar.tsx';
import { toolHint } from './toolHints.ts';

describe('toolHint', () => {
  it('gives every tool one line that says how to begin, and a line in progress how to finish or cancel', () => {
    for (const t of TOOLS) {
      const idle = toolHint(t.id, { kind: 'idle' });
      expect(idle.length, t.id).toBeGreaterThan(20);
      expect(idle, t.id).not.toMatch(/\n/);
    }
    for (const id of ['ruler', 'seam', 'polyline', 'curve'] as const) {
      const drawing = toolHint(id, { kind: 'drawing' });
      expect(drawing, id).toMatch(/Esc/);
      expect(drawing, id).not.toBe(toolHint(id, { kind: 'idle' }));
    }
    expect(toolHint('ruler', { kind: 'idle' })).toMatch(/drag/);
  });

  it('names the start-and-end step the next click sets', () => {
    expect(toolHint('ends', { kind: 'ends', next: 'start' })).toMatch(/^Step 1 of 2: click where the needle starts/);
    expect(toolHint('ends', { kind: 'ends', next: 'end' })).toMatch(/^Step 2 of 2: click where the needle finishes/);
  });
});
