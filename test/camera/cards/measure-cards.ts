import { acceptedAlone } from '../../../shared/ocr/acceptance';
import { greyFromFile } from '../../../src/lib/ocr/node-image';
import { type OcrEngine, recogniseSerial, type Variant, VARIANTS } from '../../../src/lib/ocr/recognise';
import { type CardSpec, expectedSerial } from './card-specs';
import { drawCard } from './draw-card';

export interface CardOutcome {
  card: CardSpec;
  read: string | null;
  confidence: number;
  accepted: boolean;
  digitsRight: boolean;
  prefixRight: boolean;
  starRight: boolean;
  ms: number;
}

export interface SetFigures {
  cards: number;
  /** Share of cards whose 8 digits were read exactly (accepted or not). */
  exactDigits: number;
  /** The whole serial (prefix, digits, suffix or star) exactly. */
  exactSerial: number;
  prefix: number;
  /** Star read as a star, and a suffix letter never read as a star, over all cards. */
  star: number;
  accepted: number;
  /** Accepted alone, yet not the serial on the card: the error that throws a find back. */
  acceptedWrong: number;
  medianMs: number;
}

/** Draws each card, reads it with the recogniser, and compares with the serial printed on it. */
export async function measureCards(engine: OcrEngine, cards: CardSpec[], variants: readonly Variant[] = VARIANTS): Promise<CardOutcome[]> {
  const outcomes: CardOutcome[] = [];
  for (const card of cards) {
    const image = await greyFromFile(await drawCard(card));
    const started = performance.now();
    const { read } = await recogniseSerial(engine, image, variants);
    const ms = performance.now() - started;
    outcomes.push({
      card,
      read: read?.serial ?? null,
      confidence: read?.confidence ?? 0,
      accepted: acceptedAlone(read),
      digitsRight: read?.digits === card.digits,
      prefixRight: read?.prefix === card.prefix,
      starRight: (read?.star ?? false) === card.star,
      ms,
    });
  }
  return outcomes;
}

export function figures(outcomes: CardOutcome[]): SetFigures {
  const n = outcomes.length || 1;
  const share = (test: (o: CardOutcome) => boolean) => outcomes.filter(test).length / n;
  const times = outcomes.map((o) => o.ms).sort((a, b) => a - b);
  return {
    cards: outcomes.length,
    exactDigits: share((o) => o.digitsRight),
    exactSerial: share((o) => o.read === expectedSerial(o.card)),
    prefix: share((o) => o.prefixRight),
    star: share((o) => o.starRight),
    accepted: share((o) => o.accepted),
    acceptedWrong: share((o) => o.accepted && o.read !== expectedSerial(o.card)),
    medianMs: times[Math.floor(times.length / 2)] ?? 0,
  };
}
