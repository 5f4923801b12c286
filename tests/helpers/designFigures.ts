// Saves return before the route engine has worked out a design's figures (issue 10: saves never wait on
// planning); these wait until the figures of the current version are in.
import type { TestClient } from './client.ts';

export async function waitForFigures(client: TestClient, designId: string, timeoutMs = 30_000): Promise<any> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await client.get(`/api/designs/${designId}`);
    if (res.status !== 200) throw new Error(`tests/helpers/designFigures: GET answered ${res.status}: ${res.text}`);
    if (!res.body.design.summaryPending) return res.body.design;
    if (Date.now() > deadline) throw new Error(`tests/helpers/designFigures: figures of ${designId} still pending after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Waits until no design in the account's list has figures pending. */
export async function waitForListFigures(client: TestClient, timeoutMs = 30_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await client.get('/api/designs?pageSize=100');
    if (res.status !== 200) throw new Error(`tests/helpers/designFigures: list answered ${res.status}: ${res.text}`);
    if (!res.body.designs.some((d: any) => d.summaryPending)) return;
    if (Date.now() > deadline) throw new Error('tests/helpers/designFigures: list figures still pending');
    await new Promise((r) => setTimeout(r, 100));
  }
}
