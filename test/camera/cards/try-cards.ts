/**
 * A quick look at the card sets while tuning: tsx test/camera/cards/try-cards.ts SET COUNT [SEED] [OUT_DIR]
 * prints the figures and every miss; with OUT_DIR it also writes the cards as JPEG files to look at.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { createNodeEngine } from '../../../src/lib/ocr/node-engine';
import { cardSpecs, expectedSerial } from './card-specs';
import { drawCard } from './draw-card';
import { figures, measureCards } from './measure-cards';

async function main() {
  const [set = 'clean', count = '40', seed = '11', out] = process.argv.slice(2);
  const cards = cardSpecs(set === 'degraded' ? 'degraded' : 'clean', Number(count), Number(seed));
  if (out) {
    mkdirSync(out, { recursive: true });
    for (const card of cards) writeFileSync(join(out, `${set}-${card.index}.jpg`), await drawCard(card));
  }
  const engine = await createNodeEngine();
  const outcomes = await measureCards(engine, cards);
  await engine.close();
  for (const o of outcomes) {
    if (o.read !== expectedSerial(o.card) || o.accepted === false) {
      console.log(`${o.card.index}\t${expectedSerial(o.card)}\t${o.read}\t${o.confidence.toFixed(2)}\t${o.accepted ? 'ACCEPTED' : ''}\t${o.card.font.name}\th${o.card.digitHeight}`);
    }
  }
  console.log(JSON.stringify(figures(outcomes), null, 1));
}

void main();
