import { type OcrSymbol, type SerialRead, serialFromSymbols } from '@shared/ocr/serial-from-text';
import { ACCEPTANCE } from '@shared/ocr/acceptance';
import { flattenLight, type GreyImage, otsuLevel, pad, scale, stretchContrast, threshold } from './grey-image';
import { estimateSkew, rotate } from './deskew';
import { cropToLine } from './text-line';

/** Whatever runs the recogniser: tesseract.js in a Node worker thread or a browser Web Worker. */
export interface OcrEngine {
  /** `open`: without the character whitelist, for the star the model has no glyph for. */
  read(image: GreyImage, open: boolean): Promise<OcrSymbol[]>;
}

/** One way of preparing the band for the recogniser. */
export interface Variant {
  name: string;
  /** Height in pixels the serial line is scaled to. */
  lineHeight: number;
  binary: boolean;
  open: boolean;
}

/**
 * The order variants are tried in, best first, as measured on the generated cards (see
 * docs/PERFORMANCE.md, "Camera"): grey at a 36 px line reads most cards; a thresholded copy and a
 * larger scale rescue some of the rest. Later variants run only when the earlier ones are unsure.
 */
export const VARIANTS: Variant[] = [
  { name: 'grey-36', lineHeight: 36, binary: false, open: false },
  { name: 'open-36', lineHeight: 36, binary: false, open: true },
  { name: 'otsu-36', lineHeight: 36, binary: true, open: false },
  { name: 'grey-52', lineHeight: 52, binary: false, open: false },
];

export interface Recognition {
  read: SerialRead | null;
  /** Why nothing was read, for the CLI and the camera's hint line. */
  reason: string | null;
  variants: string[];
}

/** The serial line found in a picture: light evened, contrast stretched, turned level and cropped. */
export interface LineImage {
  line: GreyImage;
  /** Height of the text in pixels, before scaling. */
  height: number;
  skew: number;
}

/** The work every variant shares, done once per frame. */
export function findLine(image: GreyImage): LineImage {
  const flat = stretchContrast(flattenLight(image));
  const skew = estimateSkew(flat);
  const { line, height } = cropToLine(rotate(flat, skew));
  return { line, height, skew };
}

/** Scale to the variant's line height, threshold if it asks, and pad. */
export function prepare(found: LineImage, variant: Variant): GreyImage {
  const scaled = scale(found.line, variant.lineHeight / Math.max(8, found.height));
  const ready = variant.binary ? threshold(scaled, otsuLevel(scaled)) : scaled;
  return pad(ready, Math.round(variant.lineHeight / 2));
}

/** Variants that read the same prepared picture (the open one is the grey one without the whitelist). */
const pictureOf = (variant: Variant) => `${variant.lineHeight}-${variant.binary ? 'binary' : 'grey'}`;

interface VariantRead {
  read: SerialRead;
  picture: string;
}

/** How many different pictures read this serial: the same picture read twice is one witness, not two. */
const witnesses = (reads: VariantRead[]) => new Set(reads.map((entry) => entry.picture)).size;

/**
 * Reads one serial from a picture of the serial line (a camera band or a still card). Tries the variants
 * in order until one is sure enough to accept alone; when several read a serial, agreement between two
 * differently prepared pictures raises confidence and a disagreement lowers it, so two different guesses
 * never look certain. The grey and open variants read the same picture and mostly repeat each other's
 * mistakes (measured on the degraded cards), so their agreement does not count.
 */
export async function recogniseSerial(engine: OcrEngine, image: GreyImage, variants: readonly Variant[] = VARIANTS): Promise<Recognition> {
  const tried: string[] = [];
  const reads: VariantRead[] = [];
  let reason: string | null = null;
  const found = findLine(image);
  for (const variant of variants) {
    tried.push(variant.name);
    const result = serialFromSymbols(await engine.read(prepare(found, variant), variant.open));
    if (!result.ok) {
      reason ??= result.reason;
      continue;
    }
    reads.push({ read: result.read, picture: pictureOf(variant) });
    if (result.read.confidence >= ACCEPTANCE.single && !result.read.trimmed) break;
    if (witnesses(reads.filter((entry) => entry.read.serial === result.read.serial)) >= 2) break;
  }
  if (reads.length === 0) return { read: null, reason: reason ?? 'nothing read', variants: tried };
  return { read: combine(reads), reason: null, variants: tried };
}

function combine(reads: VariantRead[]): SerialRead {
  const bySerial = new Map<string, VariantRead[]>();
  for (const entry of reads) bySerial.set(entry.read.serial, [...(bySerial.get(entry.read.serial) ?? []), entry]);
  const ranked = [...bySerial.values()].sort((a, b) => witnesses(b) - witnesses(a) || best(b).confidence - best(a).confidence);
  const winners = ranked[0]!;
  const top = best(winners);
  const others = reads.length - winners.length;
  const digitConfidence = top.digitConfidence.map((_, index) => Math.max(...winners.map((entry) => entry.read.digitConfidence[index] ?? 0)));
  let confidence = top.confidence;
  if (witnesses(winners) >= 2) confidence = Math.max(confidence, Math.min(0.99, (confidence + 1) / 2));
  // A rival reading of the same band means at least one of them is wrong: never accept that alone.
  if (others > 0) confidence = Math.min(confidence, ACCEPTANCE.single - 0.01);
  if (top.trimmed) confidence = Math.min(confidence, ACCEPTANCE.single - 0.01);
  return { ...top, digitConfidence, confidence };
}

const best = (reads: VariantRead[]) => reads.map((entry) => entry.read).reduce((a, b) => (b.confidence > a.confidence ? b : a));
