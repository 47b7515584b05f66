import sharp from 'sharp';
import { greyFromPixels, type GreyImage } from './grey-image';

/** Wider pictures are shrunk first: a serial line needs no more, and a phone photo would only cost time. */
const MAX_WIDTH = 1600;

/**
 * A picture file as the grey bytes the recogniser's pre-processing takes: turned upright by its EXIF
 * orientation, at most 1600 px wide. sharp refuses files that claim more than 50 megapixels.
 */
export async function greyFromFile(input: string | Buffer): Promise<GreyImage> {
  const { data, info } = await sharp(input, { limitInputPixels: 50_000_000 })
    .rotate()
    .resize({ width: MAX_WIDTH, withoutEnlargement: true })
    .removeAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  return greyFromPixels(data, info.width, info.height, info.channels);
}
