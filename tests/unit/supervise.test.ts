// scripts/lib/supervise.mjs: `npm start` restarts a crashed app instead of shutting the database down.
import { EventEmitter } from 'node:events';
import { describe, expect, it, vi } from 'vitest';
import { superviseApp } from '../../scripts/lib/supervise.mjs';

class FakeProcess extends EventEmitter {
  exitCode: number | null = null;
  signalCode: string | null = null;
  kill(signal: string) {
    this.signalCode = signal;
    this.emit('exit', null, signal);
    return true;
  }
  crash(code = 1) {
    this.exitCode = code;
    this.emit('exit', code, null);
  }
}

describe('superviseApp', () => {
  it('starts the app again after a crash, gives up when it keeps crashing, and stops without restarting', async () => {
    vi.useFakeTimers();
    try {
      const started: FakeProcess[] = [];
      const onGiveUp = vi.fn();
      const app = superviseApp({ start: () => (started.push(new FakeProcess()), started.at(-1)!), onGiveUp, maxRestarts: 2, windowMs: 60_000, pauseMs: 1_000 });
      started[0]!.crash();
      expect(started).toHaveLength(1);
      vi.advanceTimersByTime(1_000);
      expect(started).toHaveLength(2);
      expect(app.current()).toBe(started[1]);
      started[1]!.crash();
      vi.advanceTimersByTime(1_000);
      expect(started).toHaveLength(3);
      started[2]!.crash(); // third crash within the window: give up
      vi.advanceTimersByTime(1_000);
      expect(started).toHaveLength(3);
      expect(onGiveUp).toHaveBeenCalledTimes(1);

      const calm = superviseApp({ start: () => (started.push(new FakeProcess()), started.at(-1)!), onGiveUp });
      await calm.stop();
      vi.advanceTimersByTime(5_000);
      expect(started).toHaveLength(4);
      expect(started[3]!.signalCode).toBe('SIGTERM');
    } finally {
      vi.useRealTimers();
    }
  });
});
