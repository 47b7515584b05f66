import { greyFromPixels, type GreyImage } from '@/lib/ocr/grey-image';
import { BAND, BAND_MAX_WIDTH } from './band';

/**
 * Copies the framing band of the current video frame into a small canvas and returns it as grey bytes.
 * Only this band is ever read; the frame stays in memory on the device and is overwritten by the next one.
 */
export function grabBand(video: HTMLVideoElement, canvas: HTMLCanvasElement): GreyImage | null {
  const width = video.videoWidth;
  const height = video.videoHeight;
  if (!width || !height) return null;
  const sx = width * BAND.left;
  const sy = height * BAND.top;
  const sw = width * BAND.width;
  const sh = height * BAND.height;
  const factor = Math.min(1, BAND_MAX_WIDTH / sw);
  const tw = Math.round(sw * factor);
  const th = Math.round(sh * factor);
  if (canvas.width !== tw) canvas.width = tw;
  if (canvas.height !== th) canvas.height = th;
  const context = canvas.getContext('2d', { willReadFrequently: true });
  if (!context) return null;
  context.drawImage(video, sx, sy, sw, sh, 0, 0, tw, th);
  const pixels = context.getImageData(0, 0, tw, th).data;
  return greyFromPixels(pixels, tw, th);
}
