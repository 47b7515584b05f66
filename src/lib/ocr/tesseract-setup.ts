import type { OcrSymbol } from '@shared/ocr/serial-from-text';
import { OCR_WHITELIST } from '@shared/ocr/serial-from-text';

/**
 * The recogniser's settings, shared by Node and the browser: one line of text (page segmentation mode 7),
 * only the characters a serial can contain, and no dictionary (a serial is not a word).
 */
export const TESSERACT_PARAMETERS = {
  tessedit_pageseg_mode: '7',
  tessedit_char_whitelist: OCR_WHITELIST,
  user_defined_dpi: '300',
} as const;

/** Set when the recogniser starts (they cannot change later): no word lists, a serial is not a word. */
export const TESSERACT_INIT = { load_system_dawg: '0', load_freq_dawg: '0' } as const;

/** The files the web export serves for the recogniser (copied by scripts/web/after-export.ts). */
export const OCR_ASSET_DIR = 'ocr';
/** LSTM-only build: the legacy engine's code is not needed for the LSTM model, and it is smaller. */
export const CORE_FILES = ['tesseract-core-simd-lstm.wasm.js', 'tesseract-core-simd-lstm.wasm', 'tesseract-core-lstm.wasm.js', 'tesseract-core-lstm.wasm'];

interface SymbolLike {
  text: string;
  confidence: number;
}
interface PageLike {
  blocks?: { paragraphs: { lines: { words: { symbols: SymbolLike[] }[] }[] }[] }[] | null;
}

/** The characters of a tesseract.js page in reading order, confidence scaled to 0–1. */
export function symbolsOf(page: PageLike): OcrSymbol[] {
  const symbols: OcrSymbol[] = [];
  for (const block of page.blocks ?? []) {
    for (const paragraph of block.paragraphs) {
      for (const line of paragraph.lines) {
        for (const word of line.words) {
          for (const symbol of word.symbols) symbols.push({ text: symbol.text, confidence: symbol.confidence / 100 });
        }
      }
    }
  }
  return symbols;
}

interface Tunable {
  setParameters(parameters: Record<string, string>): Promise<unknown>;
}

/** Switches the whitelist on or off only when it changes: each change is a round trip to the worker. */
export function tuner(worker: Tunable): (open: boolean) => Promise<void> {
  let current: boolean | null = null;
  return async (open) => {
    if (current === open) return;
    await worker.setParameters({ ...TESSERACT_PARAMETERS, tessedit_char_whitelist: open ? '' : TESSERACT_PARAMETERS.tessedit_char_whitelist });
    current = open;
  };
}
