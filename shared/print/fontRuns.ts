/** A stretch of text set in one face: `face` indexes the faces given to splitFontRuns. */
export interface FontRun {
  readonly face: number;
  readonly text: string;
}

/**
 * Characters the shipped faces lack, written the way a printed pattern would write them. Anything else no face
 * has becomes "?" so a missing glyph never prints as an empty box.
 */
const STAND_INS: Readonly<Record<string, string>> = { '→': '->', '←': '<-', '≈': '~', '…': '...', '\u00a0': ' ' };

/**
 * Splits text into runs by face: each character goes to the first face that has it (`covers[i](codePoint)`), so a
 * title like "Łódź" is set in the extended face only where the first lacks a letter. Consecutive characters of one
 * face stay one run; spaces stay with the run they are in.
 */
export function splitFontRuns(text: string, covers: readonly ((codePoint: number) => boolean)[]): FontRun[] {
  if (covers.length === 0) throw new Error('print/fontRuns: no faces to set text in');
  const runs: { face: number; text: string }[] = [];
  const push = (face: number, s: string): void => {
    const last = runs[runs.length - 1];
    if (last && (last.face === face || s === ' ')) last.text += s;
    else runs.push({ face, text: s });
  };
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    const face = covers.findIndex((has) => has(cp));
    if (face >= 0) {
      push(face, ch);
      continue;
    }
    const stand = STAND_INS[ch] ?? '?';
    for (const s of stand) push(Math.max(0, covers.findIndex((has) => has(s.codePointAt(0)!))), s);
  }
  return runs;
}

/**
 * A CSS `unicode-range` list ("U+0000-00FF,U+0131,U+2191") as a predicate over code points (CSS Fonts Level 4,
 * §4.5 "unicode-range"; wildcards such as U+4?? are not used by the shipped faces and are refused).
 */
export function parseUnicodeRange(ranges: string): (codePoint: number) => boolean {
  const spans = ranges.split(',').map((part) => {
    const m = /^\s*U\+([0-9A-F]{1,6})(?:-([0-9A-F]{1,6}))?\s*$/i.exec(part);
    if (!m) throw new Error(`print/fontRuns: "${part}" is not a unicode range`);
    const from = parseInt(m[1]!, 16);
    return [from, m[2] ? parseInt(m[2], 16) : from] as const;
  });
  return (cp) => spans.some(([a, b]) => cp >= a && cp <= b);
}
