// WOFF 1.0 → plain sfnt (TrueType/OpenType) bytes, decompressed once per process with node:zlib. fontkit reads
// WOFF tables through a pure-JavaScript inflate on every document, which was most of a printed plan's time
// (bench/printPlan.bench.ts); handing pdfkit the sfnt bytes skips it. Format: W3C "WOFF File Format 1.0"
// (Recommendation, 13 December 2012) §3 header, §4 table directory, §5 table data (zlib when compLength < origLength);
// sfnt layout: OpenType spec, "Organization of an OpenType Font" (table directory, 4-byte aligned tables).
import { inflateSync } from 'node:zlib';

const WOFF_SIGNATURE = 0x774f4646; // 'wOFF'
const WOFF_HEADER = 44;
const WOFF_ENTRY = 20;
const SFNT_HEADER = 12;
const SFNT_ENTRY = 16;

interface TableEntry {
  readonly tag: number;
  readonly offset: number;
  readonly compLength: number;
  readonly origLength: number;
  readonly checksum: number;
}

/** The sfnt font inside a WOFF 1.0 file. Throws on anything that is not one (a caller bug: we ship the files). */
export function woffToSfnt(woff: Uint8Array): Buffer {
  const src = Buffer.from(woff.buffer, woff.byteOffset, woff.byteLength);
  if (src.length < WOFF_HEADER || src.readUInt32BE(0) !== WOFF_SIGNATURE) throw new Error('print/woff: not a WOFF 1.0 file');
  const flavor = src.readUInt32BE(4);
  const numTables = src.readUInt16BE(12);
  const entries: TableEntry[] = [];
  for (let i = 0; i < numTables; i++) {
    const at = WOFF_HEADER + i * WOFF_ENTRY;
    entries.push({ tag: src.readUInt32BE(at), offset: src.readUInt32BE(at + 4), compLength: src.readUInt32BE(at + 8), origLength: src.readUInt32BE(at + 12), checksum: src.readUInt32BE(at + 16) });
  }
  const tables = entries.map((e) => {
    const raw = src.subarray(e.offset, e.offset + e.compLength);
    const data = e.compLength < e.origLength ? inflateSync(raw) : raw;
    if (data.length !== e.origLength) throw new Error(`print/woff: table ${tagText(e.tag)} is ${data.length} bytes, not ${e.origLength}`);
    return { entry: e, data };
  });
  const padded = (n: number) => (n + 3) & ~3;
  let size = SFNT_HEADER + numTables * SFNT_ENTRY;
  for (const t of tables) size += padded(t.data.length);
  const out = Buffer.alloc(size);
  // searchRange = 16 · 2^⌊log2 n⌋, entrySelector = ⌊log2 n⌋, rangeShift = 16n − searchRange (OpenType table directory).
  const log2 = Math.floor(Math.log2(numTables));
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(16 * 2 ** log2, 6);
  out.writeUInt16BE(log2, 8);
  out.writeUInt16BE(16 * numTables - 16 * 2 ** log2, 10);
  let offset = SFNT_HEADER + numTables * SFNT_ENTRY;
  tables.forEach((t, i) => {
    const at = SFNT_HEADER + i * SFNT_ENTRY;
    out.writeUInt32BE(t.entry.tag, at);
    out.writeUInt32BE(t.entry.checksum, at + 4);
    out.writeUInt32BE(offset, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, offset);
    offset += padded(t.data.length);
  });
  return out;
}

/** OpenType table checksum: the sum of the table's big-endian uint32 words (zero-padded), modulo 2^32. */
export function tableChecksum(data: Uint8Array): number {
  const b = Buffer.from(data.buffer, data.byteOffset, data.byteLength);
  let sum = 0;
  for (let i = 0; i < b.length; i += 4) {
    const word = ((b[i] ?? 0) << 24) | ((b[i + 1] ?? 0) << 16) | ((b[i + 2] ?? 0) << 8) | (b[i + 3] ?? 0);
    sum = (sum + (word >>> 0)) >>> 0;
  }
  return sum;
}

export function tagText(tag: number): string {
  return String.fromCharCode((tag >>> 24) & 255, (tag >>> 16) & 255, (tag >>> 8) & 255, tag & 255);
}
