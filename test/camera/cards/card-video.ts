import { createWriteStream } from 'node:fs';
import sharp from 'sharp';
import { BAND } from '../../../src/features/camera/band';
import { type CardSpec, seeded } from './card-specs';
import { drawCard } from './draw-card';

export interface VideoOptions {
  width: number;
  height: number;
  fps: number;
  /** Frames each card is held still under the camera. */
  holdFrames: number;
  /** Frames of motion between two cards (the old one slides out blurred as the next slides in). */
  moveFrames: number;
}

export const DEFAULT_VIDEO: VideoOptions = { width: 640, height: 360, fps: 10, holdFrames: 8, moveFrames: 1 };

/** A desk-grey frame with a card scaled to the band's width and centred on it, shifted by `offset` px. */
export async function frameWithCard(card: Buffer, options: VideoOptions, offset: number, blur: number): Promise<Buffer> {
  const targetWidth = Math.round(options.width * BAND.width * 0.95);
  let resized = sharp(card).resize({ width: targetWidth });
  if (blur >= 0.3) resized = resized.blur(blur);
  const { data, info } = await resized.png().toBuffer({ resolveWithObject: true });
  const centreY = Math.round(options.height * (BAND.top + BAND.height / 2));
  const left = Math.round((options.width - info.width) / 2 + offset);
  const top = Math.round(centreY - info.height / 2);
  // Composite needs the card inside the frame: crop what slides past an edge.
  const visibleLeft = Math.max(0, left);
  const cropLeft = visibleLeft - left;
  const visibleWidth = Math.min(info.width - cropLeft, options.width - visibleLeft);
  const visibleTop = Math.max(0, top);
  const cropTop = visibleTop - top;
  const visibleHeight = Math.min(info.height - cropTop, options.height - visibleTop);
  const base = sharp({ create: { width: options.width, height: options.height, channels: 3, background: { r: 92, g: 88, b: 80 } } });
  if (visibleWidth <= 0 || visibleHeight <= 0) return base.removeAlpha().raw().toBuffer();
  const piece = await sharp(data).extract({ left: cropLeft, top: cropTop, width: visibleWidth, height: visibleHeight }).png().toBuffer();
  return base.composite([{ input: piece, left: visibleLeft, top: visibleTop }]).removeAlpha().raw().toBuffer();
}

/** RGB to the three planes of 4:2:0 YCbCr (BT.601, full range as C420jpeg says). */
function toI420(rgb: Buffer, width: number, height: number): Buffer {
  const y = Buffer.alloc(width * height);
  const u = Buffer.alloc((width / 2) * (height / 2));
  const v = Buffer.alloc((width / 2) * (height / 2));
  for (let row = 0; row < height; row++) {
    for (let col = 0; col < width; col++) {
      const i = (row * width + col) * 3;
      const r = rgb[i]!;
      const g = rgb[i + 1]!;
      const b = rgb[i + 2]!;
      y[row * width + col] = Math.round(0.299 * r + 0.587 * g + 0.114 * b);
      if (row % 2 === 0 && col % 2 === 0) {
        const c = (row / 2) * (width / 2) + col / 2;
        u[c] = Math.max(0, Math.min(255, Math.round(128 - 0.168736 * r - 0.331264 * g + 0.5 * b)));
        v[c] = Math.max(0, Math.min(255, Math.round(128 + 0.5 * r - 0.418688 * g - 0.081312 * b)));
      }
    }
  }
  return Buffer.concat([y, u, v]);
}

/**
 * Writes a y4m video (the format Chromium's fake camera plays) of the cards in order: each held still,
 * then a motion frame where it slides away blurred. Returns the seconds one pass lasts.
 */
export async function writeCardVideo(path: string, cards: CardSpec[], options: VideoOptions = DEFAULT_VIDEO): Promise<number> {
  const out = createWriteStream(path);
  const put = (chunk: Buffer | string) =>
    new Promise<void>((resolve, reject) => (out.write(chunk, (error) => (error ? reject(error) : resolve()))));
  await put(`YUV4MPEG2 W${options.width} H${options.height} F${options.fps}:1 Ip A1:1 C420jpeg\n`);
  let frames = 0;
  const random = seeded(4242);
  for (const card of cards) {
    const drawn = await drawCard(card);
    // A hand never holds still: each frame sits a pixel or two off, with a little sensor noise of its own.
    const poses = new Map<number, Buffer>();
    for (let i = 0; i < options.holdFrames; i++, frames++) {
      const shift = Math.round((random() - 0.5) * 4);
      if (!poses.has(shift)) poses.set(shift, await frameWithCard(drawn, options, shift, 0));
      const frame = Buffer.from(poses.get(shift)!);
      for (let p = 0; p < frame.length; p++) frame[p] = Math.max(0, Math.min(255, frame[p]! + Math.round((random() - 0.5) * 10)));
      await put(Buffer.concat([Buffer.from('FRAME\n'), toI420(frame, options.width, options.height)]));
    }
    for (let i = 1; i <= options.moveFrames; i++, frames++) {
      const shift = Math.round((options.width * 0.6 * i) / options.moveFrames);
      const moving = toI420(await frameWithCard(drawn, options, -shift, 2.5), options.width, options.height);
      await put(Buffer.concat([Buffer.from('FRAME\n'), moving]));
    }
  }
  await new Promise<void>((resolve) => out.end(resolve));
  return frames / options.fps;
}
