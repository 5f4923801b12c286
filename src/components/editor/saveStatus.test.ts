import { describe, expect, it } from 'vitest';
import { describeSaveStatus, hasUnsavedWork, retryDelayMs } from './saveStatus.ts';

describe('save status', () => {
  it('backs off 1, 2, 4, 8, 16 s, then stays at 30 s', () => {
    expect([1, 2, 3, 4, 5, 6, 12].map(retryDelayMs)).toEqual([1000, 2000, 4000, 8000, 16000, 30000, 30000]);
  });

  it('counts down the retry and says the edits are kept', () => {
    const text = describeSaveStatus({ kind: 'retrying', attempt: 2, retryAt: 5_000, reason: 'The server could not be reached.' }, 1_500);
    expect(text).toContain('trying again in 4 s');
    expect(text).toContain('Kept on this device');
    expect(hasUnsavedWork({ kind: 'saved' })).toBe(false);
    expect(hasUnsavedWork({ kind: 'saving' })).toBe(true);
  });
});
