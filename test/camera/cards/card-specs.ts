import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { prng } from '../../../server/db/seed/demo-data';

/**
 * What one generated serial card looks like, chosen by a seeded generator so every run draws the same
 * cards. The serials are invented; a card is a plain tinted rectangle with one line of text and never
 * any element of a banknote's design (rules on reproducing currency apply; the reader needs only the line).
 */
export interface CardSpec {
  index: number;
  set: 'clean' | 'degraded';
  prefix: string;
  digits: string;
  suffix: string;
  star: boolean;
  /** How the line is laid out: `MB 12345678 C` or run together. */
  spaced: boolean;
  font: CardFont;
  /** Height of a digit in pixels. */
  digitHeight: number;
  ink: string;
  tint: [number, number, number];
  /** Fine background lines: 0 none, 1 faint … 3 busy. */
  lines: number;
  rotation: number;
  blur: number;
  /** 0 even light, 1 one end half as bright. */
  unevenLight: number;
  jpegQuality: number;
  /** Sensor-like noise, standard deviation in grey levels. */
  noise: number;
}

export interface CardFont {
  name: string;
  /** The Pango family name inside the file. */
  family: string;
  file: string;
  /** Debian package that ships it, installed by scripts/test.sh when missing; null for the app's own font. */
  debianPackage: string | null;
}

const root = resolve(__dirname, '../../..');

/** The app's own digit font, and free fonts from Debian packages with different digit shapes. */
export const CARD_FONTS: CardFont[] = [
  { name: 'IBM Plex Mono Medium', family: 'IBM Plex Mono Medium', file: resolve(root, 'node_modules/@expo-google-fonts/ibm-plex-mono/500Medium/IBMPlexMono_500Medium.ttf'), debianPackage: null },
  { name: 'IBM Plex Mono SemiBold', family: 'IBM Plex Mono SemiBold', file: resolve(root, 'node_modules/@expo-google-fonts/ibm-plex-mono/600SemiBold/IBMPlexMono_600SemiBold.ttf'), debianPackage: null },
  { name: 'DejaVu Sans Mono', family: 'DejaVu Sans Mono', file: '/usr/share/fonts/truetype/dejavu/DejaVuSansMono.ttf', debianPackage: 'fonts-dejavu-core' },
  { name: 'DejaVu Sans Bold', family: 'DejaVu Sans Bold', file: '/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf', debianPackage: 'fonts-dejavu-core' },
  { name: 'DejaVu Serif', family: 'DejaVu Serif', file: '/usr/share/fonts/truetype/dejavu/DejaVuSerif.ttf', debianPackage: 'fonts-dejavu-core' },
  { name: 'Liberation Mono', family: 'Liberation Mono', file: '/usr/share/fonts/truetype/liberation/LiberationMono-Regular.ttf', debianPackage: 'fonts-liberation' },
  { name: 'Liberation Sans Bold', family: 'Liberation Sans Bold', file: '/usr/share/fonts/truetype/liberation/LiberationSans-Bold.ttf', debianPackage: 'fonts-liberation' },
  { name: 'Liberation Serif', family: 'Liberation Serif', file: '/usr/share/fonts/truetype/liberation/LiberationSerif-Regular.ttf', debianPackage: 'fonts-liberation' },
];

export function availableFonts(): CardFont[] {
  return CARD_FONTS.filter((font) => existsSync(font.file));
}

const LETTERS = 'ABCDEFGHIJKLMNPQRSTUVWXY';
const DISTRICTS = 'ABCDEFGHIJKL';
const INKS = ['#14161a', '#1d3f2c', '#1b2f55', '#4a2416', '#2e5a3a', '#3a3a3a'];

/** The demo seed's mulberry32, so the card sets are the same on every machine. */
export const seeded = prng;

const pick = <T>(random: () => number, items: ArrayLike<T>): T => items[Math.floor(random() * items.length)]!;
const between = (random: () => number, low: number, high: number) => low + random() * (high - low);

/** An invented serial in one of the shapes TRADE.md lists (one or two prefix letters, suffix letter or star). */
export function inventSerial(random: () => number): Pick<CardSpec, 'prefix' | 'digits' | 'suffix' | 'star'> {
  const modern = random() < 0.6;
  const prefix = modern ? pick(random, LETTERS) + pick(random, DISTRICTS) : pick(random, DISTRICTS);
  let digits = '';
  // Some digit strings with patterns, so finds appear among the cards as they do in a strap.
  if (random() < 0.08) {
    const d = String(Math.floor(random() * 10));
    const e = String(Math.floor(random() * 10));
    for (let i = 0; i < 8; i++) digits += random() < 0.5 ? d : e;
  } else {
    for (let i = 0; i < 8; i++) digits += String(Math.floor(random() * 10));
  }
  if (/^0+$/.test(digits)) digits = '00000001';
  const star = random() < 0.15;
  return { prefix, digits, suffix: star ? '' : pick(random, LETTERS), star };
}

/** The cards of one set: `count` cards from `seed`; the degraded set adds every difficulty at once. */
export function cardSpecs(set: CardSpec['set'], count: number, seed: number, fonts = availableFonts()): CardSpec[] {
  const random = seeded(seed);
  const cards: CardSpec[] = [];
  for (let index = 0; index < count; index++) {
    const serial = inventSerial(random);
    const font = fonts[index % fonts.length]!;
    const degraded = set === 'degraded';
    const tint = degraded
      ? ([between(random, 200, 245), between(random, 205, 245), between(random, 190, 235)].map(Math.round) as [number, number, number])
      : ([between(random, 235, 252), between(random, 235, 252), between(random, 228, 248)].map(Math.round) as [number, number, number]);
    cards.push({
      index,
      set,
      ...serial,
      spaced: random() < 0.5,
      font,
      digitHeight: Math.round(degraded ? between(random, 18, 44) : between(random, 30, 60)),
      ink: pick(random, INKS),
      tint,
      lines: degraded ? 1 + Math.floor(random() * 3) : random() < 0.3 ? 1 : 0,
      rotation: degraded ? between(random, -4, 4) : between(random, -1, 1),
      blur: degraded ? between(random, 0.3, 1.4) : 0,
      unevenLight: degraded ? between(random, 0.2, 0.5) : between(random, 0, 0.1),
      jpegQuality: Math.round(degraded ? between(random, 35, 70) : between(random, 88, 95)),
      noise: degraded ? between(random, 2, 7) : 0,
    });
  }
  return cards;
}

/** The serial as the recogniser should report it. */
export const expectedSerial = (card: Pick<CardSpec, 'prefix' | 'digits' | 'suffix' | 'star'>) =>
  `${card.prefix}${card.digits}${card.star ? '*' : card.suffix}`;

/** The line as printed: a star note shows ★ where the suffix letter would be. */
export function printedLine(card: CardSpec): string {
  const end = card.star ? '★' : card.suffix;
  return card.spaced ? `${card.prefix} ${card.digits} ${end}` : `${card.prefix}${card.digits}${end}`;
}
