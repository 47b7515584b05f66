import { type GreyImage, toPgm } from './grey-image';
import type { OcrEngine } from './recognise';
import { symbolsOf, TESSERACT_INIT, tuner } from './tesseract-setup';

export type LoadProgress = (share: number, label: string) => void;

/** Where each stage of loading sits on the one progress bar (the core and the English data are ~3 MB each). */
const STAGES: Record<string, [number, number, string]> = {
  'loading tesseract core': [0, 0.45, 'Loading the reader'],
  'loading language traineddata': [0.45, 0.9, 'Loading the digit model'],
  'initializing api': [0.9, 1, 'Starting the reader'],
};

/**
 * The recogniser in the browser: tesseract.js runs it in a Web Worker of its own, with its core and English
 * data served by our own origin from `base` (scripts/web/after-export.ts copies them to /ocr; the service
 * worker keeps them after the first load). This runs inside the camera's worker (camera-worker.ts), so
 * neither tesseract.js nor any frame ever touches the page's main thread.
 */
export async function createWebEngine(base: string, onProgress: LoadProgress): Promise<OcrEngine & { close(): Promise<void> }> {
  const { createWorker, OEM } = await import('tesseract.js');
  onProgress(0, 'Loading the reader');
  const worker = await createWorker(
    'eng',
    OEM.LSTM_ONLY,
    {
      workerPath: `${base}/worker.min.js`,
      corePath: `${base}/core`,
      langPath: `${base}/lang`,
      gzip: true,
      // A blob: worker would need 'blob:' in worker-src; our own file keeps the policy at 'self'.
      workerBlobURL: false,
      legacyCore: false,
      legacyLang: false,
      logger: (message: { status: string; progress: number }) => {
        const stage = STAGES[message.status];
        if (stage) onProgress(stage[0] + (stage[1] - stage[0]) * message.progress, stage[2]);
      },
    },
    TESSERACT_INIT,
  );
  onProgress(1, 'Ready');
  const tune = tuner(worker as unknown as Parameters<typeof tuner>[0]);
  return {
    async read(image: GreyImage, open: boolean) {
      await tune(open);
      const { data } = await worker.recognize(toPgm(image) as unknown as Parameters<typeof worker.recognize>[0], {}, { blocks: true, text: false });
      return symbolsOf(data as Parameters<typeof symbolsOf>[0]);
    },
    async close() {
      await worker.terminate();
    },
  };
}
