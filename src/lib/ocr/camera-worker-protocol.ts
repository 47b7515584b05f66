import type { SerialRead } from '@shared/ocr/serial-from-text';

/** The file the web export writes the camera's worker to (scripts/web/after-export.ts bundles camera-worker.ts). */
export const CAMERA_WORKER_FILE = 'camera-worker.js';

/** A frame's band for the worker: the picture itself (cropped by the browser), or grey bytes where it cannot send one. */
export type BandPicture = { bitmap: ImageBitmap } | { grey: { width: number; height: number; data: Uint8Array } };

/** Page → worker. `variants` are names from VARIANTS, tried in order until one is sure. */
export type ToCameraWorker = { type: 'frame'; id: number; variants: string[] } & BandPicture;

/** Worker → page. */
export type FromCameraWorker =
  | { type: 'progress'; share: number; label: string }
  | { type: 'ready' }
  | { type: 'failed'; message: string }
  | { type: 'result'; id: number; read: SerialRead | null; reason: string | null; ms: number };
