import { weightTableValues, type WeightTableValues } from '@shared/contracts';
import { PATTERN_IDS, type LowLimit, type PatternId } from '@shared/engine';
import { nestedFieldErrors } from '@shared/contracts/field-errors';

/**
 * The weight editor works on text (what the fields hold) so a half-typed "-" or "2." is never lost;
 * `draftToTable` turns it into a table, or says which fields are wrong.
 */
export interface WeightDraft {
  patterns: Record<PatternId, string>;
  runs: Record<'3' | '4' | '5' | '6' | '7' | '8', string>;
  counts: Record<'4' | '5' | '6' | '7' | '8', string>;
  lowLimit: LowLimit;
  starBonus: string;
  /** On top of the star bonus, for a star note whose recorded run is 640,000 or fewer. */
  smallStarRunBonus: string;
  watchBonus: string;
  keepThreshold: string;
}

export const RUN_LENGTHS = ['3', '4', '5', '6', '7', '8'] as const;
export const COUNT_TIMES = ['4', '5', '6', '7', '8'] as const;

const text = (value: number | undefined) => (value === undefined ? '' : String(value));

export function tableToDraft(table: WeightTableValues): WeightDraft {
  return {
    patterns: Object.fromEntries(PATTERN_IDS.map((id) => [id, text(table.patterns[id])])) as Record<PatternId, string>,
    runs: Object.fromEntries(RUN_LENGTHS.map((n) => [n, text(table.runs[Number(n) as 3])])) as WeightDraft['runs'],
    counts: Object.fromEntries(COUNT_TIMES.map((n) => [n, text(table.counts[Number(n) as 4])])) as WeightDraft['counts'],
    lowLimit: table.lowLimit as LowLimit,
    starBonus: text(table.starBonus),
    smallStarRunBonus: text(table.smallStarRunBonus),
    watchBonus: text(table.watchBonus),
    keepThreshold: text(table.keepThreshold),
  };
}

function toNumber(value: string): number | undefined | typeof NaN {
  const trimmed = value.trim().replace('−', '-');
  if (trimmed === '') return undefined;
  return Number(trimmed);
}

export type DraftResult = { ok: true; table: WeightTableValues } | { ok: false; fields: Record<string, string> };

/** Checks the draft with the same zod contract the server uses. */
export function draftToTable(draft: WeightDraft): DraftResult {
  const patterns = Object.fromEntries(PATTERN_IDS.map((id) => [id, toNumber(draft.patterns[id]) ?? 0]));
  const runs = Object.fromEntries(RUN_LENGTHS.map((n) => [n, toNumber(draft.runs[n])]).filter(([, v]) => v !== undefined));
  const counts = Object.fromEntries(COUNT_TIMES.map((n) => [n, toNumber(draft.counts[n])]).filter(([, v]) => v !== undefined));
  const candidate = {
    patterns,
    runs,
    counts,
    lowLimit: draft.lowLimit,
    starBonus: toNumber(draft.starBonus) ?? 0,
    smallStarRunBonus: toNumber(draft.smallStarRunBonus) ?? 0,
    watchBonus: toNumber(draft.watchBonus) ?? 0,
    keepThreshold: toNumber(draft.keepThreshold) ?? 0,
  };
  const parsed = weightTableValues.safeParse(candidate);
  if (parsed.success) return { ok: true, table: parsed.data };
  return { ok: false, fields: nestedFieldErrors(parsed.error) };
}
