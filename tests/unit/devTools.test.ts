import { describe, expect, it } from 'vitest';
import { wantsDevTools } from '../../scripts/lib/devTools.mjs';

describe('npm start and the developer tools (issue 10, defect 7)', () => {
  it('leaves the captured-mail page off unless asked for', () => {
    expect(wantsDevTools([], {})).toBe(false);
    expect(wantsDevTools(['--port', '4321'], { DEV_TOOLS: 'false' })).toBe(false);
    expect(wantsDevTools(['--dev-tools'], {})).toBe(true);
    expect(wantsDevTools([], { DEV_TOOLS: 'true' })).toBe(true);
  });
});
