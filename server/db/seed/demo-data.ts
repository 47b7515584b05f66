import { createHash } from 'node:crypto';

/** The fictional credit union every demo hunt comes from. */
export const DEMO_BANK = 'Larkspur Valley Credit Union';

/** A stable uuid (version 4 layout) for a demo key, so a second seed run meets the same rows. */
export function demoId(key: string): string {
  const hex = createHash('sha256').update(`strapsift-demo:${key}`).digest('hex');
  const variant = ((parseInt(hex[16]!, 16) & 0x3) | 0x8).toString(16);
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-4${hex.slice(13, 16)}-${variant}${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}

/** mulberry32: a small seeded PRNG, so the invented serials are the same on every machine. */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface DemoFind {
  strap: number;
  /** Position in the strap, 0…99. */
  at: number;
  serial: string;
  keeper?: {
    grade: number;
    estimatedValueCents: number;
    status: 'kept' | 'traded' | 'sold' | 'spent';
    series: string;
    facility?: 'DC' | 'FW';
    originalPaper?: boolean;
    notes: string;
  };
}

/** Swaps are recorded for every pulled note unless the strap is listed in `unswapped`. */
export interface DemoStrapEntry {
  strap: number;
  shortOver?: number;
  note?: string;
}

export interface DemoHunt {
  key: string;
  title: string;
  source: string;
  denomination: number;
  plannedStraps: number;
  startedAt: string;
  /** Straps 1…n fully searched, then `partial` notes of the next; null when every planned strap was searched. */
  searchedStraps: number;
  partial?: number;
  /** New notes from the vault come in serial order; circulated ones are mixed. */
  sequentialFrom?: number;
  closed: boolean;
  /** Straps the crew member sifted (the rest are the collector's). */
  crewStraps?: number[];
  finds: DemoFind[];
  straps: DemoStrapEntry[];
  /** Straps whose swaps the hunter has not recorded yet. */
  unswapped?: number[];
  seed: number;
}

// The finds are invented serials chosen for their patterns (checked in test/server/demo-seed.test.ts).
export const DEMO_HUNTS: DemoHunt[] = [
  {
    key: 'hunt:september-ones',
    title: '$1 straps, first week of September',
    source: `${DEMO_BANK}, Mill Street branch`,
    denomination: 1,
    plannedStraps: 5,
    startedAt: '2026-09-05T15:30:00.000Z',
    searchedStraps: 5,
    closed: true,
    seed: 11,
    finds: [
      {
        strap: 2,
        at: 41,
        serial: 'B27311372E',
        keeper: { grade: 30, estimatedValueCents: 1500, status: 'kept', series: '2017A', notes: 'Radar, light fold at centre.' },
      },
      { strap: 4, at: 7, serial: '61199119' },
    ],
    straps: [],
  },
  {
    key: 'hunt:october-twos',
    title: '$2 bundle from the vault',
    source: `${DEMO_BANK}, Orchard Road branch`,
    denomination: 2,
    plannedStraps: 10,
    startedAt: '2026-10-03T16:00:00.000Z',
    searchedStraps: 10,
    sequentialFrom: 58_395_120,
    closed: true,
    seed: 22,
    finds: [],
    // The sequential run passes 58395839, a repeater, in strap 8.
    straps: [{ strap: 3, shortOver: -1, note: 'Teller counted 99 at the window; came short from the vault.' }],
  },
  {
    key: 'hunt:october-fives',
    title: '$5 straps, Kestrel Plaza drive-up',
    source: `${DEMO_BANK}, Kestrel Plaza drive-up`,
    denomination: 5,
    plannedStraps: 4,
    startedAt: '2026-10-17T14:10:00.000Z',
    searchedStraps: 4,
    closed: true,
    seed: 33,
    finds: [
      {
        strap: 1,
        at: 63,
        serial: 'ME40829163*',
        keeper: { grade: 58, estimatedValueCents: 2200, status: 'traded', series: '2013', facility: 'FW', notes: 'Star note; traded at the club for a 1995 web note.' },
      },
      {
        strap: 3,
        at: 12,
        serial: '33030303',
        keeper: { grade: 40, estimatedValueCents: 3000, status: 'sold', series: '2017', notes: 'Binary with a run of three; sold to a club member.' },
      },
    ],
    straps: [],
  },
  {
    key: 'hunt:november-brick',
    title: '$1 brick split with Tobiah',
    source: `${DEMO_BANK}, Mill Street branch`,
    denomination: 1,
    plannedStraps: 10,
    startedAt: '2026-11-07T15:00:00.000Z',
    searchedStraps: 10,
    closed: true,
    crewStraps: [6, 7, 8, 9, 10],
    seed: 44,
    finds: [
      {
        strap: 2,
        at: 88,
        serial: 'L46464646A',
        keeper: {
          grade: 65,
          estimatedValueCents: 12500,
          status: 'kept',
          series: '2021',
          facility: 'FW',
          originalPaper: true,
          notes: 'Super repeater: the find of the year.',
        },
      },
      { strap: 5, at: 3, serial: '00000417', keeper: { grade: 45, estimatedValueCents: 9000, status: 'kept', series: '2021', notes: 'Low serial, three digits.' } },
      { strap: 7, at: 50, serial: '61600919' },
      { strap: 9, at: 19, serial: '55555155' },
    ],
    straps: [],
  },
  {
    key: 'hunt:this-week',
    title: '$1 straps, this week',
    source: `${DEMO_BANK}, Mill Street branch`,
    denomination: 1,
    plannedStraps: 3,
    startedAt: '2026-11-28T15:20:00.000Z',
    searchedStraps: 2,
    partial: 56,
    closed: false,
    seed: 55,
    finds: [
      { strap: 1, at: 70, serial: '82288228', keeper: { grade: 20, estimatedValueCents: 800, status: 'kept', series: '2017A', notes: 'Radar and repeater at once; worn.' } },
      { strap: 3, at: 30, serial: 'F40177104B' },
    ],
    // Strap 3's swap is not recorded yet, so the sheet shows it one short.
    straps: [],
    unswapped: [3],
  },
];

/** Keepers found before the app: typed in, with no hunt. */
export const DEMO_TYPED_KEEPERS = [
  {
    serial: 'B 1995 0731 C',
    series: '1995',
    denomination: 1,
    facility: 'DC' as const,
    grade: 25,
    estimatedValueCents: 600,
    status: 'kept' as const,
    foundAt: '2025-06-14T18:00:00.000Z',
    notes: 'From the club swap; check the back plate.',
  },
  {
    serial: 'L 0412 2014 A',
    series: '1977',
    denomination: 1,
    grade: 12,
    estimatedValueCents: 200,
    status: 'spent' as const,
    foundAt: '2024-11-02T18:00:00.000Z',
    notes: 'Spent back at the farmers market.',
  },
];

/**
 * A circulated note's serial with a prefix now and then, as a hunter might type it, in the form its face
 * value carries (TRADE.md): $1 and $2 one prefix letter, the district; a redesigned $5 the series letter
 * (M 2013, N 2017, P 2017A) and then the district. Circulating notes stop at 96,000,000 in a block.
 */
export function circulatedSerial(random: () => number, denomination: number): string {
  const digits = String(1 + Math.floor(random() * 95_999_999)).padStart(8, '0');
  if (random() > 0.3) return digits;
  const series = 'MNP'[Math.floor(random() * 3)]!;
  const district = 'ABCDEFGHIJKL'[Math.floor(random() * 12)]!;
  const suffix = 'ABCDEFGHJKLMN'[Math.floor(random() * 13)]!;
  return `${denomination <= 2 ? '' : series}${district}${digits}${suffix}`;
}

/** The serial of a new note in sequence: the vault's run, in its face value's form. */
export function sequentialSerial(denomination: number, value: number): string {
  return `${denomination <= 2 ? '' : 'M'}G${String(value).padStart(8, '0')}A`;
}
