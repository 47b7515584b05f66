/**
 * The fake-camera strap without a browser: tsx test/camera/cards/try-strap.ts
 * Each card of the browser test's strap is shown for 8 jittered, noisy frames, read with the camera's own
 * variant rotation and acceptance rule, and every card that is not accepted exactly once, correctly, is
 * printed with what was accepted. Useful when tuning; the browser test is the measure.
 */
import { acceptFrame, initialAcceptance } from '../../../shared/ocr/acceptance';
import { greyFromPixels, crop } from '../../../src/lib/ocr/grey-image';
import { createNodeEngine } from '../../../src/lib/ocr/node-engine';
import { recogniseSerial } from '../../../src/lib/ocr/recognise';
import { cameraVariants } from '../../../src/features/camera/camera-text';
import { BAND } from '../../../src/features/camera/band';
import { cardSpecs, expectedSerial, seeded } from './card-specs';
import { DEFAULT_VIDEO, frameWithCard } from './card-video';
import { drawCard } from './draw-card';
async function main() {
  const cards = cardSpecs('clean', 100, 31337);
  const engine = await createNodeEngine();
  const o = DEFAULT_VIDEO;
  const random = seeded(4242);
  let state = initialAcceptance;
  let frame = 0;
  let good = 0;
  for (const card of cards) {
    const accepted: string[] = [];
    for (let i = 0; i < 8; i++, frame++) {
      const rgb = Buffer.from(await frameWithCard(await drawCard(card), o, Math.round((random() - 0.5) * 4), 0));
      for (let p = 0; p < rgb.length; p++) rgb[p] = Math.max(0, Math.min(255, rgb[p]! + Math.round((random() - 0.5) * 10)));
      const grey = greyFromPixels(rgb, o.width, o.height, 3);
      const band = crop(grey, o.width * BAND.left, o.height * BAND.top, o.width * BAND.width, o.height * BAND.height);
      const { read } = await recogniseSerial(engine, band, cameraVariants(frame));
      const next = acceptFrame(state, read);
      state = next.state;
      if (next.verdict.kind === 'accept') accepted.push(`${next.verdict.read.serial}${next.verdict.unsure.length ? '?' + next.verdict.unsure.join(',') : ''}`);
    }
    state = acceptFrame(state, null).state;
    const ok = accepted.length === 1 && accepted[0] === expectedSerial(card);
    if (ok) good++;
    else console.log(card.index, expectedSerial(card), accepted.join(' '), card.font.name);
  }
  console.log('good', good);
  await engine.close();
}

void main();
