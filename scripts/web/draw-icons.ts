// Draws the Strapsift mark (a stack of notes held by a strap band) as PNGs, so the icons are our own
// and can be redrawn at any size: tsx scripts/web/draw-icons.ts
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { PNG } from 'pngjs';

type RGBA = [number, number, number, number];
const BRAND: RGBA = [0x2f, 0x4a, 0x3a, 255];
const PAPER: RGBA = [0xf5, 0xf1, 0xe8, 255];
const PAPER_SHADE: RGBA = [0xd8, 0xd0, 0xbe, 255];
const BAND: RGBA = [0xb2, 0x3a, 0x1e, 255];

function inRoundedRect(x: number, y: number, x0: number, y0: number, x1: number, y1: number, r: number): boolean {
  if (x < x0 || x > x1 || y < y0 || y > y1) return false;
  const cx = Math.min(Math.max(x, x0 + r), x1 - r);
  const cy = Math.min(Math.max(y, y0 + r), y1 - r);
  return (x - cx) ** 2 + (y - cy) ** 2 <= r * r;
}

export function drawMark(size: number, { padded = false } = {}): Buffer {
  const png = new PNG({ width: size, height: size });
  const u = (v: number) => v * size; // unit square coordinates → pixels
  const inset = padded ? 0.1 : 0;
  for (let y = 0; y < size; y++) {
    for (let x = 0; x < size; x++) {
      let colour: RGBA = [0, 0, 0, 0];
      if (inRoundedRect(x, y, u(inset), u(inset), u(1 - inset), u(1 - inset), u(0.2))) colour = BRAND;
      // three notes stacked, each a little offset, like a faced strap seen from the edge
      const notes = [0.3, 0.45, 0.6];
      notes.forEach((top, index) => {
        if (inRoundedRect(x, y, u(0.2 + index * 0.02), u(top), u(0.8 - index * 0.02), u(top + 0.11), u(0.02))) {
          colour = index === 1 ? PAPER_SHADE : PAPER;
        }
      });
      if (x >= u(0.44) && x <= u(0.56) && y >= u(0.26) && y <= u(0.75)) colour = BAND;
      const offset = (y * size + x) * 4;
      png.data[offset] = colour[0];
      png.data[offset + 1] = colour[1];
      png.data[offset + 2] = colour[2];
      png.data[offset + 3] = colour[3];
    }
  }
  return PNG.sync.write(png);
}

function write(path: string, data: Buffer): void {
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, data);
}

if (process.argv[1] && resolve(process.argv[1]).endsWith('draw-icons.ts')) {
  const root = resolve(__dirname, '../..');
  write(resolve(root, 'assets/images/icon.png'), drawMark(1024));
  write(resolve(root, 'assets/images/favicon.png'), drawMark(48));
  write(resolve(root, 'assets/images/icon-192.png'), drawMark(192));
  write(resolve(root, 'assets/images/icon-512.png'), drawMark(512));
  write(resolve(root, 'assets/images/icon-maskable-512.png'), drawMark(512, { padded: true }));
  console.log('icons drawn in assets/images');
}
