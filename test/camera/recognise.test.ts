import { describe, expect, it } from 'vitest';
import { ACCEPTANCE } from '../../shared/ocr/acceptance';
import type { OcrSymbol } from '../../shared/ocr/serial-from-text';
import type { GreyImage } from '../../src/lib/ocr/grey-image';
import { type OcrEngine, recogniseSerial, VARIANTS } from '../../src/lib/ocr/recognise';

/** A plain white picture with one dark bar where a line of text would be: enough for the line finder. */
function band(): GreyImage {
  const width = 200;
  const height = 60;
  const data = new Uint8Array(width * height).fill(235);
  for (let y = 24; y < 36; y++) for (let x = 20; x < 180; x += 3) data[y * width + x] = 20;
  return { width, height, data };
}

/** An engine that answers each variant (in the order they are asked) with a scripted line of text. */
function scripted(lines: string[], confidence: number): OcrEngine & { calls: number } {
  const engine = {
    calls: 0,
    async read(): Promise<OcrSymbol[]> {
      const line = lines[engine.calls++] ?? '';
      return [...line].map((text) => ({ text, confidence }));
    },
  };
  return engine;
}

/** Sure enough to count, not sure enough to accept alone. */
const UNSURE = ACCEPTANCE.single - 0.02;

const byName = (...names: string[]) => names.map((name) => VARIANTS.find((variant) => variant.name === name)!);

describe('recogniseSerial', () => {
  it('when the grey and open variants (one picture, read twice) agree on an unsure serial, then it is still not sure enough to accept alone', async () => {
    const engine = scripted(['MB12345678C', 'MB12345678C', 'MB12345678C'], UNSURE);
    const { read } = await recogniseSerial(engine, band(), byName('grey-36', 'open-36', 'otsu-36'));
    // The open read is no second witness: the thresholded picture is asked too, and its agreement counts.
    expect(engine.calls).toBe(3);
    expect(read?.confidence).toBeGreaterThanOrEqual(ACCEPTANCE.single);
  });

  it('when only the same picture agrees, then the confidence stays that of one read', async () => {
    const engine = scripted(['MB12345678C', 'MB12345678C'], UNSURE);
    const { read } = await recogniseSerial(engine, band(), byName('grey-36', 'open-36'));
    expect(read?.confidence).toBeCloseTo(UNSURE, 5);
    expect(read!.confidence).toBeLessThan(ACCEPTANCE.single);
  });

  it('when two differently prepared pictures disagree, then neither reading is sure enough to accept alone', async () => {
    const engine = scripted(['MB12345678C', 'MB12345678V', 'MB12345678C'], 0.99);
    const { read } = await recogniseSerial(engine, band(), byName('grey-36', 'otsu-36'));
    expect(read).not.toBeNull();
    // The first is sure on its own and ends the search, so a later rival is never asked.
    expect(engine.calls).toBe(1);
    const rivals = scripted(['MB12345678C', 'MB12345678V'], UNSURE);
    const contested = await recogniseSerial(rivals, band(), byName('grey-36', 'otsu-36'));
    expect(contested.read!.confidence).toBeLessThan(ACCEPTANCE.single);
  });
});
