import type { Recognition } from '@/lib/ocr/recognise';
import { type BandPicture, CAMERA_WORKER_FILE, type FromCameraWorker, type ToCameraWorker } from '@/lib/ocr/camera-worker-protocol';
import type { LoadProgress } from '@/lib/ocr/web-engine';
import { bandRect } from './band';
import { grabBand } from './grab-band.web';

/** What the page keeps of the recogniser: a worker that takes bands and answers with reads. */
export interface CameraReader {
  /** Reads the band of the video's current frame; null when the video has no picture yet. */
  read(video: HTMLVideoElement, variants: string[]): Promise<(Pick<Recognition, 'read' | 'reason'> & { ms: number }) | null>;
}

let readerPromise: Promise<CameraReader> | null = null;
let progressListener: LoadProgress | null = null;

/**
 * One camera worker per page: opening the camera a second time reuses the recogniser already loaded. The
 * worker script and the recogniser's files download only now, when the camera first opens.
 */
export function openCameraReader(onProgress: LoadProgress): Promise<CameraReader> {
  progressListener = onProgress;
  readerPromise ??= startWorker().catch((error: unknown) => {
    readerPromise = null;
    throw error;
  });
  return readerPromise;
}

function startWorker(): Promise<CameraReader> {
  const worker = new Worker(`/${CAMERA_WORKER_FILE}`);
  const waiting = new Map<number, (result: Extract<FromCameraWorker, { type: 'result' }>) => void>();
  let nextId = 0;
  // Chromium and Safari 16.4+ crop the band off the video and move it to the worker without copying; older
  // browsers draw it on a canvas here, which costs the page a few milliseconds a frame.
  let bitmaps = typeof OffscreenCanvas === 'function' && typeof createImageBitmap === 'function';
  let canvas: HTMLCanvasElement | null = null;

  async function band(video: HTMLVideoElement): Promise<{ picture: BandPicture; transfer: Transferable[] } | null> {
    if (!video.videoWidth || !video.videoHeight) return null;
    if (bitmaps) {
      const { sx, sy, sw, sh, tw, th } = bandRect(video.videoWidth, video.videoHeight);
      try {
        const bitmap = await createImageBitmap(video, sx, sy, sw, sh, { resizeWidth: tw, resizeHeight: th, resizeQuality: 'medium' });
        return { picture: { bitmap }, transfer: [bitmap] };
      } catch {
        bitmaps = false;
      }
    }
    canvas ??= document.createElement('canvas');
    const grey = grabBand(video, canvas);
    return grey ? { picture: { grey }, transfer: [grey.data.buffer] } : null;
  }

  const reader: CameraReader = {
    async read(video, variants) {
      const taken = await band(video);
      if (!taken) return null;
      const id = nextId++;
      const answer = new Promise<Extract<FromCameraWorker, { type: 'result' }>>((resolve) => waiting.set(id, resolve));
      const message: ToCameraWorker = { type: 'frame', id, variants, ...taken.picture };
      worker.postMessage(message, taken.transfer);
      const { read, reason, ms } = await answer;
      return { read, reason, ms };
    },
  };

  return new Promise((resolve, reject) => {
    const fail = (message: string) => {
      worker.terminate();
      reject(new Error(message));
    };
    worker.addEventListener('error', (event) => fail(event.message || 'the camera worker did not start'));
    worker.addEventListener('message', ({ data }: MessageEvent<FromCameraWorker>) => {
      if (data.type === 'progress') progressListener?.(data.share, data.label);
      else if (data.type === 'ready') resolve(reader);
      else if (data.type === 'failed') fail(data.message);
      else {
        waiting.get(data.id)?.(data);
        waiting.delete(data.id);
      }
    });
  });
}
