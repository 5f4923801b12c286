// The shipped Source Sans 3 faces (npm @fontsource/source-sans-3, SIL Open Font License) that printed plans embed.
// The .woff files, not .woff2: fontkit (inside pdfkit) fails on the woff2 files at doc.end(). Fontsource splits the
// family by script: the `latin` subset has ASCII and Western European letters, `latin-ext` the rest of the Latin
// letters (Ł, ź, ő …) but not ASCII, so text is set run by run in whichever face has each character
// (shared/print/fontRuns.ts).
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { woffToSfnt } from './woff.ts';

const require = createRequire(import.meta.url);

export type FontWeight = 'regular' | 'bold';
export type FontSubset = 'latin' | 'latin-ext';

const WEIGHTS: Readonly<Record<FontWeight, number>> = { regular: 400, bold: 700 };

/** The path of a shipped face. */
export function fontPath(weight: FontWeight, subset: FontSubset): string {
  return require.resolve(`@fontsource/source-sans-3/files/source-sans-3-${subset}-${WEIGHTS[weight]}-normal.woff`);
}

/** The name a face is registered under in a PDF document: "regular-latin", "bold-latin-ext". */
export const faceName = (weight: FontWeight, subset: FontSubset): string => `${weight}-${subset}`;

export const SUBSETS: readonly FontSubset[] = ['latin', 'latin-ext'];
export const FONT_WEIGHTS: readonly FontWeight[] = ['regular', 'bold'];

/** Which characters each subset has, from the package's own unicode.json (the CSS unicode-range of each file). */
export function subsetRanges(): Readonly<Record<FontSubset, string>> {
  const ranges = require('@fontsource/source-sans-3/unicode.json') as Record<string, string>;
  const latin = ranges['latin'];
  const ext = ranges['latin-ext'];
  if (!latin || !ext) throw new Error('print/pdfFonts: @fontsource/source-sans-3 has no latin or latin-ext range');
  return { latin, 'latin-ext': ext };
}

const sfntCache = new Map<string, Buffer>();

/**
 * A shipped face as plain sfnt bytes, decompressed from its .woff once per process (woff.ts): pdfkit gets these
 * instead of the file, so no document pays for inflating the font again.
 */
export function fontBytes(weight: FontWeight, subset: FontSubset): Buffer {
  const key = faceName(weight, subset);
  let bytes = sfntCache.get(key);
  if (!bytes) {
    bytes = woffToSfnt(readFileSync(fontPath(weight, subset)));
    sfntCache.set(key, bytes);
  }
  return bytes;
}
