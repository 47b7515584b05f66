import { greyFromPixels, type GreyImage } from '@/lib/ocr/grey-image';
import { bandRect } from './band';

/**
 * The fallback for browsers that cannot hand the worker an ImageBitmap of the band (no OffscreenCanvas):
 * copies the framing band of the current video frame into a small canvas and returns it as grey bytes.
 * Only this band is ever read; the frame stays in memory on the device and is overwritten by the next one.
 */
export function grabBand(video: HTMLVideoElement, canvas: HTMLCanvasElement): GreyImage | null {
  if (!video.videoWidth || !video.videoHeight) return null;
  const { sx, sy, sw, sh, tw, th } = bandRect(video.videoWidth, video.videoHeight);
  if (canvas.width !== tw) canvas.width = tw;
  if (canvas.height !== th) canvas.height = th;
  const context = canvas.getContext('2d', { willReadFrequently: true });
  if (!context) return null;
  context.drawImage(video, sx, sy, sw, sh, 0, 0, tw, th);
  const pixels = context.getImageData(0, 0, tw, th).data;
  return greyFromPixels(pixels, tw, th);
}
