// Layout checks for browser tests at the three widths the product is used at (desktop, tablet beside the machine,
// phone): nothing wider than the viewport, and named boxes that must not overlap.
import type { Page } from 'playwright-core';

export const WIDTHS = [
  { name: 'desktop', width: 1440, height: 900 },
  { name: 'tablet', width: 820, height: 1180 },
  { name: 'phone', width: 390, height: 844 },
] as const;

/** Elements whose right edge passes the viewport (page scrolls sideways), as "tag.class text" descriptions. */
export async function elementsWiderThanViewport(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const limit = document.documentElement.clientWidth + 1;
    const out: string[] = [];
    for (const el of Array.from(document.body.querySelectorAll<HTMLElement>('*'))) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) continue;
      // Content inside a box that scrolls on its own (overflow-x auto/hidden) does not widen the page.
      let clipped = false;
      for (let p = el.parentElement; p && p !== document.body; p = p.parentElement) {
        const ox = getComputedStyle(p).overflowX;
        if (ox === 'auto' || ox === 'scroll' || ox === 'hidden' || ox === 'clip') {
          clipped = true;
          break;
        }
      }
      if (!clipped && r.right > limit) out.push(`${el.tagName.toLowerCase()}.${el.className} “${(el.textContent ?? '').trim().slice(0, 40)}” right=${Math.round(r.right)}`);
    }
    return out.slice(0, 5);
  });
}
