import { describe, expect, it } from 'vitest';
import { buildNewDesign, formErrors, newDesignFormSchema } from './newDesign.ts';

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
    const r = newDesignFormSchema.safeParse({ title: ' ', units: 'cm', width: 400, height: 30, layout: 'blank' });
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(formErrors(r.error)).sort()).toEqual(['title', 'width']);
  });
});
