// woffToSfnt against the checksums the font's producer wrote (outside this project): every table's OpenType checksum
// must equal the one the WOFF directory kept (W3C WOFF 1.0 §4: origChecksum), the `head` table's with its
// checkSumAdjustment read as zero (OpenType spec, 'head' table), and the fonts must open in pdfkit and embed.
import { readFileSync } from 'node:fs';
import PDFDocument from 'pdfkit';
import { describe, expect, it } from 'vitest';
import { FONT_WEIGHTS, fontPath, SUBSETS } from './pdfFonts.ts';
import { tableChecksum, tagText, woffToSfnt } from './woff.ts';

describe('woffToSfnt', () => {
  for (const weight of FONT_WEIGHTS) {
    for (const subset of SUBSETS) {
      it(`unpacks Source Sans 3 ${weight} ${subset} with every table's checksum as the producer wrote it`, () => {
        const woff = readFileSync(fontPath(weight, subset));
        const sfnt = woffToSfnt(woff);
        const numTables = sfnt.readUInt16BE(4);
        expect(numTables).toBe(woff.readUInt16BE(12));
        for (let i = 0; i < numTables; i++) {
          const at = 12 + i * 16;
          const tag = tagText(sfnt.readUInt32BE(at));
          const offset = sfnt.readUInt32BE(at + 8);
          const data = Buffer.from(sfnt.subarray(offset, offset + sfnt.readUInt32BE(at + 12)));
          expect(offset % 4, tag).toBe(0);
          if (tag === 'head') data.writeUInt32BE(0, 8);
          expect(tableChecksum(data), tag).toBe(sfnt.readUInt32BE(at + 4));
        }
      });
    }
  }

  it('refuses what is not a WOFF file', () => {
    expect(() => woffToSfnt(new Uint8Array(60))).toThrow(/not a WOFF/);
  });

  it('gives bytes pdfkit embeds and sets text with', async () => {
    const doc = new PDFDocument({ font: woffToSfnt(readFileSync(fontPath('regular', 'latin'))) as unknown as string });
    doc.text('Quilt 12 × 12 in');
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    await new Promise<void>((resolve) => {
      doc.on('end', () => resolve());
      doc.end();
    });
    expect(Buffer.concat(chunks).toString('latin1')).toMatch(/\/FontFile2/);
  });
});
