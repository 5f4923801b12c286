import { describe, expect, it } from 'vitest';
import { SHORTCUTS } from './shortcuts.ts';
import { TOOLS } from './Toolbar.tsx';
import { runWorkbenchAction, WORKBENCH_ACTIONS, type WorkbenchCommands } from './workbenchActions.ts';

/** A commands object that records each call as `name(args)`. */
function recorder(): { calls: string[]; commands: WorkbenchCommands } {
  const calls: string[] = [];
  const commands = new Proxy({} as WorkbenchCommands, {
    get: (_, name) => (...args: unknown[]) => calls.push(`${String(name)}(${args.join(',')})`),
  });
  return { calls, commands };
}

describe('workbench action table', () => {
  it('has a row for every shortcut in the visible list, and each runs exactly one command', () => {
    for (const s of SHORTCUTS) {
      const r = recorder();
      runWorkbenchAction(s.action, r.commands, { shift: false });
      expect(r.calls, s.action).toHaveLength(1);
    }
    expect(Object.keys(WORKBENCH_ACTIONS).sort()).toEqual(SHORTCUTS.map((s) => s.action).sort());
  });

  it('switches to the tool whose shortcut it is', () => {
    for (const t of TOOLS) {
      const r = recorder();
      runWorkbenchAction(t.shortcut, r.commands, { shift: false });
      expect(r.calls).toEqual([`chooseTool(${t.id})`]);
    }
  });

  it('pans by one step, four times as far with Shift, and ignores Shift elsewhere', () => {
    const r = recorder();
    runWorkbenchAction('pan-left', r.commands, { shift: false });
    runWorkbenchAction('pan-down', r.commands, { shift: true });
    runWorkbenchAction('undo', r.commands, { shift: true });
    expect(r.calls).toEqual(['pan(1,0,false)', 'pan(0,-1,true)', 'undo()']);
  });
});
