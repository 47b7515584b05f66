import sharp, { type Sharp } from 'sharp';
import type { PhotoContentType } from '../../shared/contracts/photos';
import { HttpError } from './errors';

/**
 * The type of an image by its first bytes (its "magic number"), whatever the file is called or claims to
 * be: JPEG starts FF D8 FF, PNG with its 8-byte signature, WebP as a RIFF container of kind WEBP.
 */
export function sniffImageType(bytes: Uint8Array): PhotoContentType | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (bytes.length >= 8 && png.every((b, i) => bytes[i] === b)) return 'image/png';
  const ascii = (from: number, to: number) => String.fromCharCode(...bytes.subarray(from, to));
  if (bytes.length >= 12 && ascii(0, 4) === 'RIFF' && ascii(8, 12) === 'WEBP') return 'image/webp';
  return null;
}

export interface PreparedPhoto {
  contentType: PhotoContentType;
  body: Buffer;
  width: number;
  height: number;
  thumb: Buffer;
}

/** Longest side kept for the stored photo; a phone's 12-megapixel shot is more than a record needs. */
const MAX_SIDE = 3200;
/** Thumbnails for lists and the share page's small pictures. */
export const THUMB_SIDE = 320;
/** Refuse decompression bombs: a 10 MB file may claim a gigapixel canvas. */
const MAX_INPUT_PIXELS = 60_000_000;

/** The small JPEG lists and share pages show, from a photo already turned upright. */
function thumbnail(image: Sharp): Promise<Buffer> {
  return image.resize({ width: THUMB_SIDE, height: THUMB_SIDE, fit: 'inside', withoutEnlargement: true }).flatten({ background: '#ffffff' }).jpeg({ quality: 78 }).toBuffer();
}

export interface CheckedImage {
  contentType: PhotoContentType;
  width: number;
  height: number;
  thumb: Buffer;
}

/**
 * For photos that were prepared once already (a restored archive): checks the bytes decode as the image
 * their first bytes claim and makes the thumbnail, leaving the photo's own bytes as they are.
 */
export async function checkStoredImage(bytes: Buffer): Promise<CheckedImage | null> {
  const contentType = sniffImageType(bytes);
  if (!contentType) return null;
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' });
    const { width, height } = await image.metadata();
    if (!width || !height) return null;
    return { contentType, width, height, thumb: await thumbnail(image.clone()) };
  } catch {
    return null;
  }
}

/**
 * Checks the bytes really are a JPEG, PNG or WebP and prepares what is stored: the photo turned upright
 * by its EXIF orientation and re-encoded in its own format without metadata (no camera, time or GPS
 * location leaves with a shared photo), and a small JPEG thumbnail.
 */
export async function preparePhoto(bytes: Buffer): Promise<PreparedPhoto> {
  const contentType = sniffImageType(bytes);
  if (!contentType) throw new HttpError(400, 'unsupported_type', 'Photos must be JPEG, PNG or WebP images', { photo: 'is not a JPEG, PNG or WebP image' });
  try {
    const source = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' }).rotate();
    const resized = source.clone().resize({ width: MAX_SIDE, height: MAX_SIDE, fit: 'inside', withoutEnlargement: true });
    const encoded =
      contentType === 'image/jpeg'
        ? resized.jpeg({ quality: 90, mozjpeg: true })
        : contentType === 'image/png'
          ? resized.png({ compressionLevel: 9 })
          : resized.webp({ quality: 90 });
    const { data: body, info } = await encoded.toBuffer({ resolveWithObject: true });
    const thumb = await thumbnail(source.clone());
    return { contentType, body, width: info.width, height: info.height, thumb };
  } catch (error) {
    if (error instanceof HttpError) throw error;
    // The header said image but the rest would not decode: truncated, corrupt or too large a canvas.
    throw new HttpError(400, 'unreadable_image', 'That image could not be read; it may be damaged or too large', {
      photo: 'could not be decoded as an image',
    });
  }
}
