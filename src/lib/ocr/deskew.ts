import { type GreyImage, otsuLevel } from './grey-image';

/**
 * The slant of the serial line in degrees (positive: the line rises to the right), found by trying angles
 * and keeping the one whose row profile of ink is sharpest (the sum of squared row counts is largest when
 * the rows of text line up with the pixel rows). A hand-held note sits a few degrees off; this looks ±6°.
 */
export function estimateSkew(image: GreyImage, maxDegrees = 6, step = 0.5): number {
  const level = otsuLevel(image);
  const xs: number[] = [];
  const ys: number[] = [];
  // Every other column is plenty to judge the slant and halves the work (every row, or the level
  // angle would gain from rows that were never sampled).
  for (let y = 0; y < image.height; y++) {
    for (let x = 0; x < image.width; x += 2) {
      if (image.data[y * image.width + x]! <= level) {
        xs.push(x);
        ys.push(y);
      }
    }
  }
  if (xs.length < 20) return 0;
  const margin = Math.ceil(image.width * Math.tan((maxDegrees * Math.PI) / 180)) + 2;
  const rows = new Float64Array(image.height + margin * 2);
  let bestAngle = 0;
  let bestScore = -1;
  for (let degrees = -maxDegrees; degrees <= maxDegrees + 1e-9; degrees += step) {
    const slope = Math.tan((degrees * Math.PI) / 180);
    rows.fill(0);
    for (let i = 0; i < xs.length; i++) rows[Math.round(ys[i]! + xs[i]! * slope) + margin]! += 1;
    let score = 0;
    for (let r = 0; r < rows.length; r++) score += rows[r]! * rows[r]!;
    // Ties go to the smaller angle, so a level line is never turned for nothing.
    if (score > bestScore * 1.0005 || (Math.abs(score - bestScore) <= bestScore * 0.0005 && Math.abs(degrees) < Math.abs(bestAngle))) {
      bestScore = Math.max(score, bestScore);
      bestAngle = degrees;
    }
  }
  return bestAngle;
}

/** Turns the picture by `degrees` about its centre (bilinear), filling the corners with paper white. */
export function rotate(image: GreyImage, degrees: number): GreyImage {
  if (Math.abs(degrees) < 0.25) return image;
  const { width, height } = image;
  const angle = (degrees * Math.PI) / 180;
  const cos = Math.cos(angle);
  const sin = Math.sin(angle);
  const cx = width / 2;
  const cy = height / 2;
  const data = new Uint8Array(width * height);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      // Where this output pixel came from in the slanted picture.
      const dx = x - cx;
      const dy = y - cy;
      const sx = cx + dx * cos + dy * sin;
      const sy = cy - dx * sin + dy * cos;
      const x0 = Math.floor(sx);
      const y0 = Math.floor(sy);
      if (x0 < 0 || y0 < 0 || x0 + 1 >= width || y0 + 1 >= height) {
        data[y * width + x] = 255;
        continue;
      }
      const wx = sx - x0;
      const wy = sy - y0;
      const i = y0 * width + x0;
      const top = image.data[i]! * (1 - wx) + image.data[i + 1]! * wx;
      const bottom = image.data[i + width]! * (1 - wx) + image.data[i + width + 1]! * wx;
      data[y * width + x] = Math.round(top * (1 - wy) + bottom * wy);
    }
  }
  return { width, height, data };
}
