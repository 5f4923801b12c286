/** What the walkthrough keyboard can do (desktop); every key is listed on screen. */
export type WalkthroughAction = 'play-pause' | 'next-step' | 'previous-step' | 'first-step' | 'last-step' | 'faster' | 'slower' | 'replay-step' | 'step-end';

export interface WalkthroughKey {
  readonly action: WalkthroughAction;
  /** As shown on screen. */
  readonly keys: string;
  readonly label: string;
}

export const WALKTHROUGH_KEYS: readonly WalkthroughKey[] = [
  { action: 'play-pause', keys: 'Space', label: 'Play or pause this step (after a step ends: play the next)' },
  { action: 'next-step', keys: '→ or N', label: 'Next step' },
  { action: 'previous-step', keys: '← or P', label: 'Previous step' },
  { action: 'replay-step', keys: 'R', label: 'Replay this step from its start' },
  { action: 'step-end', keys: 'E', label: 'Jump to the end of this step' },
  { action: 'first-step', keys: 'Home', label: 'First step' },
  { action: 'last-step', keys: 'End', label: 'Last step' },
  { action: 'faster', keys: '+', label: 'Faster' },
  { action: 'slower', keys: '−', label: 'Slower' },
];

/**
 * The action for a key press, or null. Presses with Ctrl, Alt or Meta are left to the browser, and so are keys
 * typed into form fields (the caller passes `inField`); Space on a focused button is the button's own.
 */
export function findWalkthroughAction(e: { key: string; ctrlKey: boolean; altKey: boolean; metaKey: boolean }, inField: boolean): WalkthroughAction | null {
  if (e.ctrlKey || e.altKey || e.metaKey || inField) return null;
  switch (e.key) {
    case ' ':
    case 'Spacebar':
      return 'play-pause';
    case 'ArrowRight':
    case 'n':
    case 'N':
      return 'next-step';
    case 'ArrowLeft':
    case 'p':
    case 'P':
      return 'previous-step';
    case 'r':
    case 'R':
      return 'replay-step';
    case 'e':
    case 'E':
      return 'step-end';
    case 'Home':
      return 'first-step';
    case 'End':
      return 'last-step';
    case '+':
    case '=':
      return 'faster';
    case '-':
    case '_':
      return 'slower';
    default:
      return null;
  }
}
