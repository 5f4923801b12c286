import { describe, expect, it } from 'vitest';
import { splitLinks } from './capturedMail.ts';

describe('splitLinks', () => {
  it('turns each http(s) URL into a link part and keeps the text around it', () => {
    expect(splitLinks('Open\nhttp://x.test/reset?token=abc\nsoon. Or https://y.test.')).toEqual([
      { kind: 'text', text: 'Open\n' },
      { kind: 'link', href: 'http://x.test/reset?token=abc' },
      { kind: 'text', text: '\nsoon. Or ' },
      { kind: 'link', href: 'https://y.test.' },
    ]);
  });
  it('leaves text without links alone and ignores other schemes', () => {
    expect(splitLinks('javascript:alert(1) and ftp://z')).toEqual([{ kind: 'text', text: 'javascript:alert(1) and ftp://z' }]);
  });
});
