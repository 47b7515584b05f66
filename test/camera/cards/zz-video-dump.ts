import sharp from 'sharp';
import { greyFromPixels, crop } from '../../../src/lib/ocr/grey-image';
import { findLine, prepare, VARIANTS } from '../../../src/lib/ocr/recognise';
import { BAND } from '../../../src/features/camera/band';
import { cardSpecs } from './card-specs';
import { DEFAULT_VIDEO, frameWithCard } from './card-video';
import { drawCard } from './draw-card';
(async () => {
  const cards = cardSpecs('clean', 100, 31337);
  const o = DEFAULT_VIDEO;
  for (const i of process.argv.slice(2).map(Number)) {
    const rgb = await frameWithCard(await drawCard(cards[i]!), o, 0, 0);
    const grey = greyFromPixels(rgb, o.width, o.height, 3);
    const band = crop(grey, o.width * BAND.left, o.height * BAND.top, o.width * BAND.width, o.height * BAND.height);
    await sharp(Buffer.from(band.data), { raw: { width: band.width, height: band.height, channels: 1 } }).png().toFile(`/tmp/cam-band-${i}.png`);
    const p = prepare(findLine(band), VARIANTS[0]!);
    await sharp(Buffer.from(p.data), { raw: { width: p.width, height: p.height, channels: 1 } }).png().toFile(`/tmp/cam-band-${i}-prep.png`);
  }
})();
