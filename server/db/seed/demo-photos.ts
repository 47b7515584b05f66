import { PNG } from 'pngjs';

// A 3×5 pixel font for the digits only: the demo pictures carry the note's serial, nothing else.
const GLYPHS: Record<string, string[]> = {
  '0': ['111', '101', '101', '101', '111'],
  '1': ['010', '110', '010', '010', '111'],
  '2': ['111', '001', '111', '100', '111'],
  '3': ['111', '001', '111', '001', '111'],
  '4': ['101', '101', '111', '001', '001'],
  '5': ['111', '100', '111', '001', '111'],
  '6': ['111', '100', '111', '101', '111'],
  '7': ['111', '001', '010', '010', '010'],
  '8': ['111', '101', '111', '101', '111'],
  '9': ['111', '101', '111', '001', '111'],
};

type Rgb = [number, number, number];

/**
 * A schematic drawing of a kept note for the demo — a tinted card with a frame, a round seal and the
 * serial's digits — made here with pngjs. It is deliberately not a picture of any real banknote.
 */
export function drawDemoNote(digits: string, side: 'front' | 'back', width = 940, height = 400): Buffer {
  const png = new PNG({ width, height });
  const paper: Rgb = side === 'front' ? [233, 238, 226] : [226, 236, 232];
  const ink: Rgb = side === 'front' ? [54, 84, 66] : [44, 92, 84];
  const set = (x: number, y: number, [r, g, b]: Rgb) => {
    if (x < 0 || y < 0 || x >= width || y >= height) return;
    const i = (width * y + x) << 2;
    png.data[i] = r;
    png.data[i + 1] = g;
    png.data[i + 2] = b;
    png.data[i + 3] = 255;
  };
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      // Paper with a faint diagonal weave, so the picture reads as a note and not a blank card.
      const weave = (x + y) % 14 < 2 ? 6 : 0;
      set(x, y, [paper[0] - weave, paper[1] - weave, paper[2] - weave]);
      const frame = x < 18 || y < 18 || x >= width - 18 || y >= height - 18;
      const inner = (x >= 30 && x < 34) || (y >= 30 && y < 34) || (x >= width - 34 && x < width - 30) || (y >= height - 34 && y < height - 30);
      if (frame || (inner && x >= 30 && y >= 30 && x < width - 30 && y < height - 30)) set(x, y, ink);
    }
  }
  // A seal: a ring on the front's left, the middle of the back.
  const cx = side === 'front' ? Math.round(width * 0.28) : Math.round(width / 2);
  const cy = Math.round(height / 2);
  for (let y = cy - 80; y <= cy + 80; y++) {
    for (let x = cx - 80; x <= cx + 80; x++) {
      const d = Math.hypot(x - cx, y - cy);
      if ((d > 62 && d < 72) || d < 10) set(x, y, ink);
    }
  }
  const drawDigits = (text: string, left: number, top: number, scale: number) => {
    [...text].forEach((ch, n) => {
      const glyph = GLYPHS[ch];
      if (!glyph) return;
      glyph.forEach((row, gy) =>
        [...row].forEach((bit, gx) => {
          if (bit !== '1') return;
          for (let dy = 0; dy < scale; dy++) for (let dx = 0; dx < scale; dx++) set(left + n * 4 * scale + gx * scale + dx, top + gy * scale + dy, ink);
        }),
      );
    });
  };
  if (side === 'front') {
    drawDigits(digits, width - 60 - digits.length * 4 * 8, 60, 8);
    drawDigits(digits, 60, height - 60 - 5 * 8, 8);
  } else {
    drawDigits(digits.slice(-4), 60, 60, 10);
  }
  return PNG.sync.write(png);
}
