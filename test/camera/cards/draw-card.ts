import sharp from 'sharp';
import { type CardSpec, printedLine, seeded } from './card-specs';

/** Pango sizes fonts by the em; a digit is about 0.72 em tall in the fonts we use. */
const DIGIT_TO_EM = 1 / 0.72;

/** Draws the serial line alone, in the card's font and ink, on a transparent background. */
async function drawLine(card: CardSpec): Promise<{ png: Buffer; width: number; height: number }> {
  const em = Math.round(card.digitHeight * DIGIT_TO_EM);
  const line = printedLine(card).replace('★', '<span font_family="DejaVu Sans">★</span>');
  const { data, info } = await sharp({
    text: {
      text: `<span foreground="${card.ink}">${line}</span>`,
      font: `${card.font.family} ${em}`,
      fontfile: card.font.file,
      dpi: 72,
      rgba: true,
    },
  })
    .png()
    .toBuffer({ resolveWithObject: true });
  return { png: data, width: info.width, height: info.height };
}

/**
 * One card as JPEG bytes: tint, fine lines, the serial line, then uneven light, noise, rotation, blur and
 * JPEG compression, each as strong as the card's spec says. Same spec, same bytes.
 */
export async function drawCard(card: CardSpec): Promise<Buffer> {
  const random = seeded(card.index * 7919 + (card.set === 'clean' ? 1 : 2));
  const text = await drawLine(card);
  const marginX = Math.round(card.digitHeight * (0.8 + random() * 1.2));
  const marginY = Math.round(card.digitHeight * (0.7 + random() * 0.8));
  const width = text.width + marginX * 2;
  const height = text.height + marginY * 2;

  const background = Buffer.alloc(width * height * 3);
  const spacing = 4 + Math.floor(random() * 5);
  const angle = random() * Math.PI;
  const lineInk = 14 + card.lines * 10;
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      let shade = 0;
      if (card.lines > 0) {
        // Fine guilloche-free hatching: parallel hairlines, like a printed security tint on a form.
        const along = x * Math.cos(angle) + y * Math.sin(angle);
        if (((along % spacing) + spacing) % spacing < 1) shade = lineInk;
        if (card.lines >= 3 && ((x + y * 2) % (spacing * 3)) < 1) shade = lineInk;
      }
      const i = (y * width + x) * 3;
      background[i] = card.tint[0] - shade;
      background[i + 1] = card.tint[1] - shade;
      background[i + 2] = card.tint[2] - shade * 0.6;
    }
  }

  const composed = await sharp(background, { raw: { width, height, channels: 3 } })
    .composite([{ input: text.png, left: marginX, top: marginY }])
    .removeAlpha()
    .raw()
    .toBuffer();

  // Uneven light falls across the card from one side, as from a desk lamp; noise as from a small sensor.
  const fromLeft = random() < 0.5;
  const gauss = () => Math.sqrt(-2 * Math.log(random() || 1e-9)) * Math.cos(2 * Math.PI * random());
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const t = fromLeft ? x / width : 1 - x / width;
      const light = 1 - card.unevenLight * t * (0.7 + 0.3 * (y / height));
      const n = card.noise > 0 ? gauss() * card.noise : 0;
      const i = (y * width + x) * 3;
      for (let c = 0; c < 3; c++) composed[i + c] = Math.max(0, Math.min(255, Math.round(composed[i + c]! * light + n)));
    }
  }

  // sharp applies its operations in a fixed order: the rotation comes before the blur, as in a camera.
  let image = sharp(composed, { raw: { width, height, channels: 3 } });
  if (Math.abs(card.rotation) > 0.01) {
    const edge = card.tint.map((v) => Math.round(v * (1 - card.unevenLight / 2)));
    image = image.rotate(card.rotation, { background: { r: edge[0]!, g: edge[1]!, b: edge[2]! } });
  }
  if (card.blur >= 0.3) image = image.blur(card.blur);
  return image.jpeg({ quality: card.jpegQuality, chromaSubsampling: '4:2:0' }).toBuffer();
}
