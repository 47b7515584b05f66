import { describe, expect, it } from 'vitest';
import { estimateSkew, rotate } from '../../src/lib/ocr/deskew';
import type { GreyImage } from '../../src/lib/ocr/grey-image';

/** A white picture with one thick dark bar rising at `degrees`, like a slanted serial line. */
function slantedBar(degrees: number): GreyImage {
  const width = 300;
  const height = 100;
  const data = new Uint8Array(width * height).fill(255);
  const slope = Math.tan((degrees * Math.PI) / 180);
  for (let x = 20; x < 280; x++) for (let t = 0; t < 10; t++) data[(Math.round(45 - (x - 150) * slope) + t) * width + x] = 0;
  return { width, height, data };
}

describe('estimateSkew', () => {
  it.each([-4, -2.5, 0, 1.5, 3, 4])('when the line slants %s°, then the estimate is within half a degree', (degrees) => {
    expect(Math.abs(estimateSkew(slantedBar(degrees)) - degrees)).toBeLessThanOrEqual(0.5);
  });

  it('when the picture is turned by the estimate, then the line is level', () => {
    const slanted = slantedBar(3);
    expect(Math.abs(estimateSkew(rotate(slanted, estimateSkew(slanted))))).toBeLessThanOrEqual(0.5);
  });
});
