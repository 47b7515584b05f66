import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createNodeEngine } from '../../src/lib/ocr/node-engine';
import type { OcrEngine } from '../../src/lib/ocr/recognise';
import { cardSpecs } from './cards/card-specs';
import { figures, measureCards } from './cards/measure-cards';

/**
 * A fixed subset of the generated cards (seeds of their own, never the ones tuned on), read with the same
 * code the camera and the CLI use. The full run of 500+ cards is `npm run bench`; this guards against a
 * change that makes reading worse. The floors are the targets less one card of slack for the
 * small sample; a confident misread is never allowed.
 */
const CARDS_PER_SET = 40;
let engine: OcrEngine & { close(): Promise<void> };

beforeAll(async () => {
  engine = await createNodeEngine();
}, 60_000);
afterAll(() => engine?.close());

describe('serial cards read by the camera recogniser (fixed subset)', () => {
  it('when clean cards are read, then at least 39 of 40 have all 8 digits right and no accepted read is wrong', async () => {
    const result = figures(await measureCards(engine, cardSpecs('clean', CARDS_PER_SET, 2026)));
    expect(result.exactDigits).toBeGreaterThanOrEqual(39 / 40);
    expect(result.acceptedWrong).toBe(0);
    expect(result.accepted).toBeGreaterThan(0.8);
  });

  it('when degraded cards (±4°, blur, lines, uneven light, JPEG) are read, then at least 37 of 40 have all 8 digits right and no accepted read is wrong', async () => {
    const result = figures(await measureCards(engine, cardSpecs('degraded', CARDS_PER_SET, 4052)));
    expect(result.exactDigits).toBeGreaterThanOrEqual(37 / 40);
    expect(result.acceptedWrong).toBe(0);
    expect(result.star).toBeGreaterThanOrEqual(37 / 40);
  });
});
