import { describe, expect, it } from 'vitest';
import { generateMotif, MOTIFS, motifParamsSchema } from '@shared/motifs/motifs.ts';
import { FIELD_WORDS } from '@shared/forms/plainMessages.ts';
import { buildMotifParams, defaultMotifValues, MOTIF_FIELDS } from './motifForm.ts';

describe('motif panel values', () => {
  it('labels every field with the message table’s words, and a bad value is refused naming it plainly', () => {
    for (const { kind } of MOTIFS) for (const f of MOTIF_FIELDS[kind]) expect(FIELD_WORDS[f.key], `${kind}.${f.key}`).toBe(f.label);
    const square: [number, number][] = [[0, 0], [4, 0], [4, 4], [0, 4]];
    const r = generateMotif(square, { kind: 'straight-lines', spacing: -1, angle: 0 });
    if (r.ok || r.error.kind !== 'invalid-params') throw new Error('expected a refusal');
    expect(r.error.issues.map((i) => i.message)).toEqual(['Spacing must be more than 0.']);
  });

  it('every motif’s default values pass the generator’s own schema, in inches and in cm', () => {
    for (const { kind } of MOTIFS) {
      for (const units of ['in', 'cm'] as const) {
        const params = buildMotifParams(kind, defaultMotifValues(kind, units));
        expect(motifParamsSchema.safeParse(params).success, `${kind} ${units}`).toBe(true);
      }
    }
  });

  it('fields exist for every motif kind the registry offers', () => {
    expect(Object.keys(MOTIF_FIELDS).sort()).toEqual(MOTIFS.map((m) => m.kind).sort());
  });

  it('a straight-line set at 1/2 in across a 4 in square gives ⌊4/0.5⌋ = 8 lines', () => {
    // Count rule from the issue: ⌊w/s⌋ lines across width w at spacing s.
    const square = [[0, 0], [4, 0], [4, 4], [0, 4]] as const;
    const r = generateMotif(square, buildMotifParams('straight-lines', { spacing: 0.5, angle: 0 }));
    expect(r.ok && r.value.lines.length).toBe(8);
  });
});
