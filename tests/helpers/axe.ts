// Runs axe-core (Deque's accessibility rules engine, from the npm registry) in the page and returns its serious and
// critical findings. The source is evaluated through the DevTools protocol, which the page's CSP does not govern,
// so the product's policy stays as strict in tests as in production.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

export interface AxeFinding {
  id: string;
  impact: string;
  help: string;
  targets: string[];
}

/** Serious and critical axe findings on the page as it is now (WCAG 2.0/2.1/2.2 A and AA rules, best practices). */
export async function seriousAxeFindings(page: Page): Promise<AxeFinding[]> {
  await page.evaluate(axeSource);
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa', 'best-practice'] } });
    return result.violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({ id: v.id, impact: v.impact ?? '', help: v.help, targets: v.nodes.slice(0, 3).map((n) => n.target.join(' ')) }));
  });
}
