// Checking and re-encoding an uploaded photo. The type is decided by the bytes (magic numbers), never by the
// file name or the declared content type. Accepted: JPEG, PNG, WebP. HEIC is refused with advice: the sharp
// build here decodes HEIF only with the AV1 codec (AVIF), not HEVC, so iPhone HEIC files cannot be read.
// Every accepted photo is decoded and re-encoded as JPEG: EXIF (GPS, camera, time), XMP and ICC data are dropped
// (sharp writes no metadata unless asked), after turning the pixels upright by the EXIF orientation.
import sharp, { type Metadata } from 'sharp';
import { err, ok, type Result } from '@shared/result.ts';

/** 15 MB: a phone photo is 2–8 MB; anything larger is refused before it is decoded. */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
/** 50 megapixels: larger images are refused from their header, before decoding (sharp limitInputPixels). */
export const MAX_PIXELS = 50_000_000;
/** Longest side of the stored photo and of the square thumbnail, in pixels. */
export const FULL_SIDE = 2400;
export const THUMB_SIDE = 400;

export type SniffedType = 'jpeg' | 'png' | 'webp' | 'heic';
export type PhotoProblem =
  | { kind: 'empty' }
  | { kind: 'not-an-image' }
  | { kind: 'heic' }
  | { kind: 'too-many-pixels'; width: number; height: number }
  | { kind: 'unreadable' };

export function sniffImageType(b: Uint8Array): SniffedType | null {
  const ascii = (from: number, to: number) => String.fromCharCode(...b.subarray(from, to));
  if (b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return 'jpeg';
  if (b.length >= 8 && [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((v, i) => b[i] === v)) return 'png';
  if (b.length >= 12 && ascii(0, 4) === 'RIFF' && ascii(8, 12) === 'WEBP') return 'webp';
  if (b.length >= 12 && ascii(4, 8) === 'ftyp' && ['heic', 'heix', 'hevc', 'heim', 'heis', 'mif1', 'msf1'].includes(ascii(8, 12))) return 'heic';
  return null;
}

export interface ProcessedPhoto {
  full: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
}

export async function processPhoto(bytes: Uint8Array): Promise<Result<ProcessedPhoto, PhotoProblem>> {
  if (bytes.length === 0) return err({ kind: 'empty' });
  const type = sniffImageType(bytes);
  if (type === null) return err({ kind: 'not-an-image' });
  if (type === 'heic') return err({ kind: 'heic' });
  const input = () => sharp(bytes, { limitInputPixels: MAX_PIXELS, failOn: 'error', sequentialRead: true });
  let meta: Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    return err({ kind: 'unreadable' });
  }
  const w = meta.width ?? 0;
  const h = meta.height ?? 0;
  if (w * h > MAX_PIXELS) return err({ kind: 'too-many-pixels', width: w, height: h });
  try {
    const full = await input().autoOrient().resize({ width: FULL_SIDE, height: FULL_SIDE, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 85, mozjpeg: true }).toBuffer({ resolveWithObject: true });
    const thumb = await input().autoOrient().resize({ width: THUMB_SIDE, height: THUMB_SIDE, fit: 'cover' }).jpeg({ quality: 80, mozjpeg: true }).toBuffer();
    return ok({ full: full.data, thumb, width: full.info.width, height: full.info.height });
  } catch {
    return err({ kind: 'unreadable' });
  }
}

export function photoProblemMessage(p: PhotoProblem): string {
  switch (p.kind) {
    case 'empty':
      return 'The upload was empty. Choose a photo and try again.';
    case 'not-an-image':
      return 'That file is not a photo Threadway can use. Upload a JPEG, PNG or WebP image.';
    case 'heic':
      return 'HEIC photos cannot be read here. On the phone, choose "Most compatible" (JPEG) in the camera settings, or share the photo as JPEG.';
    case 'too-many-pixels':
      return `That image is ${p.width} × ${p.height} pixels, over the ${MAX_PIXELS / 1_000_000} megapixel limit. Send a smaller copy.`;
    case 'unreadable':
      return 'That image could not be read (it may be damaged or cut off). Try exporting it again.';
  }
}
