// Teaching notes are Markdown a teacher writes and students read as HTML: only text markup and http(s)/mailto
// links may come out. Payloads: the classic vectors of the OWASP XSS Filter Evasion Cheat Sheet (from memory).
import { parseFragment } from 'parse5';
import { describe, expect, it } from 'vitest';
import { renderNotes } from './markdown.ts';

interface Node { nodeName: string; attrs?: { name: string; value: string }[]; childNodes?: Node[] }

/** Elements and their attributes as a browser would build them (parse5: the WHATWG HTML parsing algorithm). */
function elements(html: string): Node[] {
  const out: Node[] = [];
  const stack: Node[] = [...((parseFragment(html) as unknown as Node).childNodes ?? [])];
  while (stack.length > 0) {
    const n = stack.pop()!;
    if (!n.nodeName.startsWith('#')) out.push(n);
    stack.push(...(n.childNodes ?? []));
  }
  return out;
}

const ALLOWED = new Set(['p', 'br', 'strong', 'em', 'ul', 'ol', 'li', 'blockquote', 'code', 'pre', 'h2', 'h3', 'h4', 'hr', 'a', 'table', 'thead', 'tbody', 'tr', 'th', 'td']);

const PAYLOADS = [
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  '<svg onload=alert(1)>',
  '<iframe src="https://example.test"></iframe>',
  '<a href="javascript:alert(1)">x</a>',
  '[click](javascript:alert(1))',
  '[click](JaVaScRiPt:alert(1))',
  '[click](jav&#x09;ascript:alert(1))',
  '[click](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)',
  '<a href="https://example.test" onclick="alert(1)" style="color:red">x</a>',
  '<p style="background:url(javascript:alert(1))">x</p>',
  '<math><mtext><table><mglyph><style><img src=x onerror=alert(1)>',
  '<form action="https://example.test"><input name=q></form>',
  '<object data="x.swf"></object><embed src="x.swf">',
  '<base href="https://example.test/">',
  '<meta http-equiv="refresh" content="0;url=https://example.test">',
  '<!--<img src="--><img src=x onerror=alert(1)//">',
];

describe('renderNotes', () => {
  it('keeps emphasis, lists, headings and safe links', () => {
    const html = renderNotes('# Start\n\n**Pin** the *corners*.\n\n- one\n- two\n\n[Guild site](https://heronbend.example/notes)');
    expect(html).toContain('<strong>Pin</strong>');
    expect(html).toContain('<em>corners</em>');
    expect(html).toContain('<li>one</li>');
    expect(html).toContain('<h2>Start</h2>');
    expect(html).toContain('<a href="https://heronbend.example/notes" rel="noopener noreferrer nofollow">Guild site</a>');
  });

  for (const payload of PAYLOADS) {
    it(`leaves nothing that runs, loads or navigates: ${payload.slice(0, 60)}`, () => {
      for (const el of elements(renderNotes(`Before ${payload} after`))) {
        expect(ALLOWED.has(el.nodeName), el.nodeName).toBe(true);
        for (const a of el.attrs ?? []) {
          expect(['href', 'title', 'rel'], `${el.nodeName} ${a.name}`).toContain(a.name);
          if (a.name === 'href') expect(a.value).toMatch(/^(https?:|mailto:)/i);
        }
      }
    });
  }
});
