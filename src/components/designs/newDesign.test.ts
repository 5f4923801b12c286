import { describe, expect, it } from 'vitest';
import { buildNewDesign, newDesignFormSchema, readNewDesignForm } from './newDesign.ts';

describe('new design from the form', () => {
  it('a 12 in nine-patch starts with its four inner seams at 4 and 8 in', () => {
    const form = newDesignFormSchema.parse({ title: 'Heron nine-patch', units: 'in', width: '12', height: '12', layout: 'nine-patch' });
    const design = buildNewDesign(form);
    expect(design.lines).toEqual([]);
    expect(design.width).toBe(12);
    // A nine-patch is a 3 × 3 grid of equal squares: seams at thirds of the side.
    const coords = new Set(design.seams.flat().flatMap(([x, y]) => [x, y]).filter((v) => v > 0 && v < 12));
    expect([...coords].sort((a, b) => a - b)).toEqual([4, 8]);
  });

  it('refuses an empty title and a block larger than the size cap, naming the field', () => {
    const r = readNewDesignForm({ title: ' ', units: 'cm', width: 400, height: 30, layout: 'blank' });
    if (r.ok) throw new Error('expected refusal');
    expect(Object.keys(r.errors).sort()).toEqual(['title', 'width']);
    expect(r.errors['width']).toMatch(/^Width can be at most 305 cm/);
  });

  it('words the checks without a message of their own from the shared table', () => {
    const r = readNewDesignForm({ title: 'Heron', units: 'yd', width: 'twelve', height: -1, layout: 'nine-patch' });
    if (r.ok) throw new Error('expected refusal');
    expect(r.errors).toEqual({ units: 'Units must be one of: in, cm.', width: 'Width must be a number.', height: 'The height must be more than 0.' });
  });
});
