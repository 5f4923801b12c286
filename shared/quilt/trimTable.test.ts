import { describe, expect, it } from 'vitest';
import { makeQuilt } from './testQuilts.ts';
import { planTrim, trimSettingsSchema } from './trim.ts';
import { buildTrimTable } from './trimTable.ts';

describe('buildTrimTable', () => {
  it('prints the worked 3 × 3 check (docs/engine.md §11.4) in eighths of an inch', () => {
    const q = makeQuilt({ rows: 3, columns: 3, borders: [3], bindingAllowance: 0.25 });
    const plan = planTrim(q, 0.25, trimSettingsSchema.parse({}));
    if (!plan.ok) throw new Error(plan.error.message);
    const rows = buildTrimTable(plan.value);
    expect(rows).toHaveLength(9);
    expect(rows[0]).toEqual({
      block: 'Row 1, column 1',
      position: 'corner',
      makeAt: '17 1/2 × 17 1/2 in',
      cutTo: '15 1/2 × 15 1/2 in',
      sides: {
        // 6 + 3 1/4 = 9 1/4 in from the centre; 0.97 × 10.25 − 9.25 = 0.6925 → 3/4 in to the nearest eighth.
        top: 'cut 9 1/4 in from the centre (border and binding), about 3/4 in off',
        right: 'cut 6 1/4 in from the centre (joining seam), about 3/4 in off',
        bottom: 'cut 6 1/4 in from the centre (joining seam), about 3/4 in off',
        left: 'cut 9 1/4 in from the centre (border and binding), about 3/4 in off',
      },
    });
    expect(rows[4]).toMatchObject({ block: 'Row 2, column 2', position: 'inner', cutTo: '12 1/2 × 12 1/2 in' });
  });
});
