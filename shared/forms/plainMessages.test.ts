import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { designInputSchema, threadSettingsSchema } from '../design/design.schema.ts';
import { fieldMessages, fieldWords, plainIssue } from './plainMessages.ts';

const messagesOf = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value, { error: plainIssue });
  if (r.success) throw new Error('expected a refusal');
  return fieldMessages(r.error);
};

// zod's own English wording (zod 4 locale "en"), which must never reach a screen.
const ZOD_WORDING = /Too (small|big)|expected|Invalid (input|option|string)|[<>]=?\s*\d|received/;

describe('forms/plainMessages', () => {
  it('words each kind of check with the field named', () => {
    const form = z.object({
      title: z.string().min(1).max(10),
      width: z.number().positive(),
      spi: z.number().int().min(4).max(30),
      units: z.enum(['in', 'cm']),
      email: z.email(),
      emails: z.array(z.string()).min(1),
      startsOn: z.iso.date(),
    });
    expect(messagesOf(form, { title: '', width: 0, spi: 4.5, units: 'yd', email: 'nope', emails: [], startsOn: '5 May' })).toEqual({
      title: 'Title cannot be empty.',
      width: 'Width must be more than 0.',
      spi: 'Stitches per inch must be a whole number.',
      units: 'Units must be one of: in, cm.',
      email: 'E-mail must be an e-mail address, like name@example.org.',
      emails: 'E-mail addresses: add at least one.',
      startsOn: 'Start date must be a date like 2027-01-15.',
    });
    expect(messagesOf(form, { title: 'A much longer title', width: 'wide', spi: 31 })).toMatchObject({
      title: 'Title can be at most 10 characters long.',
      width: 'Width must be a number.',
      spi: 'Stitches per inch can be at most 30.',
      units: 'Units is missing.',
    });
  });

  it('keeps a message written into the schema, and spells out a key the table lacks', () => {
    expect(messagesOf(z.object({ a: z.number().min(0, 'Own words.') }), { a: -1 })).toEqual({ a: 'Own words.' });
    expect(fieldWords(['design', 'lines', 3, 'quiltingDepth'])).toBe('Quilting depth');
    expect(fieldWords(['design', 'lines', 3])).toBe('Quilting line');
    expect(fieldWords([])).toBe('This value');
  });

  it('groups thousands so a limit reads as people write it', () => {
    expect(messagesOf(z.object({ width: z.number().max(99_999) }), { width: 100_000 })).toEqual({ width: 'Width can be at most 99,999.' });
  });

  it('never lets zod wording through for the design and thread settings the forms send', () => {
    const bad = [
      { spi: 0 }, { spi: 'ten' }, { sandwichThickness: -1 }, { tieOffTail: 99 }, { bobbinCapacity: 0 }, { stitchesPerMinute: 1e9 }, { battingSpacing: -2 },
    ];
    for (const thread of bad) {
      for (const message of Object.values(messagesOf(threadSettingsSchema, thread))) expect(message, JSON.stringify(thread)).not.toMatch(ZOD_WORDING);
    }
    const design = { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 0], [2, 2]]], edgeTravel: true };
    const cases: unknown[] = [
      { ...design, width: -1 }, { ...design, units: 'yd' }, { ...design, lines: [[[0, 0]]] }, { ...design, lines: [[[0, 0], [20, 0]]] },
      { ...design, thread: { battingSpacing: 99_999 } }, { ...design, version: 2 }, { ...design, extra: true }, { ...design, lines: 'none' },
    ];
    for (const value of cases) {
      const messages = messagesOf(designInputSchema, value);
      expect(Object.keys(messages).length, JSON.stringify(value)).toBeGreaterThan(0);
      for (const message of Object.values(messages)) expect(message, JSON.stringify(value)).not.toMatch(ZOD_WORDING);
    }
  });

  it('refuses a batting spacing limit over 12 in and a quilting line outside the block, naming each', () => {
    const design = { version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true };
    expect(messagesOf(designInputSchema, { ...design, lines: [[[6, 6], [14, 6]]], thread: { battingSpacing: 99_999 } })).toEqual({
      'thread.battingSpacing': "Batting spacing limit can be at most 12 in; check the spacing printed on your batting's package.",
      'lines.0': 'Quilting line 1 runs outside the block; quilting lines stay inside the 12 × 12 in block.',
    });
  });
});
