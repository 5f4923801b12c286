// Where the workbench's route check comes from. A save carries the check of the drawing it saved (PUT ?check=1),
// so one burst of edits costs one request: the card shows the saved check while the document is still the one
// that was saved, waits while a save of the newer document is on its way, and asks for a check of its own only
// when no save will bring one (just opened, conflict, refused, retrying).
import type { CheckResult } from '../contract/check.ts';
import type { ProblemDetail } from '../contract/errors.ts';
import type { Design } from '../design/design.schema.ts';

/** The check a save answered with, for the exact document object it sent. */
export interface SavedCheck {
  readonly design: Design;
  readonly check: CheckResult | null;
  /** Why the save's answer has no check (the engine refused the drawing or was busy). */
  readonly checkError: ProblemDetail | null;
}

/** How the document stands against the server, as far as the check cares (the save status's kind). */
export type SaveKind = 'saved' | 'unsaved' | 'saving' | 'retrying' | 'conflict' | 'refused';

export type CheckSource =
  | { readonly kind: 'saved'; readonly saved: SavedCheck }
  | { readonly kind: 'await-save' }
  | { readonly kind: 'fresh' };

/**
 * The check source for `design`. Documents are immutable, so "unchanged since the save" is object identity with
 * the document the save sent. A save that is due (`unsaved`) or on its way (`saving`) brings the check of the newer
 * document; any other state gets a fresh check.
 */
export function chooseCheckSource(design: Design, saved: SavedCheck | null, save: SaveKind): CheckSource {
  if (saved !== null && saved.design === design) return { kind: 'saved', saved };
  if (save === 'unsaved' || save === 'saving') return { kind: 'await-save' };
  return { kind: 'fresh' };
}
