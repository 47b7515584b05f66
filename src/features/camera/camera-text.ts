import { VARIANTS } from '@/lib/ocr/recognise';

/** Shown under the camera view: the promise this mode keeps. */
export const PRIVACY_NOTE =
  'Frames are read on this device and never leave it; this mode stores no picture of a note. Keepers’ photos are only the ones you choose to save.';

/**
 * The camera tries fewer variants per frame than a still picture: the next frame is the better second
 * try, and two agreeing frames accept a serial anyway. The open variant stays for the star.
 */
export const CAMERA_VARIANTS = VARIANTS.filter((variant) => variant.name === 'grey-36' || variant.name === 'open-36');
