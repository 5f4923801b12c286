import { applyCommand, type DesignCommand } from '@shared/design/commands.ts';
import { bindingBandOf, designInputSchema, type Design, type ThreadSettings } from '@shared/design/design.schema.ts';
import { fieldWords, plainIssue } from '@shared/forms/plainMessages.ts';
import { THREAD_DEFAULTS } from '@shared/route/threadBudget.ts';
import { lengthInputText, parseLengthInput } from '@shared/units/units.ts';
import type { Units } from '@shared/design/design.schema.ts';

/** A number the quilter may set for the block; `thread` keys live in `design.thread`, `bindingBand` on the design. */
export type BlockSettingKey = keyof ThreadSettings | 'bindingBand';

export interface BlockSettingField {
  readonly key: BlockSettingKey;
  readonly label: string;
  /** 'design' = the design's own units; otherwise a fixed unit shown after the label. */
  readonly unit: 'design' | 'in' | 'yd' | 'stitches/min' | 'SPI';
  readonly step: string;
}

export const BLOCK_SETTING_FIELDS: readonly BlockSettingField[] = [
  { key: 'battingSpacing', label: 'Batting spacing limit', unit: 'design', step: 'any' },
  { key: 'spi', label: 'Stitches per inch', unit: 'SPI', step: '1' },
  { key: 'sandwichThickness', label: 'Sandwich thickness', unit: 'in', step: 'any' },
  { key: 'tieOffTail', label: 'Tie-off tail', unit: 'in', step: 'any' },
  { key: 'bobbinCapacity', label: 'Bobbin capacity', unit: 'yd', step: 'any' },
  { key: 'stitchesPerMinute', label: 'Sewing speed', unit: 'stitches/min', step: '10' },
  { key: 'bindingBand', label: 'Binding band width', unit: 'design', step: 'any' },
];

/** The value the route check uses when the field is empty, and whether that default is from memory. */
export function defaultOf(key: BlockSettingKey, design: Pick<Design, 'units' | 'bindingBand'>): { readonly value: number | null; readonly fromMemory: boolean } {
  if (key === 'bindingBand') return { value: bindingBandOf({ units: design.units }), fromMemory: false };
  if (key === 'battingSpacing') return { value: null, fromMemory: false };
  const d = THREAD_DEFAULTS[key];
  return { value: d.value, fromMemory: d.source.startsWith('from memory') };
}

/** The design's own value for the field, or null when it uses the default. */
export function ownValueOf(key: BlockSettingKey, design: Design): number | null {
  if (key === 'bindingBand') return design.bindingBand ?? null;
  return design.thread?.[key] ?? null;
}

/** The length unit a field is typed in (inch fields take ruler fractions), or null for counts and speeds. */
export function lengthUnitsOf(key: BlockSettingKey, design: Pick<Design, 'units'>): Units | null {
  const field = BLOCK_SETTING_FIELDS.find((f) => f.key === key);
  if (!field) return null;
  return field.unit === 'design' ? design.units : field.unit === 'in' ? 'in' : null;
}

/** A setting's value as its field shows it: "1/16" rather than 0.0625 in an inch field. */
export function settingText(key: BlockSettingKey, design: Pick<Design, 'units'>, value: number): string {
  const units = lengthUnitsOf(key, design);
  return units ? lengthInputText(value, units) : String(value);
}

export type SettingInput = { readonly ok: true; readonly command: DesignCommand | null } | { readonly ok: false; readonly message: string };

/**
 * Turns what the quilter typed into ONE command (or null when nothing changes), validated with the design
 * schema: empty text goes back to the default; text that is not a number, or a number the schema refuses,
 * gives a message and no command.
 */
export function settingCommand(design: Design, key: BlockSettingKey, text: string): SettingInput {
  const trimmed = text.trim();
  const units = lengthUnitsOf(key, design);
  const value = trimmed === '' ? null : units ? (parseLengthInput(trimmed, units) ?? Number(trimmed)) : Number(trimmed);
  if (value !== null && !Number.isFinite(value)) {
    const example = units === 'in' ? ' (like 1/4 or 0.25)' : '';
    return { ok: false, message: `${fieldWords([key])} must be a number${example}; leave it empty for the default.` };
  }
  if (value === ownValueOf(key, design)) return { ok: true, command: null };
  const command = key === 'bindingBand' ? { kind: 'setBindingBand' as const, value } : threadCommand(design.thread ?? {}, key, value);
  const checked = designInputSchema.safeParse(applyCommand(design, command).design, { error: plainIssue });
  if (checked.success) return { ok: true, command };
  // The message about this field first (an older drawing may fail other input rules too).
  const issue = checked.error.issues.find((i) => i.path[i.path.length - 1] === key) ?? checked.error.issues[0];
  return { ok: false, message: issue?.message ?? 'This value is not accepted.' };
}

function threadCommand(thread: ThreadSettings, key: keyof ThreadSettings, value: number | null): DesignCommand {
  const next: Record<string, number> = {};
  for (const [k, v] of Object.entries(thread)) if (k !== key && v !== undefined) next[k] = v;
  if (value !== null) next[key] = value;
  return { kind: 'setThread', thread: Object.keys(next).length > 0 ? (next as ThreadSettings) : null };
}
