// Keeps the app process (and the planning worker) running under `npm start`: when it exits on its own (a crash), it is started again
// after a short pause instead of taking the database and the fakes down with it. A process that keeps
// dying (more than `maxRestarts` within `windowMs`, e.g. a broken build) is given up on, and `onGiveUp` runs.
import { log } from './system.mjs';

/**
 * `start()` spawns the app and returns its ChildProcess. Returns `{ current(), stop() }`: `stop()` ends the
 * running process (SIGTERM, SIGKILL after 5 s) and resolves once it has exited; no restart follows.
 */
export function superviseApp({ start, onGiveUp, maxRestarts = 5, windowMs = 60_000, pauseMs = 1_000, name = 'app' }) {
  let child = start();
  let stopping = false;
  const restarts = [];
  const watch = (proc) => {
    proc.on('exit', (code, signal) => {
      if (stopping || proc !== child) return;
      const now = Date.now();
      while (restarts.length > 0 && now - restarts[0] > windowMs) restarts.shift();
      if (restarts.length >= maxRestarts) {
        log(`the ${name} exited (${signal ?? `code ${code}`}) ${restarts.length + 1} times within ${windowMs / 1000} s; giving up.`);
        onGiveUp();
        return;
      }
      restarts.push(now);
      log(`the ${name} exited (${signal ?? `code ${code}`}); starting it again in ${pauseMs / 1000} s.`);
      setTimeout(() => {
        if (stopping) return;
        child = start();
        watch(child);
      }, pauseMs);
    });
  };
  watch(child);
  return {
    current: () => child,
    stop: () =>
      new Promise((resolve) => {
        stopping = true;
        if (child.exitCode !== null || child.signalCode !== null) return resolve();
        const proc = child;
        const force = setTimeout(() => proc.kill('SIGKILL'), 5_000);
        proc.once('exit', () => {
          clearTimeout(force);
          resolve();
        });
        proc.kill('SIGTERM');
      }),
  };
}
