import { describe, expect, it } from 'vitest';
import { applyCommand } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import { FIELD_WORDS } from '@shared/forms/plainMessages.ts';
import { BLOCK_SETTING_FIELDS, defaultOf, settingCommand, settingText } from './blockSettingsForm.ts';

const block: Design = { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [], edgeTravel: true, thread: { spi: 12 } };

describe('settingCommand', () => {
  it('sets the batting spacing as one setThread command and keeps the other thread settings', () => {
    const r = settingCommand(block, 'battingSpacing', '2');
    expect(r).toEqual({ ok: true, command: { kind: 'setThread', thread: { spi: 12, battingSpacing: 2 } } });
  });

  it('empty text goes back to the default; the last setting removed clears the thread settings', () => {
    expect(settingCommand(block, 'spi', ' ')).toEqual({ ok: true, command: { kind: 'setThread', thread: null } });
  });

  it('unchanged value commits nothing', () => {
    expect(settingCommand(block, 'spi', '12')).toEqual({ ok: true, command: null });
  });

  it('refuses what the schema refuses, with a message and no command', () => {
    expect(settingCommand(block, 'spi', '2').ok).toBe(false); // schema: SPI 4–30
    expect(settingCommand(block, 'bindingBand', '-1').ok).toBe(false);
    expect(settingCommand(block, 'tieOffTail', 'abc').ok).toBe(false);
  });

  it('words each refusal in plain words naming the field, from the shared table (no zod wording)', () => {
    expect(settingCommand(block, 'spi', '2')).toEqual({ ok: false, message: 'Stitches per inch must be at least 4.' });
    expect(settingCommand(block, 'bindingBand', '-1')).toEqual({ ok: false, message: 'Binding band width must be more than 0.' });
    expect(settingCommand(block, 'tieOffTail', 'abc')).toEqual({ ok: false, message: 'Tie-off tail must be a number (like 1/4 or 0.25); leave it empty for the default.' });
    // 12 in: BATTING_SPACING_MAX (from memory, see design.schema.ts).
    const batting = settingCommand(block, 'battingSpacing', '99999');
    expect(batting).toEqual({ ok: false, message: expect.stringMatching(/^Batting spacing limit can be at most 12 in/) });
    expect(settingCommand(block, 'battingSpacing', '10').ok).toBe(true);
  });

  it('labels the fields with the same words the message table uses', () => {
    for (const f of BLOCK_SETTING_FIELDS) expect(FIELD_WORDS[f.key], f.key).toBe(f.label);
  });

  it('binding band goes through setBindingBand and undoes to the default', () => {
    const r = settingCommand(block, 'bindingBand', '0.25');
    if (!r.ok || !r.command) throw new Error('expected a command');
    const applied = applyCommand(block, r.command);
    expect(applied.design.bindingBand).toBe(0.25);
    expect(applyCommand(applied.design, applied.inverse).design.bindingBand).toBeUndefined();
  });

  it('defaults: 1/8 in binding band is 0.3175 cm (1 in = 2.54 cm exactly, NIST SP 811); SPI default is from memory', () => {
    expect(defaultOf('bindingBand', { units: 'cm' }).value).toBeCloseTo(0.3175, 10);
    expect(defaultOf('spi', block)).toEqual({ value: 10, fromMemory: true });
    expect(defaultOf('battingSpacing', block).value).toBeNull();
  });

  it('takes ruler fractions in inch fields and shows values on a 1/16 mark as fractions (issue 14)', () => {
    const r = settingCommand(block, 'tieOffTail', '1 1/2');
    expect(r).toEqual({ ok: true, command: { kind: 'setThread', thread: { spi: 12, tieOffTail: 1.5 } } });
    expect(settingText('sandwichThickness', block, 0.0625)).toBe('1/16');
    expect(settingText('spi', block, 12)).toBe('12');
  });
});
