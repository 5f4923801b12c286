import net from 'node:net';

/** Resolves `preferred` when it is free on 127.0.0.1, else a free port the OS picks. */
export function findFreePort(preferred = 0) {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(findFreePort(0)));
    server.listen(preferred, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

/** Waits until `url` answers any HTTP status, or rejects after `timeoutMs`. */
export async function waitForHttp(url, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      await fetch(url, { redirect: 'manual' });
      return;
    } catch (error) {
      if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs} ms: ${error}`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }
}
