import { type Variant, VARIANTS } from '@/lib/ocr/recognise';

/** Shown under the camera view: the promise this mode keeps. */
export const PRIVACY_NOTE =
  'Frames are read on this device and never leave it; this mode stores no picture of a note. Keepers’ photos are only the ones you choose to save.';

const byName = (name: string) => VARIANTS.find((variant) => variant.name === name)!;
const LEADS = ['grey-36', 'grey-52', 'otsu-36'].map(byName);

/**
 * The variants for frame number `frame`: each frame leads with a different preparation (and falls back to
 * the open one for the star). Two frames must agree before a serial is accepted, so agreement then means
 * two different preparations read the same digits; a misread that one scale or threshold makes (measured
 * on the fake-camera strap) no longer repeats itself into an accepted note.
 */
export function cameraVariants(frame: number): Variant[] {
  return [LEADS[frame % LEADS.length]!, byName('open-36')];
}
