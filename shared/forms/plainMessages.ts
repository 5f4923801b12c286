import { z } from 'zod';

/**
 * Every form and validation message a person reads comes from here: zod's own wording ("Too small: expected number
 * to be >0") never reaches a screen. `plainIssue` is installed as zod's error map (`installPlainMessages`, called by
 * the server middleware, the engine workers and before any island hydrates), so each schema check without a message
 * of its own is worded from the table below. Schema messages written by hand (e.g. "Use a date like 2027-01-15.")
 * still win: zod uses a check's own message before any error map.
 */

/** The words for a field, by its key (the last name in the issue's path). Labels match the forms' own labels. */
export const FIELD_WORDS: Readonly<Record<string, string>> = {
  // Account and sign-in
  displayName: 'Display name',
  email: 'E-mail',
  emails: 'E-mail addresses',
  password: 'Password',
  currentPassword: 'Current password',
  newPassword: 'New password',
  units: 'Units',
  token: 'The link',
  // Designs
  title: 'Title',
  width: 'Width',
  height: 'Height',
  layout: 'Pieced layout',
  design: 'The drawing',
  lines: 'Quilting line',
  seams: 'Seam line',
  route: 'Stitching order',
  start: 'Start point',
  end: 'Finish point',
  baseVersion: 'Version',
  // Block settings (labels as in the workbench's block settings)
  battingSpacing: 'Batting spacing limit',
  spi: 'Stitches per inch',
  sandwichThickness: 'Sandwich thickness',
  tieOffTail: 'Tie-off tail',
  bobbinCapacity: 'Bobbin capacity',
  stitchesPerMinute: 'Sewing speed',
  bindingBand: 'Binding band width',
  // Motifs (labels as in the motif panel)
  spacing: 'Spacing',
  angle: 'Direction',
  crossAngle: 'Angle between sets',
  maxCount: 'Most echoes',
  minRadius: 'Smallest radius',
  maxRadius: 'Largest radius',
  gap: 'Gap',
  seed: 'Arrangement number',
  pitch: 'Loop length',
  margin: 'Margin',
  archWidth: 'Arch width',
  rowSpacing: 'Row spacing',
  // Teaching
  description: 'Description',
  startsOn: 'Start date',
  priceCents: 'Price',
  currency: 'Currency',
  releaseAt: 'Release date',
  notes: 'Lesson notes',
  templateVersionId: 'Template version',
  designId: 'Design',
  difficulty: 'Difficulty',
  motifs: 'Motif tags',
  visibility: 'Who can see it',
  code: 'Class code',
  stepIndex: 'Step',
  totalSteps: 'Number of steps',
};

/** The field an issue path names, in words: the last key in the table, else the key spelled out, else "This value". */
export function fieldWords(path: readonly PropertyKey[]): string {
  const keys = path.filter((p): p is string => typeof p === 'string');
  const key = keys[keys.length - 1];
  if (key === undefined) return 'This value';
  const known = FIELD_WORDS[key];
  if (known) return known;
  const spelled = key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return spelled.charAt(0).toUpperCase() + spelled.slice(1);
}

/** A number as people write it: no exponent, thousands grouped (99999 → "99,999"). */
function num(n: number | bigint): string {
  return typeof n === 'bigint' ? n.toLocaleString('en-GB') : n.toLocaleString('en-GB', { maximumFractionDigits: 6 });
}

/** The issue as it reaches the error map (zod 4's raw issue: code, path and the check's limits). */
type RawIssue = z.core.$ZodRawIssue;

/** One plain sentence for a zod issue, naming the field. Exported for tests; zod calls it through the error map. */
export function plainIssueMessage(issue: RawIssue): string {
  const field = fieldWords(issue.path ?? []);
  if (issue.input === undefined && issue.code !== 'custom' && issue.code !== 'unrecognized_keys') return `${field} is missing.`;
  switch (issue.code) {
    case 'too_small': {
      const min = issue.minimum as number | bigint;
      if (issue.origin === 'string') return Number(min) <= 1 ? `${field} cannot be empty.` : `${field} needs at least ${num(min)} characters.`;
      if (issue.origin === 'array' || issue.origin === 'set') return Number(min) <= 1 ? `${field}: add at least one.` : `${field}: add at least ${num(min)}.`;
      return issue.inclusive ? `${field} must be at least ${num(min)}.` : `${field} must be more than ${num(min)}.`;
    }
    case 'too_big': {
      const max = issue.maximum as number | bigint;
      if (issue.origin === 'string') return `${field} can be at most ${num(max)} characters long.`;
      if (issue.origin === 'array' || issue.origin === 'set') return `${field}: at most ${num(max)}.`;
      return issue.inclusive ? `${field} can be at most ${num(max)}.` : `${field} must be less than ${num(max)}.`;
    }
    case 'invalid_type':
      switch (issue.expected) {
        case 'number':
        case 'bigint':
          return `${field} must be a number.`;
        case 'int':
          return `${field} must be a whole number.`;
        case 'string':
          return `${field} must be text.`;
        case 'boolean':
          return `${field} must be yes or no.`;
        case 'array':
          return `${field} must be a list.`;
        default:
          return `${field} is not in a form we can read.`;
      }
    case 'invalid_format':
      if (issue.format === 'email') return `${field} must be an e-mail address, like name@example.org.`;
      if (issue.format === 'date') return `${field} must be a date like 2027-01-15.`;
      if (issue.format === 'datetime') return `${field} must be a date and time.`;
      if (issue.format === 'uuid' || issue.format === 'guid') return `${field}: choose one from the list.`;
      return `${field} is not in a form we can read.`;
    case 'invalid_value':
      return `${field} must be one of: ${issue.values.map((v) => String(v)).join(', ')}.`;
    case 'not_multiple_of':
      return Number(issue.divisor) === 1 ? `${field} must be a whole number.` : `${field} must be a multiple of ${num(issue.divisor)}.`;
    case 'unrecognized_keys':
      return `${issue.keys.map((k) => fieldWords([k])).join(', ')}: not accepted here.`;
    case 'invalid_union':
    case 'invalid_key':
    case 'invalid_element':
    case 'custom':
    default:
      return `${field} is not accepted.`;
  }
}

/**
 * A schema's own message that still names the field: `namedMessage('must be a date like 2027-01-15.')` on a field
 * `startsOn` reads "Start date must be a date like 2027-01-15.". For checks whose advice the table cannot give.
 */
export function namedMessage(rest: string): { readonly error: (issue: RawIssue) => string } {
  return { error: (issue) => `${fieldWords(issue.path ?? [])} ${rest}` };
}

/** zod's error map: every issue without a message of its own gets the plain sentence. */
export const plainIssue: z.core.$ZodErrorMap = (issue) => plainIssueMessage(issue);

/** Makes the plain messages zod's default in this runtime (server, worker or browser). Safe to call more than once. */
export function installPlainMessages(): void {
  z.config({ customError: plainIssue });
}

/** The first message for each field path ("thread.battingSpacing"; the whole form is "form"), for showing beside it. */
export function fieldMessages(error: { readonly issues: readonly { readonly path: readonly PropertyKey[]; readonly message: string }[] }): Record<string, string> {
  const out: Record<string, string> = Object.create(null) as Record<string, string>;
  for (const issue of error.issues) {
    const at = issue.path.map(String).join('.');
    out[at === '' ? 'form' : at] ??= issue.message;
  }
  return out;
}
