/**
 * The framing band: the strip of the camera picture that is read, as shares of the picture's width and
 * height. The overlay draws it and the frame grabber crops it with the same numbers, so what the hunter
 * lines up is exactly what is read.
 */
export const BAND = { left: 0.08, top: 0.36, width: 0.84, height: 0.28 } as const;

/** Bands wider than this are shrunk before reading: more pixels only cost time. */
export const BAND_MAX_WIDTH = 640;
