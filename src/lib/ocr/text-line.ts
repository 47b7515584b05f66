import { crop, type GreyImage, otsuLevel } from './grey-image';

/**
 * Finds the rows the serial line occupies: the tallest run of rows where ink covers a fair share of the
 * width. Hairlines in the card's tint are lighter than Otsu's level and barely count; digits do.
 * Returns null when no line stands out (a blank or washed-out frame).
 */
export function findTextRows(image: GreyImage): { top: number; bottom: number } | null {
  const level = otsuLevel(image);
  const counts = new Float32Array(image.height);
  let peak = 0;
  for (let y = 0; y < image.height; y++) {
    let dark = 0;
    const row = y * image.width;
    for (let x = 0; x < image.width; x++) if (image.data[row + x]! <= level) dark++;
    counts[y] = dark / image.width;
    if (counts[y]! > peak) peak = counts[y]!;
  }
  if (peak < 0.02) return null;
  const cutoff = Math.max(0.01, peak * 0.12);
  let best: { top: number; bottom: number; mass: number } | null = null;
  let start = -1;
  let mass = 0;
  for (let y = 0; y <= image.height; y++) {
    const inside = y < image.height && counts[y]! >= cutoff;
    if (inside) {
      if (start < 0) {
        start = y;
        mass = 0;
      }
      mass += counts[y]!;
    } else if (start >= 0) {
      if (!best || mass > best.mass) best = { top: start, bottom: y - 1, mass };
      start = -1;
    }
  }
  if (!best || best.bottom - best.top < 4) return null;
  return { top: best.top, bottom: best.bottom };
}

/** The serial line with a margin above and below, or the whole image when no line stands out. */
export function cropToLine(image: GreyImage): { line: GreyImage; height: number } {
  const rows = findTextRows(image);
  if (!rows) return { line: image, height: image.height };
  const height = rows.bottom - rows.top + 1;
  const margin = Math.round(height * 0.35);
  return { line: crop(image, 0, rows.top - margin, image.width, height + margin * 2), height };
}
