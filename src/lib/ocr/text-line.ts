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
  // A row dark across most of the width is a card edge or the desk, never a line of digits.
  for (let y = 0; y < image.height; y++) if (counts[y]! > 0.6) counts[y] = 0;
  peak = Math.max(...counts);
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
  return { line: whitenSolidColumns(crop(image, 0, rows.top - margin, image.width, height + margin * 2)), height };
}

/**
 * Columns dark over most of the line's height are the card's edge or the desk beside it (a digit's stroke
 * spans at most about 60–70% of the line with its margins): they are painted paper-white so they are not read.
 */
function whitenSolidColumns(line: GreyImage): GreyImage {
  const level = otsuLevel(line);
  const data = line.data.slice();
  const solid: boolean[] = [];
  for (let x = 0; x < line.width; x++) {
    let dark = 0;
    for (let y = 0; y < line.height; y++) if (line.data[y * line.width + x]! <= level) dark++;
    solid.push(dark > line.height * 0.8);
  }
  // Near the ends, everything outward of an edge is desk or the card's border: paper-white too.
  const reach = Math.round(line.width * 0.2);
  let left = -1;
  for (let x = 0; x < reach; x++) if (solid[x]) left = x;
  let right = line.width;
  for (let x = line.width - 1; x >= line.width - reach; x--) if (solid[x]) right = x;
  for (let x = 0; x < line.width; x++) {
    if (x <= left + 1 || x >= right - 1 || solid[x]) for (let y = 0; y < line.height; y++) data[y * line.width + x] = 255;
  }
  return { width: line.width, height: line.height, data };
}
