import { dirname, join } from 'node:path';
import { createWorker, OEM } from 'tesseract.js';
import { type GreyImage, toPgm } from './grey-image';
import type { OcrEngine } from './recognise';
import { symbolsOf, TESSERACT_INIT, tuner } from './tesseract-setup';

/**
 * The recogniser in Node (the CLI and the accuracy tests): the same tesseract.js, core and English data
 * the web export serves, read from node_modules, never downloaded.
 */
export async function createNodeEngine(): Promise<OcrEngine & { close(): Promise<void> }> {
  const langPath = join(dirname(require.resolve('@tesseract.js-data/eng/package.json')), '4.0.0_best_int');
  const worker = await createWorker('eng', OEM.LSTM_ONLY, {
    langPath,
    gzip: true,
    cacheMethod: 'none',
    legacyCore: false,
    legacyLang: false,
  }, TESSERACT_INIT);
  const tune = tuner(worker as unknown as Parameters<typeof tuner>[0]);
  return {
    async read(image: GreyImage, open: boolean) {
      await tune(open);
      const { data } = await worker.recognize(Buffer.from(toPgm(image)), {}, { blocks: true, text: false });
      return symbolsOf(data as Parameters<typeof symbolsOf>[0]);
    },
    async close() {
      await worker.terminate();
    },
  };
}
