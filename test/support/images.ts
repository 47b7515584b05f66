import { PNG } from 'pngjs';
import sharp from 'sharp';

/**
 * A small picture drawn here (never a photo of real currency): a paper-coloured card with a border and
 * a band of colour, so each test's image is different when `hue` differs.
 */
export function drawPng(width = 400, height = 170, hue = 0): Buffer {
  const png = new PNG({ width, height });
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const i = (width * y + x) << 2;
      const border = x < 6 || y < 6 || x >= width - 6 || y >= height - 6;
      const band = y > height * 0.4 && y < height * 0.6;
      png.data[i] = border ? 47 : band ? (hue * 37) % 256 : 245;
      png.data[i + 1] = border ? 74 : band ? 120 : 241;
      png.data[i + 2] = border ? 58 : band ? (255 - hue * 53) % 256 : 232;
      png.data[i + 3] = 255;
    }
  }
  return PNG.sync.write(png);
}

export const drawJpeg = (hue = 1) => sharp(drawPng(400, 170, hue)).jpeg({ quality: 85 }).toBuffer();
export const drawWebp = (hue = 2) => sharp(drawPng(400, 170, hue)).webp({ quality: 80 }).toBuffer();
