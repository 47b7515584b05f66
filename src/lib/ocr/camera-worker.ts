/**
 * The camera's Web Worker (bundled to /camera-worker.js by scripts/web/after-export.ts). It owns everything
 * a frame costs: the band arrives as an ImageBitmap the browser cropped off the video, is drawn and turned
 * grey on an OffscreenCanvas here, then goes through the same pre-processing and variants as the CLI and
 * the card tests (recognise.ts) and tesseract.js's own worker. The page only sends bitmaps and receives
 * reads, so the camera never holds up the keypad (no main-thread task over 50 ms, issue 11).
 */
import type { FromCameraWorker, ToCameraWorker } from './camera-worker-protocol';
import { greyFromPixels, type GreyImage } from './grey-image';
import { recogniseSerial, VARIANTS } from './recognise';
import { OCR_ASSET_DIR } from './tesseract-setup';
import { createWebEngine } from './web-engine';

interface WorkerScope {
  location: { origin: string };
  postMessage(message: FromCameraWorker): void;
  addEventListener(type: 'message', listener: (event: { data: ToCameraWorker }) => void): void;
}
const scope = self as unknown as WorkerScope;
const post = (message: FromCameraWorker) => scope.postMessage(message);

const engine = createWebEngine(`${scope.location.origin}/${OCR_ASSET_DIR}`, (share, label) => post({ type: 'progress', share, label }));
engine.then(
  () => post({ type: 'ready' }),
  (error: unknown) => post({ type: 'failed', message: error instanceof Error ? error.message : String(error) }),
);

let canvas: OffscreenCanvas | null = null;

/** The bitmap's pixels as grey bytes; the bitmap is closed at once, so no frame outlives its reading. */
function greyFromBitmap(bitmap: ImageBitmap): GreyImage | null {
  const { width, height } = bitmap;
  canvas ??= new OffscreenCanvas(width, height);
  if (canvas.width !== width) canvas.width = width;
  if (canvas.height !== height) canvas.height = height;
  const context = canvas.getContext('2d', { willReadFrequently: true });
  if (!context) {
    bitmap.close();
    return null;
  }
  context.drawImage(bitmap, 0, 0);
  bitmap.close();
  return greyFromPixels(context.getImageData(0, 0, width, height).data, width, height);
}

// Frames are handled one at a time in arrival order (the page sends the next only after a result).
let queue: Promise<void> = Promise.resolve();
scope.addEventListener('message', ({ data }) => {
  if (data.type !== 'frame') return;
  queue = queue.then(() => readFrame(data));
});

async function readFrame(message: ToCameraWorker): Promise<void> {
  const started = performance.now();
  const image = 'bitmap' in message ? greyFromBitmap(message.bitmap) : message.grey;
  const variants = message.variants.flatMap((name) => VARIANTS.filter((variant) => variant.name === name));
  if (!image || variants.length === 0) return post({ type: 'result', id: message.id, read: null, reason: 'nothing read', ms: 0 });
  try {
    const { read, reason } = await recogniseSerial(await engine, image, variants);
    post({ type: 'result', id: message.id, read, reason, ms: performance.now() - started });
  } catch (error) {
    post({ type: 'result', id: message.id, read: null, reason: error instanceof Error ? error.message : 'reader failed', ms: performance.now() - started });
  }
}
