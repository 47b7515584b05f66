/**
 * The framing band: the strip of the camera picture that is read, as shares of the picture's width and
 * height. The overlay draws it and the frame grabber crops it with the same numbers, so what the hunter
 * lines up is exactly what is read.
 */
export const BAND = { left: 0.08, top: 0.36, width: 0.84, height: 0.28 } as const;

/** Bands wider than this are shrunk before reading: more pixels only cost time. */
export const BAND_MAX_WIDTH = 640;

/** The band of a `width`×`height` video frame in its pixels (source rectangle), and the size it is read at. */
export function bandRect(width: number, height: number) {
  const sx = width * BAND.left;
  const sy = height * BAND.top;
  const sw = width * BAND.width;
  const sh = height * BAND.height;
  const factor = Math.min(1, BAND_MAX_WIDTH / sw);
  return { sx, sy, sw, sh, tw: Math.round(sw * factor), th: Math.round(sh * factor) };
}
